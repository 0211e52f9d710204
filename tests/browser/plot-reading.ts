/**
 * Reads a drawn plot back into numbers: the axis scales from the tick labels (a linear fit of
 * label value against position), the dots and the lines. A plot test can then check that a
 * known value is drawn where it belongs, not only that some SVG exists.
 */
import { expect, type Locator } from '@playwright/test';

export interface DrawnPlot {
	/** Data value at an SVG x / y coordinate, from the axis tick labels. */
	xValue: (px: number) => number;
	yValue: (px: number) => number;
	xTicks: number[];
	dots: { cx: number; cy: number; fill: string }[];
	/** Filled rectangles (cells of a map) in SVG coordinates, with their fill opacity. */
	rects: { x: number; y: number; width: number; height: number; opacity: number }[];
	/** One entry per drawn line: its stroke and its vertices in SVG coordinates. */
	lines: DrawnLine[];
	/** The y value a line takes at data value x, by linear interpolation between its vertices. */
	lineValueAt: (line: DrawnLine, x: number) => number;
}

export interface DrawnLine {
	stroke: string;
	vertices: number;
	points: [number, number][];
}

interface RawPlot {
	x: { value: string; px: number }[];
	y: { value: string; px: number }[];
	dots: { cx: number; cy: number; fill: string }[];
	rects: DrawnPlot['rects'];
	lines: DrawnLine[];
}

const SI: Record<string, number> = { k: 1e3, M: 1e6, G: 1e9, m: 1e-3, µ: 1e-6 };
/** A tick label's value: plain numbers, a typographic minus, thousands commas, SI suffixes. */
const toNumber = (label: string) => {
	const text = label.replace('−', '-').replace(/,/g, '').trim();
	const suffix = text.slice(-1);
	return suffix in SI ? Number(text.slice(0, -1)) * SI[suffix] : Number(text);
};

function axisFit(
	ticks: { value: string; px: number }[],
	axis: string,
	log: boolean
): (px: number) => number {
	// Log axes leave some ticks unlabelled.
	const points = ticks
		.filter((t) => t.value.trim() !== '')
		.map((t) => ({ v: toNumber(t.value), px: t.px }));
	expect(points.length, `${axis}-axis tick labels`).toBeGreaterThanOrEqual(2);
	expect(points.every((p) => Number.isFinite(p.v))).toBe(true);
	const a = points[0];
	const b = points[points.length - 1];
	if (log) {
		const slope = (Math.log10(b.v) - Math.log10(a.v)) / (b.px - a.px);
		return (px) => 10 ** (Math.log10(a.v) + (px - a.px) * slope);
	}
	const slope = (b.v - a.v) / (b.px - a.px);
	return (px) => a.v + (px - a.px) * slope;
}

/** The plot's main SVG (not a legend swatch) inside `figure`, read back. */
export async function readPlot(
	figure: Locator,
	scales: { xLog?: boolean; yLog?: boolean } = {}
): Promise<DrawnPlot> {
	const svg = figure.locator('svg:has(g[aria-label="x-axis tick label"])').first();
	await expect(svg).toBeVisible();
	const raw: RawPlot = await svg.evaluate((root) => {
		const translate = (el: Element) => {
			const m = /translate\(\s*([-\d.e]+)[ ,]+([-\d.e]+)\s*\)/.exec(
				el.getAttribute('transform') ?? ''
			);
			return m ? [Number(m[1]), Number(m[2])] : [0, 0];
		};
		const ticks = (axis: 'x' | 'y') =>
			[...root.querySelectorAll(`g[aria-label="${axis}-axis tick label"] text`)].map((t) => ({
				value: t.textContent ?? '',
				px: translate(t)[axis === 'x' ? 0 : 1]
			}));
		const dots = [...root.querySelectorAll('g[aria-label="dot"] circle')].map((c) => ({
			cx: Number(c.getAttribute('cx')),
			cy: Number(c.getAttribute('cy')),
			fill: c.getAttribute('fill') ?? c.parentElement?.getAttribute('fill') ?? ''
		}));
		const lines = [...root.querySelectorAll('g[aria-label="line"] path')].map((p) => {
			const d = p.getAttribute('d') ?? '';
			const points = [...d.matchAll(/[ML]\s*([-\d.e]+)[ ,]+([-\d.e]+)/g)].map(
				(m) => [Number(m[1]), Number(m[2])] as [number, number]
			);
			return {
				stroke: p.getAttribute('stroke') ?? p.parentElement?.getAttribute('stroke') ?? '',
				vertices: (d.match(/[ML]/g) ?? []).length,
				points
			};
		});
		const rects = [...root.querySelectorAll('g[aria-label="rect"] rect')].map((r) => ({
			x: Number(r.getAttribute('x')),
			y: Number(r.getAttribute('y')),
			width: Number(r.getAttribute('width')),
			height: Number(r.getAttribute('height')),
			opacity: Number(r.getAttribute('fill-opacity') ?? 1)
		}));
		return { x: ticks('x'), y: ticks('y'), dots, rects, lines };
	});
	const xValue = axisFit(raw.x, 'x', scales.xLog ?? false);
	const yValue = axisFit(raw.y, 'y', scales.yLog ?? false);
	const lineValueAt = (line: DrawnLine, x: number) => {
		const data = line.points
			.map(([px, py]) => [xValue(px), yValue(py)])
			.sort((a, b) => a[0] - b[0]);
		const i = data.findIndex(([dx]) => dx >= x);
		if (i < 0 || data.length === 0) return Number.NaN;
		if (i === 0) return data[0][0] === x ? data[0][1] : Number.NaN;
		const [x0, y0] = data[i - 1];
		const [x1, y1] = data[i];
		return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
	};
	return {
		xValue,
		yValue,
		lineValueAt,
		xTicks: raw.x.map((t) => toNumber(t.value)),
		dots: raw.dots,
		rects: raw.rects,
		lines: raw.lines
	};
}
