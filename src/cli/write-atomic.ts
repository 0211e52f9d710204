/**
 * Writes a file atomically: the text goes to a temporary file beside the target, which is then
 * renamed over it, so a reader never sees half a file and a failure leaves the old file intact.
 */
import { rename, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { CliError } from './cli-error';

export async function writeFileAtomic(path: string, text: string): Promise<void> {
	const temporary = join(dirname(path), `.${basename(path)}.${process.pid}.${Date.now()}.tmp`);
	try {
		await writeFile(temporary, text, { encoding: 'utf8', flag: 'wx' });
		await rename(temporary, path);
	} catch (error) {
		await unlink(temporary).catch(() => undefined);
		const reason = error instanceof Error && 'code' in error ? String(error.code) : String(error);
		throw new CliError(`cannot write ${path}: ${reason}`);
	}
}
