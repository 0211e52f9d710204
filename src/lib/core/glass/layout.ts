/**
 * Where the glass's fixed features lie: the contact ledge on the pin-out edge, the back glass
 * (the front glass less the ledge), the seal ring inside it with its fill gap, the pads along the
 * ledge at the pin pitch and the default common transfer points in the seal.
 *
 * Pads sit at the pins of the pin map (`wiring/pin-layout.ts`, the one source of the pin order and
 * positions): pad k is pin k, for every common and every segment line, used or not, so the glass
 * and the pin map never disagree. A pad is half the pitch wide (common practice for elastomeric
 * connectors) and spans the ledge less 0.2 mm at each end.
 *
 * Units: millimetres, glass coordinates (x right, y down, origin top-left).
 */
import type { Design, Rect } from '../design/schema';
import type { XY } from '../geometry/vec';
import { pinLayout } from '../wiring/pin-layout';

export interface Pad {
	/** Pin number, 1-based, in order along the edge. */
	pin: number;
	kind: 'common' | 'segment';
	/** Id of the common or segment line. */
	net: string;
	name: string;
	rect: Rect;
	/** Where a trace meets the pad: the pad's inner end, on the glass side. */
	entry: XY;
}

export interface GlassLayout {
	glass: Rect;
	ledge: Rect;
	backGlass: Rect;
	/** Outer and inner edge of the seal ring. */
	sealOuter: Rect;
	sealInner: Rect;
	/** The seal as rectangles (four sides, the side opposite the ledge split by the fill gap). */
	sealParts: Rect[];
	pads: Pad[];
}

type Frame = (u: number, v: number) => XY;

/** Maps (u along the edge, v inwards from it) to glass coordinates. */
function edgeFrame(design: Design): { frame: Frame; length_mm: number } {
	const { width_mm: W, height_mm: H } = design.glass;
	switch (design.pinout.edge) {
		case 'bottom':
			return { frame: (u, v) => ({ x: u, y: H - v }), length_mm: W };
		case 'top':
			return { frame: (u, v) => ({ x: u, y: v }), length_mm: W };
		case 'left':
			return { frame: (u, v) => ({ x: v, y: u }), length_mm: H };
		case 'right':
			return { frame: (u, v) => ({ x: W - v, y: u }), length_mm: H };
	}
}

function rectOf(frame: Frame, u0: number, v0: number, u1: number, v1: number): Rect {
	const a = frame(u0, v0);
	const b = frame(u1, v1);
	return {
		x_mm: Math.min(a.x, b.x),
		y_mm: Math.min(a.y, b.y),
		width_mm: Math.abs(b.x - a.x),
		height_mm: Math.abs(b.y - a.y)
	};
}

const inset = (r: Rect, d: number): Rect => ({
	x_mm: r.x_mm + d,
	y_mm: r.y_mm + d,
	width_mm: Math.max(0, r.width_mm - 2 * d),
	height_mm: Math.max(0, r.height_mm - 2 * d)
});

function sealParts(outer: Rect, width_mm: number, gap: { edge: string; gap_mm: number }): Rect[] {
	const { x_mm: x, y_mm: y, width_mm: W, height_mm: H } = outer;
	const w = width_mm;
	const sides: Record<string, Rect> = {
		top: { x_mm: x, y_mm: y, width_mm: W, height_mm: w },
		bottom: { x_mm: x, y_mm: y + H - w, width_mm: W, height_mm: w },
		left: { x_mm: x, y_mm: y + w, width_mm: w, height_mm: H - 2 * w },
		right: { x_mm: x + W - w, y_mm: y + w, width_mm: w, height_mm: H - 2 * w }
	};
	const parts: Rect[] = [];
	for (const [edge, r] of Object.entries(sides)) {
		if (edge !== gap.edge || gap.gap_mm <= 0) {
			parts.push(r);
			continue;
		}
		if (r.width_mm >= r.height_mm) {
			const half = Math.max(0, (r.width_mm - gap.gap_mm) / 2);
			parts.push(
				{ ...r, width_mm: half },
				{ ...r, x_mm: r.x_mm + r.width_mm - half, width_mm: half }
			);
		} else {
			const half = Math.max(0, (r.height_mm - gap.gap_mm) / 2);
			parts.push(
				{ ...r, height_mm: half },
				{ ...r, y_mm: r.y_mm + r.height_mm - half, height_mm: half }
			);
		}
	}
	return parts.filter((r) => r.width_mm > 0 && r.height_mm > 0);
}

const OPPOSITE = { top: 'bottom', bottom: 'top', left: 'right', right: 'left' } as const;

export function glassLayout(design: Design): GlassLayout {
	const art = design.glassArt;
	const { frame, length_mm } = edgeFrame(design);
	const depth =
		design.pinout.edge === 'top' || design.pinout.edge === 'bottom'
			? design.glass.height_mm
			: design.glass.width_mm;
	const ledge = rectOf(frame, 0, 0, length_mm, art.ledge.depth_mm);
	const backGlass = rectOf(frame, 0, art.ledge.depth_mm, length_mm, depth);
	const sealOuter = inset(backGlass, art.seal.inset_mm);
	const sealInner = inset(sealOuter, art.seal.width_mm);
	const padWidth = design.pinout.pitch_mm / 2;
	const pads: Pad[] = pinLayout(design).pins.map((pin) => {
		const u = pin.along_mm;
		return {
			pin: pin.number,
			kind: pin.role === 'common' ? 'common' : 'segment',
			net: pin.ref.id,
			name: pin.ref.name || pin.ref.id,
			rect: rectOf(frame, u - padWidth / 2, 0.2, u + padWidth / 2, art.ledge.depth_mm - 0.2),
			entry: frame(u, art.ledge.depth_mm - 0.2)
		};
	});
	return {
		glass: { x_mm: 0, y_mm: 0, width_mm: design.glass.width_mm, height_mm: design.glass.height_mm },
		ledge,
		backGlass,
		sealOuter,
		sealInner,
		sealParts: sealParts(sealOuter, art.seal.width_mm, {
			edge: OPPOSITE[design.pinout.edge],
			gap_mm: art.seal.fillGap_mm
		}),
		pads
	};
}
