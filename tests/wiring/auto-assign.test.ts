/**
 * Automatic wiring on the demo and on small crafted designs. The line counts per character are the
 * trade's arithmetic for multiplexed glass (common practice): a character of k electrodes on N
 * commons needs ⌈k/N⌉ segment lines, so a 7-segment digit with its point (8 electrodes) takes 2 at
 * 4 commons, 3 at 3, 4 at 2, 1 at 8 and 8 at static drive.
 */
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { autoAssign } from '../../src/lib/core/commands/auto-assign';
import { clearWiring } from '../../src/lib/core/commands/clear-wiring';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import { History } from '../../src/lib/core/commands/history';
import { CommandError } from '../../src/lib/core/commands/command-error';
import { crossingMatrix } from '../../src/lib/core/wiring/crossing-matrix';
import { analyzeWiring } from '../../src/lib/core/drive/analyze-drive';
import { analyzeDesign, analyzeDesignWithCell } from '../../src/lib/core/analyze-design';
import { electrode, emptyDesign, square } from '../commands/fixtures';

/**
 * The demo with its wiring cleared. Its glass drawing belongs to the old wiring, so it goes too,
 * and the pins sit at 1 mm: static drive needs 54 of them on the 66 mm edge.
 */
const cleared = (): Design => {
	const demo = demoDesign();
	const bare: Design = {
		...demo,
		pinout: { ...demo.pinout, pitch_mm: 1 },
		glassArt: { ...demo.glassArt, traces: [], transfers: [] }
	};
	return applyPatch(bare, clearWiring(bare));
};
const assigned = (design: Design, commons: number) =>
	applyPatch(design, autoAssign(design, { commons }));
const digits = (d: Design) => d.groups.filter((g) => g.id.startsWith('digit'));
const linesOf = (d: Design, ids: readonly string[]) =>
	new Set(ids.map((id) => d.electrodes.find((e) => e.id === id)!.line));
const commonIndexOf = (d: Design, id: string) =>
	d.commons.findIndex((c) => c.id === d.electrodes.find((e) => e.id === id)!.common);

describe('automatic wiring of the demo', () => {
	it('clearing leaves every electrode unassigned', () => {
		const d = cleared();
		expect(d.electrodes.every((e) => e.common === null && e.line === null)).toBe(true);
		expect(analyzeWiring(d).severity).toBe('fail');
	});

	it('at 4 commons puts each digit on 2 lines with no conflict, and the check passes', () => {
		const d = assigned(cleared(), 4);
		for (const g of digits(d)) expect(linesOf(d, g.members).size, g.id).toBe(2);
		const matrix = crossingMatrix(d);
		expect(matrix.conflicting.size).toBe(0);
		expect(matrix.unassigned).toEqual([]);
		expect(d.commons).toHaveLength(4);
		expect(d.drive.commons).toBe(4);
		// 4 digits × 2 + moisture bar ⌈10/4⌉ + 11 ungrouped electrodes ⌈11/4⌉ = 14 lines.
		expect(d.segmentLines).toHaveLength(14);
		expect(analyzeWiring(d).findings.map((f) => f.code)).toEqual(['wiring.ok']);
		expect(analyzeDesign(d).severity).not.toBe('fail');
		expect(analyzeDesignWithCell(d).severity).not.toBe('fail');
	});

	it.each([
		[1, 8],
		[2, 4],
		[3, 3],
		[8, 1],
		[16, 1]
	])('at %i commons puts each digit on %i lines, conflict-free', (commons, lines) => {
		const d = assigned(cleared(), commons);
		for (const g of digits(d)) expect(linesOf(d, g.members).size, g.id).toBe(lines);
		expect(crossingMatrix(d).conflicting.size).toBe(0);
		expect(analyzeWiring(d).severity).toBe('pass');
		expect(d.commons).toHaveLength(commons);
	});

	it('stacks the commons in horizontal bands: a higher segment never sits on a later common', () => {
		const d = assigned(cleared(), 4);
		for (const n of [1, 2, 3, 4]) {
			// a is the top bar, g the middle one, d the bottom one of the digit.
			expect(commonIndexOf(d, `d${n}a`)).toBe(0);
			expect(commonIndexOf(d, `d${n}g`)).toBeGreaterThan(commonIndexOf(d, `d${n}a`));
			expect(commonIndexOf(d, `d${n}d`)).toBe(3);
			expect(commonIndexOf(d, `d${n}e`)).toBe(commonIndexOf(d, `d${n}c`));
		}
		// Every digit uses the same common for the same segment, so bands run across the row.
		for (const key of ['a', 'b', 'c', 'd', 'e', 'f', 'g'])
			expect(new Set([1, 2, 3, 4].map((n) => commonIndexOf(d, `d${n}${key}`))).size).toBe(1);
	});

	it('is undone exactly', () => {
		const before = cleared();
		const history = new History(before);
		history.apply(autoAssign(before, { commons: 3 }), 'Assign automatically');
		expect(history.design).not.toEqual(before);
		history.undo();
		expect(history.design).toEqual(before);
		const patch = autoAssign(demoDesign(), { commons: 2 });
		expect(applyPatch(applyPatch(demoDesign(), patch), invertPatch(patch))).toEqual(demoDesign());
	});

	it('refuses a commons count outside 1–16, naming the field', () => {
		for (const n of [0, 17, 2.5, Number.NaN])
			expect(() => autoAssign(demoDesign(), { commons: n })).toThrow(CommandError);
		expect(() => autoAssign(demoDesign(), { commons: 0 })).toThrow(/commons/);
	});
});

