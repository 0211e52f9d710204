import { describe, expect, it } from 'vitest';
import {
	docToScreen,
	fitBounds,
	panBy,
	PX_PER_MM_TRUE_SIZE,
	screenToDoc,
	visibleDocRect,
	wheelZoomFactor,
	zoomAround,
	zoomPercent,
	MAX_SCALE_PX_PER_MM,
	type ViewTransform
} from '$lib/editor/view-transform';

const view: ViewTransform = { scale_px_per_mm: 4, offsetX_px: 10, offsetY_px: -20 };

describe('view transform', () => {
	it('maps document millimetres to screen pixels and back', () => {
		const p = { x: 12.5, y: -3.25 };
		const s = docToScreen(view, p);
		expect(s).toEqual({ x: 60, y: -33 });
		const back = screenToDoc(view, s);
		expect(back.x).toBeCloseTo(p.x, 12);
		expect(back.y).toBeCloseTo(p.y, 12);
	});

	it('zooms around the cursor, keeping the point under it fixed', () => {
		const anchor = { x: 321, y: 123 };
		const before = screenToDoc(view, anchor);
		const zoomed = zoomAround(view, { factor: 2.5, anchor_px: anchor });
		expect(zoomed.scale_px_per_mm).toBeCloseTo(10, 12);
		const after = screenToDoc(zoomed, anchor);
		expect(after.x).toBeCloseTo(before.x, 9);
		expect(after.y).toBeCloseTo(before.y, 9);
	});

	it('clamps zoom and ignores nonsense factors', () => {
		expect(zoomAround(view, { factor: 1e9, anchor_px: { x: 0, y: 0 } }).scale_px_per_mm).toBe(
			MAX_SCALE_PX_PER_MM
		);
		expect(zoomAround(view, { factor: NaN, anchor_px: { x: 0, y: 0 } })).toBe(view);
		expect(zoomAround(view, { factor: -1, anchor_px: { x: 0, y: 0 } })).toBe(view);
		expect(panBy(view, Infinity, 0)).toBe(view);
	});

	it('turns wheel deltas into gentle zoom factors, larger deltas zooming out', () => {
		expect(wheelZoomFactor(0)).toBe(1);
		expect(wheelZoomFactor(-100)).toBeGreaterThan(1.15);
		expect(wheelZoomFactor(100)).toBeLessThan(1 / 1.15);
		expect(wheelZoomFactor(3, 1)).toBeCloseTo(wheelZoomFactor(48), 12);
		expect(wheelZoomFactor(NaN)).toBe(1);
		expect(wheelZoomFactor(1e6)).toBe(wheelZoomFactor(300));
	});

	it('fits bounds into the viewport with a margin, centred', () => {
		const fit = fitBounds(
			{ minX: 0, minY: 0, maxX: 66, maxY: 42 },
			{ width_px: 800, height_px: 600 },
			20
		);
		expect(fit).not.toBeNull();
		const f = fit!;
		expect(f.scale_px_per_mm).toBeCloseTo(760 / 66, 9);
		const centre = docToScreen(f, { x: 33, y: 21 });
		expect(centre.x).toBeCloseTo(400, 9);
		expect(centre.y).toBeCloseTo(300, 9);
		const visible = visibleDocRect(f, { width_px: 800, height_px: 600 });
		expect(visible.minX).toBeLessThan(0);
		expect(visible.maxY).toBeGreaterThan(42);
	});

	it('fits a single point at a fixed close-up and rejects empty bounds', () => {
		const point = fitBounds(
			{ minX: 5, minY: 5, maxX: 5, maxY: 5 },
			{ width_px: 100, height_px: 100 }
		);
		expect(point!.scale_px_per_mm).toBeCloseTo(PX_PER_MM_TRUE_SIZE * 20, 9);
		expect(
			fitBounds(
				{ minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity },
				{ width_px: 100, height_px: 100 }
			)
		).toBeNull();
	});

	it('reports zoom relative to true size', () => {
		expect(
			zoomPercent({ scale_px_per_mm: PX_PER_MM_TRUE_SIZE * 2, offsetX_px: 0, offsetY_px: 0 })
		).toBeCloseTo(200, 9);
	});
});
