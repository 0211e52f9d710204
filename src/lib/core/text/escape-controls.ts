/**
 * Makes text from a design safe to print on a terminal: C0 and C1 control characters (ESC, CSI,
 * carriage return, backspace…) and the bidirectional overrides are shown as visible \uXXXX escapes
 * instead of being obeyed, so a name cannot move the cursor or repaint a verdict. Line feed and
 * tab are kept. The \uXXXX form is also a valid JSON string escape, so JSON output stays valid.
 *
 * Source: ECMA-48 (5th ed., 1991) §5 for the C0/C1 sets; Unicode Standard Annex #9 for the
 * bidirectional embedding, override and isolate controls (U+202A–U+202E, U+2066–U+2069).
 */
// eslint-disable-next-line no-control-regex
const UNSAFE = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

export function escapeControls(text: string): string {
	return text.replace(UNSAFE, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
