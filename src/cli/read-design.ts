/** Reads and validates a design file for a CLI command; invalid input is listed on stderr. */
import { parseDesignText } from '../lib/core/design/parse-design';
import { formatIssue } from '../lib/core/design/issues';
import type { Design } from '../lib/core/design/schema';
import { CliError, EXIT } from './cli-error';
import type { CliIo } from './io';

export async function readDesignFile(
	path: string,
	io: CliIo
): Promise<{ ok: true; design: Design } | { ok: false; exitCode: number }> {
	let text: string;
	try {
		text = await io.readFile(path);
	} catch (error) {
		const reason = error instanceof Error && 'code' in error ? String(error.code) : String(error);
		throw new CliError(`cannot read ${path}: ${reason}`);
	}
	const parsed = parseDesignText(text);
	if (parsed.ok) return { ok: true, design: parsed.design };
	io.err(
		`${path}: invalid design\n` + parsed.issues.map((i) => `  ${formatIssue(i)}`).join('\n') + '\n'
	);
	return { ok: false, exitCode: EXIT.badInput };
}
