/**
 * Transfer points out of place, as findings. A transfer point carries a common from the back glass
 * to the front glass through conductive paste in the seal (common practice: the dots sit in the
 * seal line, where the two glasses are bonded and no fluid is): one whose dot does not lie wholly
 * under the seal is named — a warning where it still sits on the back glass (it would switch in
 * the fluid, or stand beyond the seal unsealed), a failure where it lies off the back glass and
 * can join nothing. Each concerns the electrodes on its common.
 */
import type { Transfer } from '../design/glass-art-schema';
import type { Design, Rect } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import type { GlassLayout } from './layout';
import { DRAW_REACH } from './trace-faults';

const within = (r: Rect, x: number, y: number, margin: number) =>
	x - margin >= r.x_mm &&
	y - margin >= r.y_mm &&
	x + margin <= r.x_mm + r.width_mm &&
	y + margin <= r.y_mm + r.height_mm;

const clear = (r: Rect, x: number, y: number, margin: number) =>
	x + margin <= r.x_mm ||
	y + margin <= r.y_mm ||
	x - margin >= r.x_mm + r.width_mm ||
	y - margin >= r.y_mm + r.height_mm;

/** Where a transfer point's dot lies: wholly under the seal, elsewhere on the back glass, or off it. */
export function transferPlace(t: Transfer, layout: GlassLayout): 'seal' | 'glass' | 'off' {
	const r = t.diameter_mm / 2;
	if (!within(layout.backGlass, t.x_mm, t.y_mm, r)) return 'off';
	const underSeal =
		within(layout.sealOuter, t.x_mm, t.y_mm, r) && clear(layout.sealInner, t.x_mm, t.y_mm, r);
	return underSeal ? 'seal' : 'glass';
}

export function transferFindings(design: Design, layout: GlassLayout): Finding[] {
	const names = new Map(design.commons.map((c) => [c.id, c.name || c.id]));
	const reach = DRAW_REACH * Math.max(layout.glass.width_mm, layout.glass.height_mm);
	return design.glassArt.transfers.flatMap((t, index) => {
		const place = transferPlace(t, layout);
		if (place === 'seal') return [];
		const what = `The transfer point of ${names.get(t.common) ?? t.common} (glassArt.transfers[${index}], at ${t.x_mm.toPrecision(6)}, ${t.y_mm.toPrecision(6)} mm)`;
		const r = t.diameter_mm / 2;
		const near =
			Math.abs(t.x_mm) < reach + layout.glass.width_mm &&
			Math.abs(t.y_mm) < reach + layout.glass.height_mm;
		return [
			finding({
				code: 'glass.transfer-off-seal',
				severity: place === 'off' ? 'fail' : 'warn',
				message:
					place === 'off'
						? `${what} lies off the back glass: it joins nothing, and the common cannot reach its pad.`
						: `${what} is not wholly under the seal: its conductive dot would sit in the fluid or outside the bond.`,
				fix: `Move it into the seal, ${layout.sealOuter.x_mm}–${layout.sealInner.x_mm} mm in from the back glass's edge, or delete it so the default point is used.`,
				electrodes: design.electrodes.filter((e) => e.common === t.common).map((e) => e.id),
				location: near
					? { x_mm: t.x_mm - r, y_mm: t.y_mm - r, width_mm: 2 * r, height_mm: 2 * r }
					: undefined
			})
		];
	});
}
