/**
 * Back plates, plate areas and ghost overlaps of electrodes with holes, worked by hand: a hole
 * shrinks by the margin while the outline grows, an overlap over a hole counts only the ITO, and
 * the overlap's centre of area decides where a ghost lies.
 */
import { describe, expect, it } from 'vitest';
import type { Design } from '../../src/lib/core/design/schema';
import { signedArea, ringCentroid } from '../../src/lib/core/geometry/polygon';
import { buildArtwork } from '../../src/lib/core/glass/artwork';
import { platePieces } from '../../src/lib/core/glass/back-plate-pieces';
import { ghostCheck } from '../../src/lib/core/glass/ghost-check';
import { netArea_mm2 } from '../../src/lib/core/glass/plate-area';
import { minimumGapBetweenRings } from '../../src/lib/core/geometry/minimum-gap';
import { expectWithin } from '../helpers/tolerance';
import { electrode } from '../commands/fixtures';
import { twoElectrodeGlass } from './fixture';

const box = (x: number, y: number, w: number, h: number) => [
	{ x, y },
	{ x: x + w, y },
	{ x: x + w, y: y + h },
	{ x, y: y + h }
];

/** The two-electrode glass with E2 replaced by a 6 × 6 mm frame (COM2, SEG2) around a 2 × 2 mm hole. */
function withFrame(): Design {
	const d = twoElectrodeGlass();
	const frame = electrode('frame', box(15, 4, 6, 6), {
		common: 'com2',
		line: 'seg2',
		holes: [box(17, 6, 2, 2)]
	});
	return { ...d, electrodes: [d.electrodes[0], frame] };
}

describe('plate geometry with holes', () => {
	it('grows the outline and shrinks the hole by the margin', () => {
		const piece = platePieces(withFrame()).pieces.find((p) => p.electrode.id === 'frame')!;
		const area = piece.grown.reduce((s, r) => s + signedArea(r) * Math.sign(signedArea(r)), 0);
		const net = piece.grown.reduce((s, r) => s + signedArea(r), 0);
		// Outline 6.2 × 6.2 = 38.44 mm², hole 1.8 × 1.8 = 3.24 mm²: ITO 35.2 mm².
		expectWithin(
			[
				{ label: 'outline', expected: 38.44, actual: Math.abs(signedArea(piece.grown[0])) },
				{ label: 'rings, unsigned', expected: 38.44 + 3.24, actual: area },
				{ label: 'ITO (outline less hole)', expected: 35.2, actual: Math.abs(net) }
			],
			{ tolerance: 1e-9, unit: 'mm²', source: 'hand calculation: (6 + 0.2)² and (2 − 0.2)²' }
		);
	});

	it("counts a net's ITO once, holes left out", () => {
		const art = buildArtwork(withFrame());
		const com2 = art.common.find((n) => n.id === 'com2')!;
		// 35.2 mm² of back plate plus the default transfer point, a 16-gon inscribed in r = 0.25 mm
		// in the seal, clear of the frame: ½·16·r²·sin(2π/16) (regular polygon area).
		const dot = 0.5 * 16 * 0.25 ** 2 * Math.sin((2 * Math.PI) / 16);
		// Tolerance: the engine snaps the dot's slanted vertices to its 10 nm grid, an area error of
		// at most perimeter × 5 nm ≈ 1.6 mm × 5e-6 mm = 8e-6 mm².
		expectWithin([{ label: 'COM2 plate', expected: 35.2 + dot, actual: netArea_mm2(com2) }], {
			tolerance: 1e-5,
			unit: 'mm²',
			source: 'hand calculation: 6.2² − 1.8² plus a regular 16-gon'
		});
	});

	it('measures a lead across a plate with a hole as two islands of ITO only', () => {
		const d = withFrame();
		// A SEG1 lead 0.2 mm wide along y = 7 from x = 10 to x = 23 crosses COM2's grown frame
		// (14.9–21.1) and its shrunk hole (17.1–18.9): 2 × 0.2 × (6.2 − 1.8) / 2 = 0.44 mm² each side.
		const hand = {
			...d,
			glassArt: {
				...d.glassArt,
				traces: [
					{
						id: 'hand',
						plate: 'segment' as const,
						net: 'seg1',
						width_mm: 0.2,
						points: [
							{ x: 10, y: 7 },
							{ x: 23, y: 7 }
						]
					}
				]
			}
		};
		const ghosts = ghostCheck(hand, buildArtwork(hand)).filter((g) => g.conductor === 'hand');
		// No electrode uses (COM2, SEG1) here, so both islands are idle overlaps; the geometry is the same.
		expect(ghosts.map((g) => [g.commonName, g.lineName, g.where])).toEqual([
			['COM2', 'SEG1', 'idle'],
			['COM2', 'SEG1', 'idle']
		]);
		const centres = ghosts.map((g) => ringCentroid(g.ring).x).sort((a, b) => a - b);
		expectWithin(
			[
				{ label: 'left island', expected: 0.44, actual: ghosts[0].area_mm2 },
				{ label: 'right island', expected: 0.44, actual: ghosts[1].area_mm2 },
				// Centres of the two 2.2 × 0.2 mm strips: x = (14.9 + 17.1) / 2 and (18.9 + 21.1) / 2.
				{ label: 'left centre x', expected: 16, actual: centres[0] },
				{ label: 'right centre x', expected: 20, actual: centres[1] }
			],
			{ tolerance: 1e-9, unit: 'mm² / mm', source: 'hand calculation: 2.2 mm × 0.2 mm strips' }
		);
	});
});

