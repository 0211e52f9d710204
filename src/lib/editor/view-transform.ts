/**
 * The canvas view: a uniform scale and an offset taking document millimetres to CSS pixels,
 * `screen_px = doc_mm · scale_px_per_mm + offset_px`. y grows downwards in both spaces, like the
 * document. Zoom is reported relative to true size on a 96 dpi screen (1 mm = 96/25.4 px).
 */

export interface ViewTransform {
	scale_px_per_mm: number;
	offsetX_px: number;
	offsetY_px: number;
}

export interface Vec {
	x: number;
	y: number;
}

export interface RectBounds {
	minX: number;
	minY: number;
	maxX: number;
	maxY: number;
}

/** CSS pixels per millimetre at true size: CSS defines 96 px per inch, 25.4 mm per inch. */
export const PX_PER_MM_TRUE_SIZE = 96 / 25.4;
export const MIN_SCALE_PX_PER_MM = PX_PER_MM_TRUE_SIZE * 0.05;
export const MAX_SCALE_PX_PER_MM = PX_PER_MM_TRUE_SIZE * 400;

export const IDENTITY_VIEW: ViewTransform = { scale_px_per_mm: 1, offsetX_px: 0, offsetY_px: 0 };

export function docToScreen(view: ViewTransform, p: Vec): Vec {
	return {
		x: p.x * view.scale_px_per_mm + view.offsetX_px,
		y: p.y * view.scale_px_per_mm + view.offsetY_px
	};
}

export function screenToDoc(view: ViewTransform, p: Vec): Vec {
	return {
		x: (p.x - view.offsetX_px) / view.scale_px_per_mm,
		y: (p.y - view.offsetY_px) / view.scale_px_per_mm
	};
}

export function clampScale(scale: number): number {
	if (!Number.isFinite(scale) || scale <= 0) return PX_PER_MM_TRUE_SIZE;
	return Math.min(MAX_SCALE_PX_PER_MM, Math.max(MIN_SCALE_PX_PER_MM, scale));
}

/** Scales by `factor` keeping the document point under `anchor_px` fixed on screen. */
export function zoomAround(
	view: ViewTransform,
	options: { factor: number; anchor_px: Vec }
): ViewTransform {
	if (!Number.isFinite(options.factor) || options.factor <= 0) return view;
	const scale = clampScale(view.scale_px_per_mm * options.factor);
	const under = screenToDoc(view, options.anchor_px);
	return {
		scale_px_per_mm: scale,
		offsetX_px: options.anchor_px.x - under.x * scale,
		offsetY_px: options.anchor_px.y - under.y * scale
	};
}

export function panBy(view: ViewTransform, dx_px: number, dy_px: number): ViewTransform {
	if (!Number.isFinite(dx_px) || !Number.isFinite(dy_px)) return view;
	return { ...view, offsetX_px: view.offsetX_px + dx_px, offsetY_px: view.offsetY_px + dy_px };
}

/**
 * A wheel event's zoom factor: one notch (≈100 px of deltaY) zooms by about 1.2×; line and page
 * modes are converted to pixels first. Pinch gestures arrive as ctrl+wheel with small deltas.
 */
export function wheelZoomFactor(deltaY: number, deltaMode = 0): number {
	const px = deltaMode === 1 ? deltaY * 16 : deltaMode === 2 ? deltaY * 400 : deltaY;
	if (!Number.isFinite(px)) return 1;
	const clamped = Math.max(-300, Math.min(300, px));
	return Math.exp(-clamped * 0.0018);
}

/** The view showing `bounds` centred in a viewport, with `margin_px` kept free on every side. */
export function fitBounds(
	bounds: RectBounds,
	viewport: { width_px: number; height_px: number },
	margin_px = 32
): ViewTransform | null {
	const w = bounds.maxX - bounds.minX;
	const h = bounds.maxY - bounds.minY;
	if (![w, h, bounds.minX, bounds.minY].every(Number.isFinite) || w < 0 || h < 0) return null;
	const availW = Math.max(1, viewport.width_px - 2 * margin_px);
	const availH = Math.max(1, viewport.height_px - 2 * margin_px);
	const scaleX = w > 0 ? availW / w : Infinity;
	const scaleY = h > 0 ? availH / h : Infinity;
	const fitted = Math.min(scaleX, scaleY);
	/* A single point or a zero-area selection: show it at 20× true size. */
	const scale = clampScale(Number.isFinite(fitted) ? fitted : PX_PER_MM_TRUE_SIZE * 20);
	const cx = (bounds.minX + bounds.maxX) / 2;
	const cy = (bounds.minY + bounds.maxY) / 2;
	return {
		scale_px_per_mm: scale,
		offsetX_px: viewport.width_px / 2 - cx * scale,
		offsetY_px: viewport.height_px / 2 - cy * scale
	};
}

/** The document rectangle visible in a viewport. */
export function visibleDocRect(
	view: ViewTransform,
	viewport: { width_px: number; height_px: number }
): RectBounds {
	const a = screenToDoc(view, { x: 0, y: 0 });
	const b = screenToDoc(view, { x: viewport.width_px, y: viewport.height_px });
	return { minX: a.x, minY: a.y, maxX: b.x, maxY: b.y };
}

/** Zoom as a percentage of true size, for display. */
export function zoomPercent(view: ViewTransform): number {
	return (view.scale_px_per_mm / PX_PER_MM_TRUE_SIZE) * 100;
}
