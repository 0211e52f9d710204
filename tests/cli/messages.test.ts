// Command-line messages speak words, place JSON errors by line and column, and line up columns.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from './run-cli';

describe('CLI messages', () => {
	it('names a folder given as a design file in words', async () => {
		const dir = mkdtempSync(join(tmpdir(), 'sunglyph-msg-'));
		try {
			const r = await runCli(['check', dir]);
			expect(r.code).toBe(2);
			expect(r.stderr).toContain('it is a folder, not a file');
			expect(r.stderr).not.toMatch(/EISDIR/);
		} finally {
			rmSync(dir, { recursive: true });
		}
	});

	it('places broken JSON by line and column', async () => {
		// A trailing comma on line 3: the parser stops at the closing brace on line 4, column 1.
		const text = '{\n\t"version": 3,\n\t"name": "x",\n}\n';
		const r = await runCli(['check', 'broken.json'], { 'broken.json': text });
		expect(r.code).toBe(2);
		expect(r.stderr).toMatch(/not valid JSON at line 4, column 1: /);
		expect(r.stderr).not.toMatch(/position/);
		const cut = await runCli(['check', 'cut.json'], { 'cut.json': '{\n  "version": 3,\n  "na' });
		expect(cut.stderr).toMatch(/line 3, column 6/);
	});

	it('lines up the pixel and temperature tables of check under the same indent', async () => {
		const demo = (await runCli(['demo'])).stdout;
		const { stdout } = await runCli(['check', 'demo.json'], { 'demo.json': demo });
		const lines = stdout.split('\n');
		for (const head of ['  state ', '  T (°C) ']) {
			const start = lines.findIndex((l) => l.startsWith(head));
			expect(start, head).toBeGreaterThan(-1);
			let end = start + 1;
			while (
				end < lines.length &&
				lines[end].startsWith('  ') &&
				lines[end].length === lines[start].length
			)
				end++;
			// Head plus at least three rows of equal width, all indented like the section.
			expect(end - start, head).toBeGreaterThanOrEqual(4);
		}
	});

	it('aligns the descriptions of every option in each help', async () => {
		for (const command of ['drive', 'cell', 'check', 'illuminant']) {
			const help = (await runCli([command, '--help'])).stdout;
			const rows = help.split('\n').filter((l) => /^ {2}-/.test(l));
			expect(rows.length, command).toBeGreaterThan(1);
			const starts = new Set(
				rows.map((l) => {
					const m = /^( {2}\S.*?)( {2,})(?=\S)/.exec(l);
					return m ? m[1].length + m[2].length : -1;
				})
			);
			expect(starts.size, `${command}: ${[...starts].join(', ')}`).toBe(1);
		}
	});
});
