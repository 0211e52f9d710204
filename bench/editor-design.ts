/**
 * The bench's 300-electrode design, built with the core generators and commands: three rows of
 * ten 7-segment digits with decimal points (240 electrodes) and a 60-bar graph, inserted as
 * generated groups and wired round-robin to 4 commons and 75 segment lines like a real
 * multiplexed panel.
 */
import { demoDesign } from '../src/lib/core/design/demo';
import type { Design } from '../src/lib/core/design/schema';
import { layoutText } from '../src/lib/core/glyphs/text-layout';
import { generateBarGraph } from '../src/lib/core/glyphs/bar-graph';
import { insertGenerated } from '../src/lib/core/commands/insert-generated';
import { assignElectrodes } from '../src/lib/core/commands/assign-electrodes';
import { applyPatch, type Patch } from '../src/lib/core/commands/patch';

export const BENCH_ELECTRODES = 300;

export function benchDesign(): Design {
	const base = demoDesign();
	let design: Design = {
		...base,
		name: 'Bench panel, 300 electrodes',
		glass: {
			width_mm: 140,
			height_mm: 70,
			viewingArea: { x_mm: 3, y_mm: 3, width_mm: 134, height_mm: 64 }
		},
		commons: Array.from({ length: 4 }, (_, i) => ({ id: `com${i + 1}`, name: `COM${i + 1}` })),
		segmentLines: Array.from({ length: BENCH_ELECTRODES / 4 }, (_, i) => ({
			id: `seg${i + 1}`,
			name: `SEG${i + 1}`
		})),
		electrodes: [],
		groups: [],
		drive: { ...base.drive, commons: 4 }
	};
	const apply = (edit: (d: Design) => Patch) => (design = applyPatch(design, edit(design)));
	for (const row of [0, 1, 2]) {
		const generated = layoutText({
			text: '8.8.8.8.8.8.8.8.8.8.',
			x_mm: 6,
			y_mm: 6 + row * 16,
			height_mm: 12,
			width_mm: 6.5,
			stroke_mm: 1.2,
			gap_mm: 0.12,
			slant_deg: 6
		});
		apply((d) => insertGenerated(d, { generated, groupId: `row${row + 1}` }));
	}
	const bars = generateBarGraph({
		count: 60,
		x_mm: 6,
		y_mm: 56,
		width_mm: 1.2,
		height_mm: 6,
		spacing_mm: 0.35
	});
	apply((d) => insertGenerated(d, { generated: bars, groupId: 'bars' }));
	design.electrodes.forEach((e, n) =>
		apply((d) =>
			assignElectrodes(d, {
				ids: [e.id],
				common: `com${(n % 4) + 1}`,
				line: `seg${Math.floor(n / 4) + 1}`
			})
		)
	);
	if (design.electrodes.length !== BENCH_ELECTRODES)
		throw new Error(
			`bench design has ${design.electrodes.length} electrodes, expected ${BENCH_ELECTRODES}`
		);
	return design;
}
