/**
 * Draws one ruler (top or left) onto a 2-D canvas: ticks and millimetre labels from rulerTicks,
 * the selection's extent as a band and the pointer's position as a line. The canvas is sized in
 * device pixels; drawing happens in CSS pixels with 0.5 px offsets for crisp 1 px lines.
 */
import { formatRulerValue, rulerTicks, type RulerAxis } from './ruler-ticks';

export interface RulerPaint {
	orientation: 'top' | 'left';
	axis: RulerAxis;
	thickness_px: number;
	dpr: number;
	pointer_px: number | null;
	band_px: readonly [number, number] | null;
}

const COLOURS = {
	ground: '#f6f6f1',
	band: '#2f6f9f2e',
	tick: '#8d9086',
	label: '#5a5d54',
	edge: '#b9bbb0',
	pointer: '#c2410c'
};

export function drawRuler(ctx: CanvasRenderingContext2D, paint: RulerPaint): void {
	const { axis, thickness_px: t, dpr } = paint;
	const top = paint.orientation === 'top';
	const w = top ? axis.length_px : t;
	const h = top ? t : axis.length_px;
	ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
	ctx.clearRect(0, 0, w, h);
	ctx.fillStyle = COLOURS.ground;
	ctx.fillRect(0, 0, w, h);
	if (paint.band_px) {
		const [a, b] = paint.band_px;
		ctx.fillStyle = COLOURS.band;
		if (top) ctx.fillRect(Math.min(a, b), 0, Math.abs(b - a), t);
		else ctx.fillRect(0, Math.min(a, b), t, Math.abs(b - a));
	}
	const { major_mm, ticks } = rulerTicks(axis);
	ctx.strokeStyle = COLOURS.tick;
	ctx.lineWidth = 1;
	ctx.beginPath();
	for (const tick of ticks) {
		const len = tick.level === 0 ? t * 0.55 : tick.level === 1 ? t * 0.35 : t * 0.2;
		const p = Math.round(tick.pos_px) + 0.5;
		if (top) {
			ctx.moveTo(p, t);
			ctx.lineTo(p, t - len);
		} else {
			ctx.moveTo(t, p);
			ctx.lineTo(t - len, p);
		}
	}
	ctx.stroke();
	ctx.fillStyle = COLOURS.label;
	ctx.font = '10px "DejaVu Sans", system-ui, sans-serif';
	ctx.textBaseline = 'top';
	for (const tick of ticks) {
		if (tick.level !== 0) continue;
		const text = formatRulerValue(tick.value_mm, major_mm);
		if (top) {
			ctx.textAlign = 'left';
			ctx.fillText(text, Math.round(tick.pos_px) + 3, 2);
		} else {
			ctx.save();
			ctx.translate(2, Math.round(tick.pos_px) - 3);
			ctx.rotate(-Math.PI / 2);
			ctx.textAlign = 'right';
			ctx.fillText(text, 0, 0);
			ctx.restore();
		}
	}
	ctx.strokeStyle = COLOURS.edge;
	ctx.beginPath();
	if (top) {
		ctx.moveTo(0, t - 0.5);
		ctx.lineTo(w, t - 0.5);
	} else {
		ctx.moveTo(t - 0.5, 0);
		ctx.lineTo(t - 0.5, h);
	}
	ctx.stroke();
	if (paint.pointer_px !== null && Number.isFinite(paint.pointer_px)) {
		const p = Math.round(paint.pointer_px) + 0.5;
		ctx.strokeStyle = COLOURS.pointer;
		ctx.beginPath();
		if (top) {
			ctx.moveTo(p, 0);
			ctx.lineTo(p, t);
		} else {
			ctx.moveTo(0, p);
			ctx.lineTo(t, p);
		}
		ctx.stroke();
	}
}
