/**
 * The glass drawing on the canvas, in the plates layer under the electrodes: seal and ledge, each
 * common's back plate (its grown pieces and leads, in the common's colour), the segment plate's
 * leads, the pads and transfer points, and every ghost the check found, filled red so it stands
 * out at any zoom. A view of the core's artwork; rebuilt when the design changes.
 */
import type { GlassArtwork } from '$lib/core/glass/artwork';
import type { Ghost } from '$lib/core/glass/ghost-check';
import { ghostSwitches } from '$lib/core/glass/ghost-place';
import type { PaperScene } from './paper-scene';

type Ring = Float64Array;

export function drawGlassArt(
	scene: PaperScene,
	options: { art: GlassArtwork; ghosts: readonly Ghost[]; colourOf: (index: number) => string }
): void {
	const { scope } = scene;
	const layer = scene.layers.plates;
	scene.activate();
	layer.removeChildren();
	const path = (
		rings: readonly Ring[],
		style: { fill: string; alpha: number; stroke?: string }
	) => {
		const children = rings.map((ring) => {
			const segments: [number, number][] = [];
			for (let i = 0; i < ring.length; i += 2) segments.push([ring[i], ring[i + 1]]);
			return new scope.Path({ segments, closed: true, insert: false });
		});
		const item = new scope.CompoundPath({ children, insert: false });
		item.fillRule = 'evenodd';
		item.fillColor = new scope.Color(style.fill);
		item.fillColor.alpha = style.alpha;
		if (style.stroke) {
			item.strokeColor = new scope.Color(style.stroke);
			item.strokeWidth = 0.75;
			item.strokeScaling = false;
		}
		layer.addChild(item);
	};
	const rect = (r: { x_mm: number; y_mm: number; width_mm: number; height_mm: number }) =>
		Float64Array.of(
			r.x_mm,
			r.y_mm,
			r.x_mm + r.width_mm,
			r.y_mm,
			r.x_mm + r.width_mm,
			r.y_mm + r.height_mm,
			r.x_mm,
			r.y_mm + r.height_mm
		);
	const { art } = options;
	path(art.layout.sealParts.map(rect), { fill: '#9a8f70', alpha: 0.25 });
	path([rect(art.layout.ledge)], { fill: '#c8c3b0', alpha: 0.2, stroke: '#8d9086' });
	art.common.forEach((net, i) => {
		const colour = options.colourOf(i);
		for (const c of net.conductors)
			if (c.kind === 'plate')
				for (const r of c.rings.slice(0, 1))
					path([r], { fill: colour, alpha: 0.16, stroke: colour });
			else path(c.rings, { fill: colour, alpha: 0.55 });
	});
	for (const net of art.segment)
		for (const c of net.conductors)
			if (c.kind === 'trace') path(c.rings, { fill: '#3a3d44', alpha: 0.8 });
			else if (c.kind === 'pad') path(c.rings, { fill: '#b08a1a', alpha: 0.85 });
			else if (c.kind === 'transfer') path(c.rings, { fill: '#5a5f66', alpha: 0.6 });
	for (const g of options.ghosts)
		if (ghostSwitches(g)) path([g.ring], { fill: '#ff1a1a', alpha: 0.95, stroke: '#ff1a1a' });
}
