/**
 * A large design for the wiring figures: 60 slanted 7-segment digits with points (480 electrodes)
 * in 6 rows, and 20 loose square icons: 500 electrodes, unwired.
 */
import type { Design, Electrode } from '../src/lib/core/design/schema';
import { demoDesign } from '../src/lib/core/design/demo';
import { generateSevenSegment } from '../src/lib/core/glyphs/seven-segment';

export function wiringBenchDesign(): Design {
	const electrodes: Electrode[] = [];
	const groups: Design['groups'] = [];
	for (let k = 0; k < 60; k++) {
		const x_mm = 5 + (k % 10) * 10;
		const y_mm = 5 + Math.floor(k / 10) * 16;
		const digit = generateSevenSegment({
			x_mm,
			y_mm,
			height_mm: 12,
			width_mm: 7,
			stroke_mm: 1.5,
			gap_mm: 0.12,
			slant_deg: 6,
			decimalPoint: true
		});
		const members = digit.parts.map((part) => {
			const id = `g${k}.${part.key}`;
			electrodes.push({
				id,
				name: `${k}${part.key}`,
				kind: 'segment',
				outline: part.outline,
				holes: [],
				common: null,
				line: null,
				locked: false
			});
			return id;
		});
		groups.push({ id: `g${k}`, name: `Digit ${k + 1}`, members });
	}
	for (let i = 0; i < 20; i++) {
		const x = 5 + i * 5;
		electrodes.push({
			id: `icon${i}`,
			name: `Icon ${i + 1}`,
			kind: 'icon',
			outline: [
				{ x, y: 102 },
				{ x: x + 3, y: 102 },
				{ x: x + 3, y: 105 },
				{ x, y: 105 }
			],
			holes: [],
			common: null,
			line: null,
			locked: false
		});
	}
	const demo = demoDesign();
	return {
		...demo,
		glass: {
			width_mm: 110,
			height_mm: 112,
			viewingArea: { x_mm: 2, y_mm: 2, width_mm: 106, height_mm: 108 }
		},
		commons: [],
		segmentLines: [],
		electrodes,
		groups
	};
}
