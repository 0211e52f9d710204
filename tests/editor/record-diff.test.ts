import { describe, expect, it } from 'vitest';
import { diffRecords } from '$lib/editor/record-diff';

const rec = (id: string, v = 0) => ({ id, v });

describe('record diff', () => {
	it('finds added, changed and removed records by identity', () => {
		const a = rec('a');
		const b = rec('b');
		const c = rec('c');
		const previous = new Map([
			['a', a],
			['b', b],
			['c', c]
		]);
		const b2 = { ...b, v: 1 };
		const d = rec('d');
		const diff = diffRecords(previous, [a, b2, d]);
		expect(diff.added).toEqual([d]);
		expect(diff.changed).toEqual([b2]);
		expect(diff.removed).toEqual(['c']);
		expect(diff.reordered).toBe(false);
	});

	it('reports nothing for the same list and notices a new order', () => {
		const list = [rec('a'), rec('b'), rec('c')];
		const previous = new Map(list.map((r) => [r.id, r]));
		expect(diffRecords(previous, list)).toEqual({
			added: [],
			changed: [],
			removed: [],
			reordered: false
		});
		expect(diffRecords(previous, [list[2], list[0], list[1]]).reordered).toBe(true);
	});

	it('treats an equal but new object as changed', () => {
		const a = rec('a');
		const diff = diffRecords(new Map([['a', a]]), [{ ...a }]);
		expect(diff.changed).toHaveLength(1);
	});
});