describe('centre of area', () => {
	it('of a right triangle lies at a third of each leg', () => {
		// Triangle (0, 0), (3, 0), (0, 6): centroid (1, 2), the mean of the vertices (standard result).
		const c = ringCentroid(Float64Array.of(0, 0, 3, 0, 0, 6));
		expectWithin(
			[
				{ label: 'x', expected: 1, actual: c.x },
				{ label: 'y', expected: 2, actual: c.y }
			],
			{ tolerance: 1e-12, unit: 'mm', source: 'triangle centroid = vertex mean (standard result)' }
		);
	});

	it('of an L-shape weights each arm by its area', () => {
		// L of a 4 × 1 bar (centre (2, 0.5), area 4) and a 1 × 3 bar above it (centre (0.5, 2.5),
		// area 3): centroid ((8 + 1.5) / 7, (2 + 7.5) / 7) (composite-area rule).
		const c = ringCentroid(Float64Array.of(0, 0, 4, 0, 4, 1, 1, 1, 1, 4, 0, 4));
		expectWithin(
			[
				{ label: 'x', expected: 9.5 / 7, actual: c.x },
				{ label: 'y', expected: 9.5 / 7, actual: c.y }
			],
			{ tolerance: 1e-12, unit: 'mm', source: 'composite-area centroid, worked by hand' }
		);
	});
});

describe('back plates cut back next to another common', () => {
	it('keep at least the minimum gap along slanted edges', () => {
		const d = twoElectrodeGlass();
		// Two parallelograms whose facing edges run along (1, 3)/√10, 0.2 mm apart: a shift of
		// 0.2·√10/3 mm in x. Margin 0.1 mm each plus the 0.05 mm gap would need 0.25 mm, so each margin
		// is cut to about (0.2 − 0.05)/2 and the plates must still be 0.05 mm apart.
		const dx = (0.2 * Math.sqrt(10)) / 3;
		const slanted = (x: number) => [
			{ x, y: 5 },
			{ x: x + 5, y: 5 },
			{ x: x + 6, y: 8 },
			{ x: x + 1, y: 8 }
		];
		const pair = {
			...d,
			electrodes: [
				{ ...d.electrodes[0], outline: slanted(5) },
				{ ...d.electrodes[1], outline: slanted(10 + dx) }
			]
		};
		const { pieces, conflicts } = platePieces(pair);
		expect(conflicts.map((c) => c.touching)).toEqual([false]);
		const gap = minimumGapBetweenRings([pieces[0].grown[0]], [pieces[1].grown[0]]);
		expect(gap).toBeGreaterThanOrEqual(pair.rules.minGap_mm);
		expect(gap).toBeLessThan(pair.rules.minGap_mm + 1e-4);
	});
});
