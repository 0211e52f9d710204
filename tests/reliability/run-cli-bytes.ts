/** Runs the CLI in-process on files given as raw bytes, with captured output. */
import { main } from '../../src/cli/main';
import type { CliIo } from '../../src/cli/io';

export async function runCliBytes(
	argv: string[],
	files: Record<string, Uint8Array> = {},
	override: Partial<CliIo> = {}
) {
	let stdout = '';
	let stderr = '';
	const read = async (path: string) => {
		if (!(path in files)) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
		return files[path];
	};
	const code = await main(argv, {
		out: (t) => (stdout += t),
		err: (t) => (stderr += t),
		readFile: async (path) => new TextDecoder().decode(await read(path)),
		readBytes: read,
		...override
	});
	return { code, stdout, stderr };
}
