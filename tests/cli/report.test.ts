/**
 * The design report from the command line: self-contained, deterministic HTML that names every
 * finding, and a PDF (through the system's Chromium) whose pages poppler's pdftoppm renders and
 * whose text poppler's pdftotext reads back.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import { analyzeDesignWithCell } from '../../src/lib/core/analyze-design';
import { findChromium } from '../../src/cli/print-pdf';
import { runCli } from './run-cli';

const demoText = serializeDesign(demoDesign());
const demoCodes = () => {
	const r = analyzeDesignWithCell(demoDesign());
	return [...r.wiring.findings, ...r.drive.findings, ...r.opticsFindings].map((f) => f.code);
};
const hasPoppler = existsSync('/usr/bin/pdftoppm') && existsSync('/usr/bin/pdftotext');
const inCi = process.env.CI === 'true' || process.env.CI === '1';

describe('sunglyph report', () => {
	it('writes self-contained HTML naming the design and every finding code, the same each time', async () => {
		const dir = mkdtempSync(join(tmpdir(), 'report-'));
		const a = join(dir, 'a.html');
		const b = join(dir, 'b.html');
		expect(
			(await runCli(['report', 'demo.json', '--out', a], { 'demo.json': demoText })).code
		).toBe(0);
		expect(
			(await runCli(['report', 'demo.json', '--out', b], { 'demo.json': demoText })).code
		).toBe(0);
		const html = readFileSync(a, 'utf8');
		expect(readFileSync(b, 'utf8')).toBe(html);
		expect(html).toContain(demoDesign().name);
		for (const code of demoCodes()) expect(html).toContain(code);
		expect(html).not.toMatch(/<script|\ssrc=|<link/i);
		expect(html).toContain('width="66mm"');
		expect(html).toMatch(/10 mm<\/text>/);
		expect(html).toContain('@page { size: A4');
		// Nothing but the two reports is left in the folder (no temporary files).
		expect(readdirSync(dir).sort()).toEqual(['a.html', 'b.html']);
	});

	it('escapes text from the design and refuses bad options with exit 2', async () => {
		const hostile = { ...demoDesign(), name: '<script>alert(1)</script> & co' };
		const dir = mkdtempSync(join(tmpdir(), 'report-'));
		const out = join(dir, 'r.html');
		const files = { 'x.json': serializeDesign(hostile) };
		expect(
			(await runCli(['report', 'x.json', '--out', out, '--paper', 'letter'], files)).code
		).toBe(0);
		const html = readFileSync(out, 'utf8');
		expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt; &amp; co');
		expect(html).not.toContain('<script>');
		expect(html).toContain('@page { size: letter');
		expect((await runCli(['report', 'x.json'], files)).code).toBe(2);
		expect((await runCli(['report', 'x.json', '--out', out, '--paper', 'a3'], files)).code).toBe(2);
		expect((await runCli(['report', 'missing.json', '--out', out])).code).toBe(2);
		expect((await runCli(['report', 'x.json', '--out', out], { 'x.json': '{' })).code).toBe(2);
	});

	it.skipIf(!inCi && !(hasPoppler && findChromium()))(
		'prints a PDF whose pages render and whose text holds the name and every finding code',
		{ timeout: 180_000 },
		async () => {
			const dir = mkdtempSync(join(tmpdir(), 'report-'));
			const pdf = join(dir, 'r.pdf');
			const result = await runCli(['report', 'demo.json', '--out', pdf, '--pdf'], {
				'demo.json': demoText
			});
			expect(result.code, result.stderr).toBe(0);
			expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
			execFileSync('pdftoppm', ['-r', '30', '-png', pdf, join(dir, 'page')]);
			const pages = readdirSync(dir).filter((f) => f.startsWith('page'));
			expect(pages.length).toBeGreaterThanOrEqual(2);
			// Rules, load, legibility, glass and every finding of every check: a longer page set.
			expect(pages.length).toBeLessThanOrEqual(12);
			const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
			expect(text).toContain(demoDesign().name);
			for (const code of demoCodes()) expect(text).toContain(code);
		}
	);
});
