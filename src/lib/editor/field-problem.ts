/**
 * Problems with typed values in the user's words: a reason from a parser or a generator's schema
 * ("expected a number above 0", "at least 1") becomes a sentence naming the field as its label
 * shows it, with its unit ("Gap: enter a number above 0 mm"). A generator's refusal that names a
 * parameter is put on that parameter's field through the form's field descriptors, never shown
 * with the parameter's internal name.
 */
import { GlyphError } from '$lib/core/glyphs/glyph-types';

export interface FieldLabel {
	key: string;
	label: string;
	unit?: string;
}

/** Turns a parser or schema reason into an instruction, with the unit after a bare limit. */
export function wordedReason(reason: string, unit = ''): string {
	let text = reason.trim().replace(/^expected /, 'enter ');
	text = text.replace(/^must be /, 'enter a number ');
	text = text.replace(/^(at least|at most) /, 'enter $1 ');
	const suffix = unit && unit !== '°' ? ` ${unit}` : unit;
	// A limit at the end ("above 0", "at most 25") takes the field's unit.
	if (suffix && /(above|below|at least|at most|from|to) -?\d+(\.\d+)?$/.test(text)) text += suffix;
	return text;
}

/** "Gap: enter a number above 0 mm" — the label as shown, then the worded reason. */
export function fieldMessage(field: FieldLabel, reason: string): string {
	return `${field.label}: ${wordedReason(reason, field.unit)}`;
}

/** A label for a parameter with no descriptor: "corner_radius_mm" → "Corner radius", unit mm. */
export function labelOfKey(key: string): FieldLabel {
	const unit = key.endsWith('_mm') ? 'mm' : key.endsWith('_deg') ? '°' : '';
	const words = key
		.replace(/_(mm|deg)$/, '')
		.replace(/([a-z])([A-Z])/g, '$1 $2')
		.replace(/_/g, ' ')
		.toLowerCase();
	return { key, label: words.charAt(0).toUpperCase() + words.slice(1), unit };
}

export interface FieldProblems {
	/** Worded reason per field key, shown under the field. */
	errors: Record<string, string>;
	/** One sentence for the dialog's status line. */
	problem: string;
}

/** A generator's refusal, mapped onto the form's fields where it names one. */
export function generatorProblem(error: unknown, fields: readonly FieldLabel[]): FieldProblems {
	if (error instanceof GlyphError && error.param) {
		const field = fields.find((f) => f.key === error.param) ?? labelOfKey(error.param);
		const shown = fields.some((f) => f.key === error.param);
		const reason = wordedReason(error.reason, field.unit);
		return {
			errors: shown ? { [field.key]: reason } : {},
			problem: `${field.label}: ${reason}`
		};
	}
	const message = error instanceof Error ? error.message : String(error);
	return { errors: {}, problem: message.charAt(0).toUpperCase() + message.slice(1) };
}
