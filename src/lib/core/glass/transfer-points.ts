/**
 * Common transfer points: conductive dots in the seal that carry each common from the back glass to
 * a lead on the front glass, which runs on to the common's pad on the ledge. A design's own points
 * are kept. A common without one gets a default in the middle of the seal on the side nearer its
 * pad, at the height of its electrodes' mean centre (so each common's bus leaves the viewing area
 * sideways, as multiplexed glass usually brings its commons out), spaced at least 2 diameters.
 * The dot is drawn as a 16-gon of its diameter (inscribed), on both plates.
 */
import type { Transfer } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import type { GlassLayout } from './layout';
import { contourBounds } from '../geometry/bounds';

export const DEFAULT_TRANSFER_DIAMETER_mm = 0.5;

/** Centre height of each common's electrodes (bounds centres averaged). */
function meanHeights(design: Design): Map<string, number> {
	const sum = new Map<string, [number, number]>();
	for (const e of design.electrodes) {
		if (e.common === null) continue;
		const b = contourBounds(e.outline);
		const [s, n] = sum.get(e.common) ?? [0, 0];
		sum.set(e.common, [s + (b.minY + b.maxY) / 2, n + 1]);
	}
	return new Map([...sum].map(([k, [s, n]]) => [k, s / n]));
}

export function transferPoints(design: Design, layout: GlassLayout): Transfer[] {
	const own = new Map(design.glassArt.transfers.map((t) => [t.common, t]));
	const heights = meanHeights(design);
	const seal = layout.sealOuter;
	const w = design.glassArt.seal.width_mm;
	const d = DEFAULT_TRANSFER_DIAMETER_mm;
	const commonPads = layout.pads.filter((p) => p.kind === 'common');
	const glassMid = design.glass.width_mm / 2;
	const sides = {
		left: [] as { net: string; y: number }[],
		right: [] as { net: string; y: number }[]
	};
	for (const pad of commonPads) {
		if (own.has(pad.net)) continue;
		const side = pad.entry.x <= glassMid ? sides.left : sides.right;
		side.push({ net: pad.net, y: heights.get(pad.net) ?? seal.y_mm + seal.height_mm / 2 });
	}
	const defaults = new Map<string, Transfer>();
	for (const [name, list] of Object.entries(sides)) {
		list.sort((a, b) => a.y - b.y);
		const x = name === 'left' ? seal.x_mm + w / 2 : seal.x_mm + seal.width_mm - w / 2;
		let last = -Infinity;
		for (const item of list) {
			const lo = seal.y_mm + w + d;
			const hi = seal.y_mm + seal.height_mm - w - d;
			const y = Math.min(hi, Math.max(lo, item.y, last + 2 * d));
			last = y;
			defaults.set(item.net, { common: item.net, x_mm: x, y_mm: y, diameter_mm: d });
		}
	}
	return commonPads.map((pad) => own.get(pad.net) ?? (defaults.get(pad.net) as Transfer));
}

export function dotRing(t: Transfer): Float64Array {
	const out = new Float64Array(32);
	const r = t.diameter_mm / 2;
	for (let i = 0; i < 16; i++) {
		const a = (i / 16) * 2 * Math.PI;
		out[2 * i] = t.x_mm + r * Math.cos(a);
		out[2 * i + 1] = t.y_mm + r * Math.sin(a);
	}
	return out;
}
