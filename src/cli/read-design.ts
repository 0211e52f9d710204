/** Reads and validates a design file for a command; bad input becomes a CliError (exit 2). */
import type { Design } from '../lib/core/design/schema';
import { parseDesignText } from '../lib/core/design/parse-design';
import { formatIssue } from '../lib/core/design/issues';
import { CliError, EXIT } from './cli-error';
import type { CliIo } from './io';

export async function readDesign(io: CliIo, path: string): Promise<Design> {
	let text: string;
	try {
		text = await io.readFile(path);
	} catch (error) {
		const reason = error instanceof Error && 'code' in error ? String(error.code) : String(error);
		throw new CliError(`cannot read ${path}: ${reason}`);
	}
	const parsed = parseDesignText(text);
	if (!parsed.ok)
		throw new CliError(
			`${path}: invalid design\n` + parsed.issues.map((i) => `  ${formatIssue(i)}`).join('\n')
		);
	return parsed.design;
}

/** The same, for commands that list the invalid paths on stderr and return exit 2 themselves. */
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
