/**
 * Box, Rounded, Oval and Polygon: press and drag out a shape. Both corners snap; shift makes a
 * square, circle or a polygon turned in 15° steps; alt draws from the centre (boxes and ovals).
 * The shape shows as a draft while dragging and becomes one new electrode on release.
 *
 * Idle ─down→ Pointing ─move→ Drawing ─up→ Idle (adds the electrode); Escape drops the draft.
 */
import type { Contour } from '$lib/core/design/schema';
import type { XY } from '$lib/core/geometry/vec';
import {
	ellipseContour,
	rectangleContour,
	regularPolygonContour,
	roundedRectangleContour
} from '$lib/core/geometry/primitive-shapes';
import { addElectrodes } from '$lib/core/commands/add-electrodes';
import { insertedIds } from '$lib/core/commands/patch-algebra';
import {
	movedBeyondThreshold,
	type KeyInput,
	type PointerInput,
	type Tool,
	type ToolContext
} from './tool';

export type ShapeToolId = 'box' | 'rounded' | 'oval' | 'polygon';

type State = { name: 'idle' } | { name: 'pointing' | 'drawing'; start: XY };

const LABELS: Record<ShapeToolId, string> = {
	box: 'Draw box',
	rounded: 'Draw rounded box',
	oval: 'Draw oval',
	polygon: 'Draw polygon'
};

/** The contour for a drag from `a` to `b`, or null while it has no area. */
export function shapeForDrag(options: {
	kind: ShapeToolId;
	a: XY;
	b: XY;
	shift: boolean;
	alt: boolean;
	cornerRadius_mm: number;
	polygonSides: number;
}): Contour | null {
	const { kind, a, shift } = options;
	let { b } = options;
	if (kind === 'polygon') {
		const radius_mm = Math.hypot(b.x - a.x, b.y - a.y);
		if (!(radius_mm > 1e-6)) return null;
		let rotation_deg = (Math.atan2(b.y - a.y, b.x - a.x) * 180) / Math.PI + 90;
		if (shift) rotation_deg = Math.round(rotation_deg / 15) * 15;
		const sides = Math.max(3, Math.min(64, Math.round(options.polygonSides) || 6));
		return regularPolygonContour({ cx_mm: a.x, cy_mm: a.y, radius_mm, sides, rotation_deg });
	}
	if (shift) {
		const side = Math.max(Math.abs(b.x - a.x), Math.abs(b.y - a.y));
		b = { x: a.x + Math.sign(b.x - a.x || 1) * side, y: a.y + Math.sign(b.y - a.y || 1) * side };
	}
	const from = options.alt ? { x: 2 * a.x - b.x, y: 2 * a.y - b.y } : a;
	const box = {
		x_mm: Math.min(from.x, b.x),
		y_mm: Math.min(from.y, b.y),
		width_mm: Math.abs(b.x - from.x),
		height_mm: Math.abs(b.y - from.y)
	};
	if (!(box.width_mm > 1e-6 && box.height_mm > 1e-6)) return null;
	if (kind === 'box') return rectangleContour(box);
	if (kind === 'rounded')
		return roundedRectangleContour({ ...box, radius_mm: Math.max(0, options.cornerRadius_mm) });
	return ellipseContour({
		cx_mm: box.x_mm + box.width_mm / 2,
		cy_mm: box.y_mm + box.height_mm / 2,
		rx_mm: box.width_mm / 2,
		ry_mm: box.height_mm / 2
	});
}

export class ShapeTool implements Tool {
	#state: State = { name: 'idle' };
	constructor(readonly id: ShapeToolId) {}

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return 'crosshair';
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		const s = this.#state;
		if (input.type === 'down') {
			if (input.button === 0) this.#state = { name: 'pointing', start: ctx.snap(input.point) };
			return;
		}
		if (s.name === 'idle') {
			if (input.type === 'move') ctx.snap(input.point);
			return;
		}
		if (
			input.type === 'move' &&
			s.name === 'pointing' &&
			movedBeyondThreshold(ctx, s.start, input.point)
		)
			this.#state = { name: 'drawing', start: s.start };
		if (this.#state.name !== 'drawing') {
			if (input.type === 'up') this.cancel(ctx);
			return;
		}
		const end = ctx.snap(input.point, { from: s.start, angle: false });
		const contour = shapeForDrag({
			kind: this.id,
			a: s.start,
			b: end,
			shift: input.shift,
			alt: input.alt,
			...ctx.options
		});
		if (input.type === 'move') {
			const w = Math.abs(end.x - s.start.x);
			const h = Math.abs(end.y - s.start.y);
			ctx.overlay({
				draft: contour ? { points: contour, closed: true } : null,
				readout: {
					at: input.point,
					text:
						this.id === 'polygon'
							? `r ${Math.hypot(w, h).toFixed(3)} mm`
							: `${w.toFixed(3)} × ${h.toFixed(3)} mm`
				}
			});
			return;
		}
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
		if (!contour) return;
		const patch = ctx.run(LABELS[this.id], (design) =>
			addElectrodes(design, { electrodes: [{ outline: contour, kind: 'segment' }], idPrefix: 'e' })
		);
		if (patch) ctx.setSelection(insertedIds(patch));
	}

	key(_ctx: ToolContext, _input: KeyInput): boolean {
		return false;
	}

	cancel(ctx: ToolContext): void {
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
