/**
 * The command line's one way to read a design file: bytes through the shared reader (the same
 * encodings, size limit and verdict as the app), file-system failures in words. Bad input
 * becomes a CliError (exit 2) with every invalid path listed.
 */
import type { Design } from '../lib/core/design/schema';
import { readDesignBytes } from '../lib/core/design/read-design-bytes';
import { formatIssue } from '../lib/core/design/issues';
import { CliError, EXIT } from './cli-error';
import { fileErrorText } from './file-error-text';
import type { CliIo } from './io';

async function readBytes(io: CliIo, path: string): Promise<Uint8Array> {
	try {
		return io.readBytes
			? await io.readBytes(path)
			: new TextEncoder().encode(await io.readFile(path));
	} catch (error) {
		throw new CliError(`cannot read ${path}: ${fileErrorText(error)}`);
	}
}

function invalidText(path: string, issues: Parameters<typeof formatIssue>[0][]): string {
	return `${path}: invalid design\n` + issues.map((i) => `  ${formatIssue(i)}`).join('\n');
}

export async function readDesign(io: CliIo, path: string): Promise<Design> {
	const parsed = readDesignBytes(await readBytes(io, path));
	if (!parsed.ok) throw new CliError(invalidText(path, parsed.issues));
	return parsed.design;
}

/** The same, for commands that list the invalid paths on stderr and return exit 2 themselves. */
export async function readDesignFile(
	path: string,
	io: CliIo
): Promise<{ ok: true; design: Design } | { ok: false; exitCode: number }> {
	const parsed = readDesignBytes(await readBytes(io, path));
	if (parsed.ok) return { ok: true, design: parsed.design };
	io.err(invalidText(path, parsed.issues) + '\n');
	return { ok: false, exitCode: EXIT.badInput };
}
