/**
 * A synthetic glass for the glass benchmarks: `count` small bar electrodes on a grid, four
 * commons by row, one segment line per four electrodes, pins along the bottom edge.
 */
import { demoDesign } from '../src/lib/core/design/demo';
import { DEFAULT_GLASS_ART } from '../src/lib/core/design/glass-art-schema';
import type { Design, Electrode } from '../src/lib/core/design/schema';

export function benchGlassDesign(count: number): Design {
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
		const x = 6 + col * 2.4;
		const y = 4 + row * 2.2;
		electrodes.push({
			id: `b${i}`,
			name: `B${i}`,
			kind: 'segment',
			outline: [
				{ x, y },
				{ x: x + 1.4, y },
				{ x: x + 1.4, y: y + 0.8 },
				{ x, y: y + 0.8 }
			],
			holes: [],
			common: `com${(row % 4) + 1}`,
			line: `seg${Math.floor(row / 4) * columns + col + 1}`,
			locked: false
		});
	}
	const used = [...new Set(electrodes.map((e) => e.line as string))];
	return {
		...demo,
		name: 'bench glass',
		glass: {
			width_mm,
			height_mm,
			viewingArea: { x_mm: 4, y_mm: 2.5, width_mm: width_mm - 8, height_mm: height_mm - 9 }
		},
		segmentLines: used.map((id) => ({ id, name: id.toUpperCase() })),
		electrodes,
		groups: [],
		pinout: { ...demo.pinout, pitch_mm: 0.5 },
		// The default glass settings (0.1 mm leads and margins), whatever the demo uses.
		glassArt: { ...DEFAULT_GLASS_ART, transfers: [], traces: [] }
	};
}
