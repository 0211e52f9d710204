/** Runs the CLI in-process with captured output. */
import { readFile } from 'node:fs/promises';
import { main } from '../../src/cli/main';

export async function runCli(argv: string[], files: Record<string, string> = {}) {
	let stdout = '';
	let stderr = '';
	const code = await main(argv, {
		out: (t) => (stdout += t),
		err: (t) => (stderr += t),
		readFile: async (path) => (path in files ? files[path] : readFile(path, 'utf8'))
	});
	return { code, stdout, stderr };
}
