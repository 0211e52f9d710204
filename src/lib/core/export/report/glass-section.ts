/**
 * The report's glass section: outline and viewing area, seal, contact ledge, pad count, back-plate
 * count and the ghosts (front/back ITO overlaps) with where they lie. Millimetres and mm².
 */
import { hasGlassDrawing } from '../../glass/glass-in-check';
import type { Design } from '../../design/schema';
import type { GlassReport } from '../../glass/check-glass';
import { fixed, htmlTable } from './html-text';

const PLACE = {
	visible: 'in the viewing area',
	bezel: 'behind the bezel',
	seal: 'under the seal',
	idle: 'over an unused pair (stays dark)'
};

export function glassSection(options: { design: Design; glass: GlassReport }): string {
	const { design, glass } = options;
	const { seal, ledge } = design.glassArt;
	const layout = glass.artwork.layout;
	const plates = glass.artwork.common.reduce(
		(n, net) => n + net.conductors.filter((c) => c.kind === 'plate').length,
		0
	);
	const summary = htmlTable({
		head: ['Feature', 'Value'],
		numericFrom: 1,
		rows: [
			['Outline', `${fixed(design.glass.width_mm, 2)} × ${fixed(design.glass.height_mm, 2)} mm`],
			[
				'Seal',
				`${fixed(seal.width_mm, 2)} mm wide, ${fixed(seal.inset_mm, 2)} mm in, fill gap ${fixed(seal.fillGap_mm, 1)} mm`
			],
			[
				'Ledge',
				`${fixed(ledge.depth_mm, 2)} mm, ${design.pinout.edge} edge, ${ledge.connector} connector`
			],
			['Pads', `${layout.pads.length} at ${fixed(design.pinout.pitch_mm, 2)} mm pitch`],
			['Back plates', `${plates} on ${glass.artwork.common.length} commons`],
			['Leads', String(design.glassArt.traces.length)],
			[
				'Ghosts',
				hasGlassDrawing(design)
					? String(glass.ghosts.filter((g) => g.where !== 'idle').length)
					: '—'
			]
		]
	});
	if (!hasGlassDrawing(design))
		return (
			summary +
			'<p>No leads or transfer points yet: the glass check (opens, shorts, ghosts) starts once they are generated or drawn.</p>'
		);
	if (glass.ghosts.length === 0) return summary;
	const ghosts = htmlTable({
		head: ['Ghosts', 'Common × segment line', 'Count', 'Area (mm²)'],
		numericFrom: 2,
		rows: ghostRows(glass).map((g) => [
			PLACE[g.where],
			g.pairs.join(', '),
			String(g.count),
			fixed(g.area_mm2, 4)
		])
	});
	return `${summary}\n${ghosts}`;
}

/** Ghosts summed by where they lie (visible first), with the crossings that cause them. */
function ghostRows(glass: GlassReport) {
	const rows = (['visible', 'bezel', 'seal', 'idle'] as const).map((where) => {
		const ghosts = glass.ghosts.filter((g) => g.where === where);
		return {
			where,
			count: ghosts.length,
			area_mm2: ghosts.reduce((sum, g) => sum + g.area_mm2, 0),
			pairs: [...new Set(ghosts.map((g) => `${g.commonName} × ${g.lineName}`))]
		};
	});
	return rows.filter((r) => r.count > 0);
}
