/**
 * A deep copy of a parsed JSON value without recursion, so a hostile document nested thousands of
 * levels deep cannot exhaust the stack. Nesting beyond MAX_DEPTH is refused with the path where
 * it happens; no design needs more than a dozen levels.
 */
import { formatJsonPath } from './issues';

export const MAX_DEPTH = 64;

export type CopyResult =
	{ ok: true; value: unknown } | { ok: false; path: string; message: string };

type Container = Record<string, unknown> | unknown[];
interface Job {
	from: Container;
	to: Container;
	path: (string | number)[];
}

function emptyLike(value: Container): Container {
	return Array.isArray(value) ? [] : {};
}

function isContainer(value: unknown): value is Container {
	return typeof value === 'object' && value !== null;
}

export function plainCopy(value: unknown): CopyResult {
	if (!isContainer(value)) return { ok: true, value };
	const root = emptyLike(value);
	const stack: Job[] = [{ from: value, to: root, path: [] }];
	while (stack.length > 0) {
		const { from, to, path } = stack.pop() as Job;
		if (path.length >= MAX_DEPTH) {
			return {
				ok: false,
				path: formatJsonPath(path),
				message: `nested deeper than ${MAX_DEPTH} levels`
			};
		}
		const keys: (string | number)[] = Array.isArray(from)
			? from.map((_, i) => i)
			: Object.keys(from);
		for (const key of keys) {
			const item = (from as Record<string | number, unknown>)[key];
			let copy = item;
			if (isContainer(item)) {
				copy = emptyLike(item);
				stack.push({ from: item, to: copy as Container, path: [...path, key] });
			}
			// defineProperty keeps a "__proto__" key as data instead of re-pointing the prototype.
			Object.defineProperty(to, key, {
				value: copy,
				enumerable: true,
				writable: true,
				configurable: true
			});
		}
	}
	return { ok: true, value: root };
}
