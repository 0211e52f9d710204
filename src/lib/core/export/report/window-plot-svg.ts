/**
 * The drive's operating window as a small inline SVG: one row per checked temperature with the
 * amplitudes that temperature allows (V90/k_on … V10/k_off), the common window shaded and the
 * set amplitude as a vertical line. Plain SVG text, no DOM; sizes in px for print at any scale.
 */
import type { OperatingWindow } from '../../drive/operating-window';
import { escapeHtml, fixed } from './html-text';

const WIDTH_px = 520;
const ROW_px = 22;
const LEFT_px = 70;
const RIGHT_px = 20;

export function windowPlotSvg(options: { window: OperatingWindow; amplitude_V: number }): string {
	const { window, amplitude_V } = options;
	const rows = window.perTemperature;
	const ends = rows.flatMap((r) =>
		r.window
			? [r.window.min_V, Number.isFinite(r.window.max_V) ? r.window.max_V : r.window.min_V * 1.5]
			: []
	);
	const lo = Math.min(amplitude_V, ...ends) * 0.9;
	const hi = Math.max(amplitude_V, ...ends) * 1.1;
	const span = hi - lo || 1;
	const x = (v: number) => LEFT_px + ((v - lo) / span) * (WIDTH_px - LEFT_px - RIGHT_px);
	const height_px = ROW_px * rows.length + 40;
	const parts: string[] = [
		`<svg xmlns="http://www.w3.org/2000/svg" class="plot" width="${WIDTH_px}" height="${height_px}" viewBox="0 0 ${WIDTH_px} ${height_px}" role="img" aria-label="Operating window">`
	];
	if (window.window) {
		const right = Number.isFinite(window.window.max_V) ? window.window.max_V : hi;
		parts.push(
			`<rect x="${x(window.window.min_V).toFixed(1)}" y="4" width="${(x(right) - x(window.window.min_V)).toFixed(1)}" height="${ROW_px * rows.length}" fill="#dcebd5"/>`
		);
	}
	rows.forEach((r, i) => {
		const y = 4 + ROW_px * i + ROW_px / 2;
		parts.push(
			`<text x="${LEFT_px - 6}" y="${y + 4}" text-anchor="end" font-size="11">${escapeHtml(`${fixed(r.temperature_C, 0)} °C`)}</text>`
		);
		if (r.window) {
			const right = Number.isFinite(r.window.max_V) ? r.window.max_V : hi;
			parts.push(
				`<line x1="${x(r.window.min_V).toFixed(1)}" x2="${x(right).toFixed(1)}" y1="${y}" y2="${y}" stroke="#2f6f9f" stroke-width="6"/>`
			);
		} else {
			parts.push(
				`<text x="${LEFT_px + 4}" y="${y + 4}" font-size="11" fill="#b3261e">no amplitude works</text>`
			);
		}
	});
	const setX = x(amplitude_V).toFixed(1);
	const axisY = 4 + ROW_px * rows.length;
	parts.push(
		`<line x1="${setX}" x2="${setX}" y1="2" y2="${axisY}" stroke="#b3261e" stroke-width="1.5"/>`,
		`<line x1="${LEFT_px}" x2="${WIDTH_px - RIGHT_px}" y1="${axisY}" y2="${axisY}" stroke="#555"/>`
	);
	const step = niceStep(span / 6);
	for (let v = Math.ceil(lo / step) * step; v <= hi; v += step) {
		parts.push(
			`<line x1="${x(v).toFixed(1)}" x2="${x(v).toFixed(1)}" y1="${axisY}" y2="${axisY + 4}" stroke="#555"/>`,
			`<text x="${x(v).toFixed(1)}" y="${axisY + 16}" text-anchor="middle" font-size="10">${fixed(v, step < 0.1 ? 2 : 1)}</text>`
		);
	}
	parts.push(
		`<text x="${WIDTH_px - RIGHT_px}" y="${axisY + 32}" text-anchor="end" font-size="10">amplitude, V (red: set ${fixed(amplitude_V, 2)} V; green: common window)</text>`,
		'</svg>'
	);
	return parts.join('\n');
}

function niceStep(raw: number): number {
	const power = 10 ** Math.floor(Math.log10(raw));
	const m = raw / power;
	return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * power;
}
