/**
 * Ruler and grid spacing: steps are 1, 2 or 5 times a power of ten millimetres, picked so that
 * labelled ticks stay at least `minMajor_px` apart on screen and minor ticks at least
 * `minMinor_px` apart, at any zoom.
 */

export interface RulerTick {
	/** Screen position along the ruler, in CSS pixels from its start. */
	pos_px: number;
	value_mm: number;
	/** 0 labelled, 1 half step, 2 minor. */
	level: 0 | 1 | 2;
}

export interface RulerAxis {
	scale_px_per_mm: number;
	offset_px: number;
	length_px: number;
}

const DIVISIONS: Record<number, number[]> = { 1: [10, 5, 2], 2: [10, 4, 2], 5: [10, 5] };

/** The smallest 1-2-5 step in millimetres whose screen length is at least `min_px`. */
export function niceStep_mm(scale_px_per_mm: number, min_px: number): number {
	if (!(scale_px_per_mm > 0) || !Number.isFinite(scale_px_per_mm)) return 1;
	const raw = min_px / scale_px_per_mm;
	const decade = Math.pow(10, Math.floor(Math.log10(raw)));
	for (const m of [1, 2, 5, 10]) if (m * decade >= raw) return m * decade;
	return 10 * decade;
}

function leadingDigit(step: number): number {
	const d = Math.round(step / Math.pow(10, Math.floor(Math.log10(step) + 1e-9)));
	return d === 10 ? 1 : d;
}

/** Decimals needed to print multiples of `step_mm` exactly. */
export function decimalsFor(step_mm: number): number {
	return Math.max(0, Math.min(6, -Math.floor(Math.log10(step_mm) + 1e-9)));
}

export function formatRulerValue(value_mm: number, step_mm: number): string {
	const text = value_mm.toFixed(decimalsFor(step_mm));
	return text === '-0' || /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

export function rulerTicks(
	axis: RulerAxis,
	options: { minMajor_px?: number; minMinor_px?: number } = {}
): { major_mm: number; ticks: RulerTick[] } {
	const { scale_px_per_mm: scale, offset_px: offset, length_px: length } = axis;
	if (![scale, offset, length].every(Number.isFinite) || scale <= 0 || length <= 0)
		return { major_mm: 1, ticks: [] };
	const major = niceStep_mm(scale, options.minMajor_px ?? 64);
	const minMinor = options.minMinor_px ?? 5;
	const divisions = DIVISIONS[leadingDigit(major)] ?? [10, 5, 2];
	const parts = divisions.find((n) => (major / n) * scale >= minMinor) ?? 1;
	const minor = major / parts;
	const from = Math.floor(-offset / scale / minor);
	const to = Math.ceil((length - offset) / scale / minor);
	const ticks: RulerTick[] = [];
	for (let i = from; i <= to && ticks.length < 2000; i++) {
		const value = i * minor;
		const k = ((i % parts) + parts) % parts;
		const level: 0 | 1 | 2 = k === 0 ? 0 : parts % 2 === 0 && k === parts / 2 ? 1 : 2;
		ticks.push({ pos_px: value * scale + offset, value_mm: value, level });
	}
	return { major_mm: major, ticks };
}

/**
 * Grid lines in document millimetres for a visible range: multiples of the user's pitch, thinned
 * by 2, 5, 10… so lines stay at least `min_px` apart. `majorEvery` marks every n-th line bolder.
 */
export function gridLines(options: {
	pitch_mm: number;
	scale_px_per_mm: number;
	from_mm: number;
	to_mm: number;
	min_px?: number;
}): { step_mm: number; lines: { at_mm: number; major: boolean }[] } {
	const { pitch_mm: pitch, scale_px_per_mm: scale, from_mm, to_mm } = options;
	if (![pitch, scale, from_mm, to_mm].every(Number.isFinite) || pitch <= 0 || scale <= 0)
		return { step_mm: pitch, lines: [] };
	const minPx = options.min_px ?? 8;
	let multiple = 1;
	for (const m of [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000, 10000]) {
		multiple = m;
		if (pitch * m * scale >= minPx) break;
	}
	const step = pitch * multiple;
	const majorStep = pitch * (multiple <= 1 ? 10 : multiple * 5);
	const lines: { at_mm: number; major: boolean }[] = [];
	const first = Math.ceil(Math.min(from_mm, to_mm) / step);
	const last = Math.floor(Math.max(from_mm, to_mm) / step);
	for (let i = first; i <= last && lines.length < 1000; i++) {
		const at = i * step;
		const ratio = at / majorStep;
		lines.push({ at_mm: at, major: Math.abs(ratio - Math.round(ratio)) < 1e-6 });
	}
	return { step_mm: step, lines };
}
