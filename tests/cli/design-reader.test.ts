// Every command that takes a design file reads it the same way: the same words for a missing
// file or a folder, the same refusal of bytes that are not text, and the same acceptance of a
// UTF-16 file with a byte-order mark (the Unicode Standard, §23.8).
import { mkdtempSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';

async function run(argv: string[]) {
	let stdout = '';
	let stderr = '';
	const code = await main(argv, {
		out: (t) => (stdout += t),
		err: (t) => (stderr += t),
		readFile: (path) => readFile(path, 'utf8'),
		readBytes: async (path) => new Uint8Array(await readFile(path))
	});
	return { code, stdout, stderr };
}

const READERS = ['check', 'pins', 'assign', 'load', 'legibility', 'view-angle', 'report', 'export'];

describe('one design reader for every command', () => {
	const dir = mkdtempSync(join(tmpdir(), 'sunglyph-reader-'));
	const missing = join(dir, 'nope.json');
	const folder = join(dir, 'a-folder.json');
	mkdirSync(folder);
	const binary = join(dir, 'binary.json');
	writeFileSync(binary, Uint8Array.of(0x7b, 0xc3, 0x28, 0xff, 0x7d));

	it.each(READERS)('%s: a missing file, a folder and non-text bytes are bad input', async (cmd) => {
		const extra =
			cmd === 'assign'
				? ['--commons', '4']
				: cmd === 'report'
					? ['--out', join(dir, 'r.html')]
					: cmd === 'export'
						? ['--out', join(dir, 'out')]
						: [];
		const gone = await run([cmd, missing, ...extra]);
		expect(gone.code).toBe(2);
		expect(gone.stderr).toContain(`cannot read ${missing}: no such file`);
		const isFolder = await run([cmd, folder, ...extra]);
		expect(isFolder.code).toBe(2);
		expect(isFolder.stderr).toContain('it is a folder, not a file');
		const bytes = await run([cmd, binary, ...extra]);
		expect(bytes.code).toBe(2);
		expect(bytes.stderr).toContain('not valid UTF-8 text');
	});

	it('reads a UTF-16 design with a byte-order mark in every fast command', async () => {
		const text = readFileSync('src/lib/core/design/demo-design.json', 'utf8');
		const utf16 = join(dir, 'demo-utf16.json');
		writeFileSync(utf16, Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]));
		for (const cmd of ['check', 'pins', 'load']) {
			const r = await run([cmd, utf16]);
			expect(r.code, `${cmd}: ${r.stderr}`).toBe(0);
		}
	});
});
