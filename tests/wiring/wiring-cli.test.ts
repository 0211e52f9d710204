import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { parseDesignText, serializeDesign } from '../../src/lib/core/design/parse-design';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { clearWiring } from '../../src/lib/core/commands/clear-wiring';
import { runCli } from '../cli/run-cli';
import { parseCsv } from './csv-parse';

const clearedText = () => {
	const demo = demoDesign();
	return serializeDesign(applyPatch(demo, clearWiring(demo)));
};

describe('sunglyph assign', () => {
	it('prints the wired design: every digit on 2 lines at 4 commons', async () => {
		const { code, stdout } = await runCli(['assign', 'd.json', '--commons', '4'], {
			'd.json': clearedText()
		});
		expect(code).toBe(0);
		const parsed = parseDesignText(stdout);
		expect(parsed.ok).toBe(true);
		if (!parsed.ok) return;
		for (const g of parsed.design.groups.filter((x) => x.id.startsWith('digit'))) {
			const lines = new Set(
				g.members.map((id) => parsed.design.electrodes.find((e) => e.id === id)!.line)
			);
			expect(lines.size).toBe(2);
		}
	});

	it('replaces --out atomically and leaves no temporary file', async () => {
		const dir = mkdtempSync(join(tmpdir(), 'assign-'));
		const file = join(dir, 'timer.json');
		writeFileSync(file, clearedText());
		const { code, stdout } = await runCli(['assign', file, '--commons', '3', '--out', file]);
		expect(code).toBe(0);
		expect(stdout).toContain('wiring.ok');
		const parsed = parseDesignText(readFileSync(file, 'utf8'));
		expect(parsed.ok && parsed.design.drive.commons).toBe(3);
		expect(readdirSync(dir)).toEqual(['timer.json']);
	});

	it('refuses bad input with exit 2 and a message naming the field, writing nothing', async () => {
		const dir = mkdtempSync(join(tmpdir(), 'assign-'));
		const out = join(dir, 'out.json');
		const files = { 'd.json': clearedText(), 'bad.json': '{"format":"sunglyph-design"}' };
		for (const [argv, words] of [
			[['assign', 'd.json', '--commons', '0', '--out', out], '--commons'],
			[['assign', 'd.json', '--commons', '17', '--out', out], '--commons'],
			[['assign', 'd.json', '--commons', 'four', '--out', out], '--commons'],
			[['assign', 'd.json', '--out', out], '--commons'],
			[['assign', 'bad.json', '--commons', '4', '--out', out], 'bad.json'],
			[['assign', 'missing.json', '--commons', '4', '--out', out], 'missing.json']
		] as [string[], string][]) {
			const { code, stderr } = await runCli(argv, files);
			expect(code, argv.join(' ')).toBe(2);
			expect(stderr).toContain(words);
		}
		expect(readdirSync(dir)).toEqual([]);
	});
});

describe('sunglyph pins', () => {
	it('exports the pin CSV and the C header of the demo', async () => {
		const files = { 'd.json': serializeDesign(demoDesign()) };
		const csv = await runCli(['pins', 'd.json', '--csv'], files);
		expect(csv.code).toBe(0);
		const rows = parseCsv(csv.stdout);
		// 4 commons + 29 lines (8 for the digits, one each for 21 icons, bar steps and dots), commons first.
		expect(rows).toHaveLength(1 + 33);
		expect(rows[1].slice(0, 2)).toEqual(['1', 'COM1']);
		expect(rows[5].slice(0, 2)).toEqual(['5', 'SEG1']);
		const header = await runCli(['pins', 'd.json', '--header'], files);
		expect(header.stdout).toContain('#define LCD_COMMONS 4');
		expect(header.stdout).toContain('#define LCD_LINES 29');
		const table = await runCli(['pins', 'd.json'], files);
		expect(table.stdout).toContain('33 pins on the bottom edge');
		const segments = await runCli(['pins', 'd.json', '--segments'], files);
		expect(parseCsv(segments.stdout)).toHaveLength(1 + 53);
	});

	it('refuses two formats at once', async () => {
		const { code, stderr } = await runCli(['pins', 'd.json', '--csv', '--header'], {
			'd.json': serializeDesign(demoDesign())
		});
		expect(code).toBe(2);
		expect(stderr).toContain('--csv');
	});
});

describe('sunglyph check and the pin row', () => {
	it('fails with exit 1 and a named finding when the pins do not fit the edge', async () => {
		const demo = demoDesign();
		// 18 pins at 4 mm need 72 mm; the demo's bottom edge is 66 mm.
		const tight = { ...demo, pinout: { ...demo.pinout, pitch_mm: 4 } };
		const { code, stdout } = await runCli(['check', 'd.json', '--json'], {
			'd.json': serializeDesign(tight)
		});
		expect(code).toBe(1);
		const codes = JSON.parse(stdout).wiring.findings.map((f: { code: string }) => f.code);
		expect(codes).toContain('wiring.pins-do-not-fit');
	});
});