describe('locked electrodes', () => {
	it('keep their crossing; the rest wire around them without conflict', () => {
		const demo = cleared();
		const base: Design = {
			...demo,
			electrodes: demo.electrodes.map((e) =>
				e.id === 'd1a'
					? { ...e, common: 'com3', line: 'seg5', locked: true }
					: e.id === 'rain'
						? { ...e, common: 'com1', line: 'seg1', locked: true }
						: e
			)
		};
		const d = assigned(base, 4);
		const a = d.electrodes.find((e) => e.id === 'd1a')!;
		const rain = d.electrodes.find((e) => e.id === 'rain')!;
		expect([a.common, a.line, a.locked]).toEqual(['com3', 'seg5', true]);
		expect([rain.common, rain.line]).toEqual(['com1', 'seg1']);
		expect(crossingMatrix(d).conflicting.size).toBe(0);
		expect(crossingMatrix(d).unassigned).toEqual([]);
		// Digit 1 fills its locked line's free crossings: still 2 lines.
		expect(linesOf(d, d.groups[0].members).size).toBe(2);
	});

	it('keep a common beyond the new count rather than dropping it', () => {
		const base: Design = {
			...emptyDesign(),
			commons: [1, 2, 3].map((k) => ({ id: `com${k}`, name: `COM${k}` })),
			segmentLines: [{ id: 'seg1', name: 'SEG1' }],
			electrodes: [
				electrode('x', square(0, 0), { common: 'com3', line: 'seg1', locked: true }),
				electrode('y', square(4, 0))
			]
		};
		const d = assigned(base, 2);
		expect(d.commons.map((c) => c.id)).toEqual(['com1', 'com2', 'com3']);
		expect(d.electrodes[0]).toBe(base.electrodes[0]);
		expect(d.electrodes[1].common).not.toBeNull();
	});
});

describe('records', () => {
	it('creates the commons and lines it needs and drops unused ones', () => {
		const base: Design = {
			...emptyDesign(),
			segmentLines: [1, 2, 3, 4, 5].map((k) => ({ id: `seg${k}`, name: `SEG${k}` })),
			electrodes: [0, 1, 2].map((k) => electrode(`e${k}`, square(4 * k, 0)))
		};
		const d = assigned(base, 3);
		expect(d.commons.map((c) => c.name)).toEqual(['COM1', 'COM2', 'COM3']);
		expect(d.segmentLines).toEqual([{ id: 'seg1', name: 'SEG1' }]);
		expect(new Set(d.electrodes.map((e) => e.common)).size).toBe(3);
	});

	it('wires an empty design to no lines without failing', () => {
		const d = assigned(emptyDesign(), 4);
		expect(d.commons).toHaveLength(4);
		expect(d.segmentLines).toEqual([]);
	});
});
