/**
 * A ghost lit by a lead names its electrodes: the electrodes the lead serves, the electrode of the
 * (common, line) pair it lights with where the design has one, and the electrodes whose back plate
 * it crosses — also where it crosses a common-plate lead rather than a plate piece. Areas are
 * worked by hand: trace width × crossing length.
 */
import { describe, expect, it } from 'vitest';
import type { Trace } from '../../src/lib/core/design/glass-art-schema';
import type { Design } from '../../src/lib/core/design/schema';
import { checkGlass } from '../../src/lib/core/glass/check-glass';
import { expectWithin } from '../helpers/tolerance';
import { electrode } from '../commands/fixtures';
import { twoElectrodeGlass } from './fixture';

const lead = (id: string, plate: Trace['plate'], net: string, width_mm: number, pts: number[]) => ({
	id,
	plate,
	net,
	width_mm,
	points: Array.from({ length: pts.length / 2 }, (_, i) => ({ x: pts[2 * i], y: pts[2 * i + 1] }))
});

function withTraces(d: Design, traces: Trace[]): Design {
	return { ...d, glassArt: { ...d.glassArt, traces } };
}

function visibleGhost(d: Design) {
	const report = checkGlass(d);
	const found = report.findings.filter((f) => f.code === 'glass.ghost-visible');
	expect(found).toHaveLength(1);
	return { finding: found[0], ghosts: report.ghosts.filter((g) => g.where === 'visible') };
}

// E1 (COM1, SEG1) spans 5–10 × 5–8, E2 (COM2, SEG2) 15–20 × 5–8; COM2's piece is E2 grown by
// 0.1 mm: 14.9–20.1 × 4.9–8.1. This SEG1 lead leaves E1 at (9.9, 6.5), climbs above the plates and
// comes down at x = 14.95 (band 14.93–14.97) right across COM2's piece from y = 4 to y = 9.
const acrossPiece = lead(
	'hand',
	'segment',
	'seg1',
	0.04,
	[9.9, 6.5, 12, 6.5, 12, 4, 14.95, 4, 14.95, 9]
);

/** E3 on (COM2, SEG1), far from the crossings: it switches together with any (COM2, SEG1) ghost. */
const e3 = electrode(
	'e3',
	[
		{ x: 22, y: 10 },
		{ x: 25, y: 10 },
		{ x: 25, y: 12 },
		{ x: 22, y: 12 }
	],
	{ common: 'com2', line: 'seg1' }
);

/** The two-electrode glass with E3, so that (COM2, SEG1) drives an electrode. */
function withPair(): Design {
	const d = twoElectrodeGlass();
	return { ...d, electrodes: [...d.electrodes, e3] };
}

describe('ghost findings of a lead', () => {
	it("name the lead's electrode, the pair's electrode and the electrode whose plate it crosses", () => {
		const { finding, ghosts } = visibleGhost(withTraces(withPair(), [acrossPiece]));
		expect(finding.message).toContain('(COM2, SEG1)');
		expect([...finding.electrodes].sort()).toEqual(['e1', 'e2', 'e3']);
		expectWithin([{ label: 'overlap', expected: 0.04 * 3.2, actual: ghosts[0].area_mm2 }], {
			tolerance: 1e-9,
			unit: 'mm²',
			source: 'hand calculation: 0.04 mm width × 3.2 mm across the grown plate (4.9 to 8.1)'
		});
	});

	it('name the same electrodes on an idle crossing, whose pair drives nothing', () => {
		const report = checkGlass(withTraces(twoElectrodeGlass(), [acrossPiece]));
		expect(report.findings.some((f) => f.code === 'glass.ghost-visible')).toBe(false);
		const idle = report.findings.filter((f) => f.code === 'glass.ghost-idle');
		expect(idle).toHaveLength(1);
		expect(idle[0].severity).toBe('pass');
		expect([...idle[0].electrodes].sort()).toEqual(['e1', 'e2']);
	});

	it('name the electrodes a crossed common-plate lead joins', () => {
		// COM2's lead from inside its piece down to y = 12.5, 0.1 mm wide (band 17.45–17.55); a SEG1
		// lead leaves E1 downwards and runs along y = 11, 0.04 mm wide, across it: 0.1 × 0.04 mm².
		const bus = lead('bus', 'common', 'com2', 0.1, [17.5, 8, 17.5, 12.5]);
		const low = lead('low', 'segment', 'seg1', 0.04, [7, 7, 7, 11, 19, 11]);
		const { finding, ghosts } = visibleGhost(withTraces(withPair(), [bus, low]));
		expect(finding.message).toContain('(COM2, SEG1)');
		expect([...finding.electrodes].sort()).toEqual(['e1', 'e2', 'e3']);
		expectWithin([{ label: 'overlap', expected: 0.004, actual: ghosts[0].area_mm2 }], {
			tolerance: 1e-9,
			unit: 'mm²',
			source: 'hand calculation: 0.1 mm bus × 0.04 mm lead'
		});
	});
});
