/**
 * Generated hostile design files for the fuzz suite: mutations of the demo (wrong types, missing
 * and unknown keys, huge and tiny numbers, deep nesting, hostile strings), random JSON structures,
 * and odd encodings of valid and invalid text. Deterministic: case n is the same on every run.
 */
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';

/** Mulberry32, a small seeded generator (public domain, T. Ettinger 2017). */
function prng(seed: number): () => number {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

const HOSTILE_STRINGS = [
	'',
	'\u001b[2K\rOverall: pass',
	'\u009b31m',
	'\u202eevil',
	'\u0000',
	'\ud800',
	'__proto__',
	'constructor',
	'toString',
	'x'.repeat(100_000),
	'🙂'.repeat(50),
	'0x10',
	'1e999',
	'NaN',
	'-Infinity',
	'<script>alert(1)</script>',
	'../../etc/passwd',
	'D65 ',
	'd65',
	'F7'
];

const NUMBERS = [
	0,
	-0,
	1,
	-1,
	0.5,
	2,
	3,
	1e-300,
	-1e-300,
	5e-324,
	1e8,
	1e18,
	-1e20,
	1e300,
	-1e300,
	Number.MAX_SAFE_INTEGER,
	2 ** 31,
	-273.15,
	-300,
	1000,
	255,
	256,
	257,
	1e6
];

export interface FuzzCase {
	label: string;
	bytes: Uint8Array;
}

const encoder = new TextEncoder();
const demoText = serializeDesign(demoDesign());

function pick<T>(rand: () => number, list: readonly T[]): T {
	return list[Math.floor(rand() * list.length)];
}

function deepNest(depth: number, asArray: boolean): string {
	return asArray
		? '['.repeat(depth) + ']'.repeat(depth)
		: '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);
}

function randomValue(rand: () => number, depth = 0): Json {
	const r = rand();
	if (depth > 4 || r < 0.3) return pick(rand, NUMBERS);
	if (r < 0.45) return pick(rand, HOSTILE_STRINGS);
	if (r < 0.5) return rand() < 0.5;
	if (r < 0.55) return null;
	if (r < 0.75)
		return Array.from({ length: Math.floor(rand() * 5) }, () => randomValue(rand, depth + 1));
	const obj: { [key: string]: Json } = {};
	for (let i = Math.floor(rand() * 5); i > 0; i--)
		obj[pick(rand, ['a', 'x', 'name', 'format', 'version', '__proto__', 'constructor'])] =
			randomValue(rand, depth + 1);
	return obj;
}

/** Every [container, key] inside a JSON value, so a mutation can land anywhere. */
function slots(root: Json): [Json[] | { [key: string]: Json }, string | number][] {
	const out: [Json[] | { [key: string]: Json }, string | number][] = [];
	const stack: Json[] = [root];
	while (stack.length > 0) {
		const node = stack.pop();
		if (Array.isArray(node)) {
			node.forEach((v, i) => {
				out.push([node, i]);
				stack.push(v);
			});
		} else if (node && typeof node === 'object') {
			for (const k of Object.keys(node)) {
				out.push([node, k]);
				stack.push(node[k]);
			}
		}
	}
	return out;
}

function mutateDemo(rand: () => number): string {
	const doc = JSON.parse(demoText) as Json;
	const places = slots(doc);
	let deep = '';
	for (let n = 1 + Math.floor(rand() * 3); n > 0; n--) {
		const [container, key] = pick(rand, places);
		const kind = rand();
		const record = container as Record<string | number, Json>;
		if (kind < 0.35) record[key] = pick(rand, NUMBERS);
		else if (kind < 0.5) record[key] = pick(rand, HOSTILE_STRINGS);
		else if (kind < 0.6 && !Array.isArray(container)) delete record[key];
		else if (kind < 0.7) record[key] = randomValue(rand);
		else if (kind < 0.75) {
			// Spliced in as text below: JSON.stringify itself recurses and cannot build it.
			deep = deepNest(100 + Math.floor(rand() * 5000), rand() < 0.5);
			record[key] = DEEP_MARK;
		} else if (kind < 0.8 && !Array.isArray(container))
			record[pick(rand, ['extra', '__proto__', 'constructor'])] = 1;
		else if (typeof record[key] === 'number')
			record[key] = (record[key] as number) * pick(rand, [-1, 1e6, 1e-6, 1e300]);
		else record[key] = null;
	}
	const text = JSON.stringify(doc);
	return deep ? text.replace(`"${DEEP_MARK}"`, deep) : text;
}

const DEEP_MARK = '(deep)';

function utf16(text: string, littleEndian: boolean, bom: boolean): Uint8Array {
	const start = bom ? 2 : 0;
	const out = new Uint8Array(start + text.length * 2);
	if (bom) out.set(littleEndian ? [0xff, 0xfe] : [0xfe, 0xff]);
	const view = new DataView(out.buffer);
	for (let i = 0; i < text.length; i++)
		view.setUint16(start + 2 * i, text.charCodeAt(i), littleEndian);
	return out;
}

function oddEncoding(rand: () => number, text: string): Uint8Array {
	const r = rand();
	if (r < 0.2) return new Uint8Array([0xef, 0xbb, 0xbf, ...encoder.encode(text)]);
	if (r < 0.4) return utf16(text, rand() < 0.5, rand() < 0.8);
	const bytes = encoder.encode(text);
	if (r < 0.6) return bytes.slice(0, Math.floor(rand() * bytes.length));
	const flipped = bytes.slice();
	for (let n = 1 + Math.floor(rand() * 4); n > 0; n--)
		flipped[Math.floor(rand() * flipped.length)] = Math.floor(rand() * 256);
	return flipped;
}

export function fuzzCase(index: number): FuzzCase {
	const rand = prng(0x5eed + index * 7919);
	const r = rand();
	if (r < 0.55) return { label: `mutation #${index}`, bytes: encoder.encode(mutateDemo(rand)) };
	if (r < 0.7) {
		const value = randomValue(rand);
		const doc =
			rand() < 0.5 && value && typeof value === 'object' && !Array.isArray(value)
				? { ...value, format: 'sunglyph-design', version: pick(rand, [1, 2, 3, 4, 1e9, -1, 2.5]) }
				: value;
		return { label: `structure #${index}`, bytes: encoder.encode(JSON.stringify(doc)) };
	}
	if (r < 0.75) {
		const deep = deepNest(1000 + Math.floor(rand() * 100_000), rand() < 0.5);
		return { label: `deep #${index}`, bytes: encoder.encode(deep) };
	}
	const text = rand() < 0.5 ? demoText : mutateDemo(rand);
	return { label: `encoding #${index}`, bytes: oddEncoding(rand, text) };
}
