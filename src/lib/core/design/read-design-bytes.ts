/**
 * The one reader of design files, shared by the app and the command line, so both give the same
 * verdict on the same bytes. Accepts UTF-8 (with or without a byte-order mark) and UTF-16 with a
 * byte-order mark (little or big endian); refuses other bytes, and files above MAX_DESIGN_BYTES,
 * with a message rather than a guess.
 *
 * Encodings: the Unicode Standard, §2.5 and §23.8 (byte-order mark U+FEFF as EF BB BF, FF FE, FE FF).
 */
import { parseDesignText, type ParseResult } from './parse-design';

/** The decoder both Node and browsers provide (the core compiles without the DOM library). */
declare const TextDecoder: new (
	label: string,
	options?: { fatal?: boolean; ignoreBOM?: boolean }
) => { decode(bytes: Uint8Array): string };

/** 50 MB: far above any real design (the demo is about 60 kB), far below a memory problem. */
export const MAX_DESIGN_BYTES = 50 * 1024 * 1024;

export type DecodeResult = { ok: true; text: string } | { ok: false; message: string };

function decodeWith(label: 'utf-8' | 'utf-16le' | 'utf-16be', bytes: Uint8Array): DecodeResult {
	try {
		// ignoreBOM: false makes the decoder drop the mark itself.
		const text = new TextDecoder(label, { fatal: true, ignoreBOM: false }).decode(bytes);
		return { ok: true, text };
	} catch {
		return { ok: false, message: `not valid ${label.toUpperCase()} text` };
	}
}

/** Bytes to text, choosing the encoding from the byte-order mark (UTF-8 when there is none). */
export function decodeDesignBytes(bytes: Uint8Array): DecodeResult {
	if (bytes.length > MAX_DESIGN_BYTES) {
		return {
			ok: false,
			message: `file of ${bytes.length} bytes is larger than the ${MAX_DESIGN_BYTES}-byte limit`
		};
	}
	if (bytes[0] === 0xff && bytes[1] === 0xfe) return decodeWith('utf-16le', bytes);
	if (bytes[0] === 0xfe && bytes[1] === 0xff) return decodeWith('utf-16be', bytes);
	return decodeWith('utf-8', bytes);
}

/** Reads a design file's bytes: decoding, JSON, migrations, schema and references. */
export function readDesignBytes(bytes: Uint8Array): ParseResult {
	const decoded = decodeDesignBytes(bytes);
	if (!decoded.ok) return { ok: false, issues: [{ path: '(root)', message: decoded.message }] };
	return parseDesignText(decoded.text);
}
