/**
 * Synthetic glasses for the glass benchmarks.
 *
 * `benchGlassDesign`: a column bar graph at 1/8 duty, the way multiplexed level-meter glass is laid
 * out: eight bar steps per column, one common per step row (its back plates joined along the row
 * and out at the sides), one segment line per column (its steps joined up the column and down to
 * the pin right below it). Pins along the bottom at the column pitch (2.2 mm), commons split to
 * both ends. `count` electrodes: full columns, and the last one as full as the count allows.
 *
 * `crowdedGlassDesign`: a stress case the router cannot finish: 4 commons by row over
 * 20 rows of small bars, one segment line per four bars stacked in a column, 0.5 mm pins. Most
 * leads must cross other rows' buses in the viewing area and the pin row is narrower than the
 * columns; it times the router where it gives up.
 */
import { demoDesign } from '../src/lib/core/design/demo';
import { DEFAULT_GLASS_ART } from '../src/lib/core/design/glass-art-schema';
import type { Design, Electrode } from '../src/lib/core/design/schema';

const box = (x: number, y: number, w: number, h: number) => [
	{ x, y },
	{ x: x + w, y },
	{ x: x + w, y: y + h },
	{ x, y: y + h }
];

export function benchGlassDesign(count: number): Design {
	const demo = demoDesign();
	const steps = 8;
	const columns = Math.ceil(count / steps);
	// Pins at the column pitch, each column's pin right under it: half the commons at each end.
	const pitch_mm = 2.2;
	const pins = columns + steps;
	const width_mm = pins * pitch_mm + 12;
	const firstPin_mm = (width_mm - pins * pitch_mm) / 2 + pitch_mm / 2;
	const left_mm = firstPin_mm + (steps / 2) * pitch_mm - 0.8;
	const top_mm = 6;
	const rowPitch_mm = 1.5;
	const height_mm = top_mm + steps * rowPitch_mm + 14;
	// Commons split to both ends of the pin row: COM1–4 on the left for the lower four steps (COM1
	// lowest), COM5–8 on the right for the upper four (COM8 lowest), so each side's common leads
	// nest from the corner out without crossing.
	const commonOfStep = (step: number) => (step < steps / 2 ? step + 1 : steps + steps / 2 - step);
	const electrodes: Electrode[] = [];
	for (let col = 0; col < columns; col++)
		for (let step = 0; step < Math.min(steps, count - col * steps); step++)
			electrodes.push({
				id: `c${col + 1}s${step + 1}`,
				name: `C${col + 1}S${step + 1}`,
				kind: 'segment',
				// Step 1 at the bottom: the column fills upwards.
				outline: box(left_mm + col * pitch_mm, top_mm + (steps - 1 - step) * rowPitch_mm, 1.6, 1),
				holes: [],
				common: `com${commonOfStep(step)}`,
				line: `seg${col + 1}`,
				locked: false
			});
	return {
		...demo,
		name: 'bench column graph',
		glass: {
			width_mm,
			height_mm,
			viewingArea: { x_mm: 4, y_mm: 3, width_mm: width_mm - 8, height_mm: height_mm - 10 }
		},
		commons: Array.from({ length: steps }, (_, i) => ({ id: `com${i + 1}`, name: `COM${i + 1}` })),
		segmentLines: Array.from({ length: columns }, (_, i) => ({
			id: `seg${i + 1}`,
			name: `SEG${i + 1}`
		})),
		electrodes,
		groups: [],
		drive: { ...demo.drive, commons: steps, biasDivisor: 4 },
		pinout: { edge: 'bottom', order: 'commons-split', pitch_mm },
		// The default glass settings (0.1 mm leads and margins), whatever the demo uses.
		glassArt: { ...DEFAULT_GLASS_ART, transfers: [], traces: [] }
	};
}

export function crowdedGlassDesign(count: number): Design {
	const demo = demoDesign();
	const columns = 25;
	const rows = Math.ceil(count / columns);
	const lines = Math.ceil(count / 4);
	const width_mm = Math.max(70, lines * 0.5 + 20);
	const height_mm = rows * 2.2 + 14;
	const electrodes: Electrode[] = [];
	for (let i = 0; i < count; i++) {
		const col = i % columns;
		const row = Math.floor(i / columns);
		electrodes.push({
			id: `b${i}`,
			name: `B${i}`,
			kind: 'segment',
			outline: box(6 + col * 2.4, 4 + row * 2.2, 1.4, 0.8),
			holes: [],
			common: `com${(row % 4) + 1}`,
			line: `seg${Math.floor(row / 4) * columns + col + 1}`,
			locked: false
		});
	}
	const used = [...new Set(electrodes.map((e) => e.line as string))];
	return {
		...demo,
		name: 'crowded bench glass',
		glass: {
			width_mm,
			height_mm,
			viewingArea: { x_mm: 4, y_mm: 2.5, width_mm: width_mm - 8, height_mm: height_mm - 9 }
		},
		segmentLines: used.map((id) => ({ id, name: id.toUpperCase() })),
		electrodes,
		groups: [],
		pinout: { ...demo.pinout, pitch_mm: 0.5 },
		glassArt: { ...DEFAULT_GLASS_ART, transfers: [], traces: [] }
	};
}
