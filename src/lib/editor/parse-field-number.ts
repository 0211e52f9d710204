/**
 * Reads a number field's whole text when it is committed (Enter or leaving the field): decimal
 * notation only (as measurement fields), whole numbers where asked, within limits. A prefix typed
 * on the way ("1" of "1e9", "2" of "2.5") is never a value of its own: only committed text counts.
 */
import { parseMeasure } from './parse-measure';

export type FieldNumber = { ok: true; value: number } | { ok: false; reason: string };

export function parseFieldNumber(
	text: string,
	options: { min?: number; max?: number; integer?: boolean } = {}
): FieldNumber {
	const parsed = parseMeasure(text, {
		min: Number.isFinite(options.min) ? options.min : undefined,
		max: Number.isFinite(options.max) ? options.max : undefined
	});
	if (!parsed.ok) return parsed;
	if (options.integer && !Number.isInteger(parsed.value))
		return { ok: false, reason: 'enter a whole number' };
	return parsed;
}
