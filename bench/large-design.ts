/**
 * A large synthetic design for speed figures: rows of slanted 7-segment digits with decimal
 * points (8 electrodes each) plus a bar graph filling up to the requested electrode count, on a
 * glass sized to hold them, wired two lines per digit on four commons.
 */
import { demoDesign } from '../src/lib/core/design/demo';
import type { Design, Electrode } from '../src/lib/core/design/schema';
import { generateSevenSegment } from '../src/lib/core/glyphs/seven-segment';
import { generateBarGraph } from '../src/lib/core/glyphs/bar-graph';

export function largeDesign(electrodeCount: number): Design {
	const base = demoDesign();
	const digits = Math.floor(electrodeCount / 8);
	const perRow = 12;
	const rows = Math.ceil(digits / perRow);
	const electrodes: Electrode[] = [];
	const groups: Design['groups'] = [];
	const commons = ['com1', 'com2', 'com3', 'com4'];
	for (let d = 0; d < digits; d++) {
		const x_mm = 5 + (d % perRow) * 10;
		const y_mm = 5 + Math.floor(d / perRow) * 16;
		const generated = generateSevenSegment({
			x_mm,
			y_mm,
			height_mm: 12,
			width_mm: 7,
			stroke_mm: 1.5,
			gap_mm: 0.12,
			slant_deg: 6,
			decimalPoint: true
		});
		const members = generated.parts.map((part, k) => {
			const id = `d${d}${part.key}`;
			electrodes.push({
				id,
				name: id,
				kind: 'segment',
				outline: part.outline,
				holes: [],
				common: commons[k % 4],
				line: `s${2 * d + (k >> 2)}`,
				locked: false
			});
			return id;
		});
		groups.push({
			id: `digit${d}`,
			name: `Digit ${d}`,
			members,
			generator: { kind: generated.kind, params: generated.params }
		});
	}
	const bars = electrodeCount - electrodes.length;
	if (bars > 0) {
		const bar = generateBarGraph({
			count: bars,
			x_mm: 5,
			y_mm: 5 + rows * 16,
			width_mm: 4,
			height_mm: 2,
			spacing_mm: 0.6,
			direction: 'right',
			shape: 'rectangle'
		});
		bar.parts.forEach((part, k) => {
			const id = `bar${k}`;
			electrodes.push({
				id,
				name: id,
				kind: 'icon',
				outline: part.outline,
				holes: [],
				common: commons[k % 4],
				line: `b${k >> 2}`,
				locked: false
			});
		});
	}
	const lines = [...new Set(electrodes.map((e) => e.line as string))];
	const width_mm = Math.max(10 + perRow * 10, 10 + bars * 4.6);
	const height_mm = 10 + rows * 16 + 8;
	return {
		...base,
		name: `${electrodeCount} electrodes`,
		glass: {
			width_mm,
			height_mm,
			viewingArea: { x_mm: 2, y_mm: 2, width_mm: width_mm - 4, height_mm: height_mm - 4 }
		},
		commons: commons.map((id) => ({ id, name: id.toUpperCase() })),
		segmentLines: lines.map((id) => ({ id, name: id.toUpperCase() })),
		electrodes,
		groups
	};
}
