/** Writes a file whole or not at all: a temporary sibling, then a rename over the target. */
import { rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

export async function writeFileAtomic(path: string, data: string | Uint8Array): Promise<void> {
	const temporary = join(dirname(path), `.${basename(path)}.${process.pid}.tmp`);
	try {
		await writeFile(temporary, data);
		await rename(temporary, path);
	} catch (error) {
		await rm(temporary, { force: true });
		throw error;
	}
}
