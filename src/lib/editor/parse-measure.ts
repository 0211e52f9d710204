/**
 * Reads a number typed into a measurement field: decimal point or comma, an optional unit that
 * must match the field's (mm or °), and limits. Returns the value or the reason it is refused.
 */
export type MeasureResult = { ok: true; value: number } | { ok: false; reason: string };

export function parseMeasure(
	text: string,
	options: { unit?: 'mm' | '°'; min?: number; max?: number; positive?: boolean } = {}
): MeasureResult {
	let t = text.trim().replace(/\s+/g, '');
	if (t === '') return { ok: false, reason: 'enter a number' };
	if (options.unit === 'mm' && /mm$/i.test(t)) t = t.slice(0, -2);
	if (options.unit === '°' && /(°|deg)$/i.test(t)) t = t.replace(/(°|deg)$/i, '');
	if (/^[-+]?\d+,\d+$/.test(t)) t = t.replace(',', '.');
	if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t))
		return { ok: false, reason: `"${text.trim()}" is not a number` };
	const value = Number(t);
	if (!Number.isFinite(value)) return { ok: false, reason: 'the number is too large' };
	if (options.positive && !(value > 0)) return { ok: false, reason: 'must be above 0' };
	if (options.min !== undefined && value < options.min)
		return { ok: false, reason: `at least ${options.min}` };
	if (options.max !== undefined && value > options.max)
		return { ok: false, reason: `at most ${options.max}` };
	return { ok: true, value };
}

/** A value for display: fixed decimals without trailing zeros, never "-0" or "NaN". */
export function formatMeasure(value: number, decimals = 3): string {
	if (!Number.isFinite(value)) return '—';
	const text = value.toFixed(decimals).replace(/\.?0+$/, '');
	return text === '-0' ? '0' : text;
}
