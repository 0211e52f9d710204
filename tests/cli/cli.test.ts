import { execFileSync, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli';

describe('sunglyph drive', () => {
	it('gives the published 1/4 duty, 1/3 bias figures as JSON', async () => {
		// Alt & Pleshko (1974): 1/4 duty, 1/3 bias gives V_on/V_off = √3, the limit for N = 4.
		const { code, stdout } = await runCli([
			'drive',
			'--commons',
			'4',
			'--bias',
			'1/3',
			'--volts',
			'3',
			'--json'
		]);
		expect(code).toBe(0);
		const json = JSON.parse(stdout);
		expect(Math.abs(json.selectionRatio - 1.732)).toBeLessThan(1e-3);
		expect(Math.abs(json.altPleshkoLimit - 1.732)).toBeLessThan(1e-3);
		expect(json.optimalBias).toBe(3);
		expect(json.onRms_V).toBeCloseTo(Math.sqrt(3), 9);
		expect(json.offRms_V).toBeCloseTo(1, 9);
	});

	it('agrees with the closed forms for other N and a to 1e-4', async () => {
		for (const [n, a] of [
			[2, 2],
			[3, 2.5],
			[8, 4],
			[16, 5],
			[64, 9]
		]) {
			const { stdout } = await runCli([
				'drive',
				'--commons',
				String(n),
				'--bias',
				`1/${a}`,
				'--volts',
				'5',
				'--json'
			]);
			const json = JSON.parse(stdout);
			const on = (5 / a) * Math.sqrt((n - 1 + a * a) / n);
			const off = (5 / a) * Math.sqrt((n - 1 + (a - 2) ** 2) / n);
			expect(Math.abs(json.selectionRatio - on / off)).toBeLessThan(1e-4);
			expect(
				Math.abs(json.altPleshkoLimit - Math.sqrt((Math.sqrt(n) + 1) / (Math.sqrt(n) - 1)))
			).toBeLessThan(1e-4);
			expect(Math.abs(json.optimalBias - (Math.sqrt(n) + 1))).toBeLessThan(1e-4);
		}
	});

	it('treats --commons 1 as static drive and prints a readable table', async () => {
		const json = JSON.parse(
			(await runCli(['drive', '--commons', '1', '--volts', '3', '--json'])).stdout
		);
		expect(json).toMatchObject({ static: true, onRms_V: 3, offRms_V: 0, selectionRatio: null });
		const table = await runCli(['drive', '--commons', '4', '--bias', '1/3', '--volts', '3']);
		expect(table.stdout).toMatch(/selection ratio V_on\/V_off\s+1\.7321/);
	});

	it('accepts negative temperatures and reports the window', async () => {
		const r = await runCli([
			'drive',
			'--commons',
			'4',
			'--volts',
			'3.3',
			'--v10',
			'1.3',
			'--v90',
			'1.7',
			'--tc-mv-per-k',
			'-3',
			'--min-c',
			'-10',
			'--max-c',
			'60',
			'--json'
		]);
		expect(r.code).toBe(0);
		expect(JSON.parse(r.stdout).window.min_V).toBeCloseTo(1.805 * Math.sqrt(3), 9);
	});

	it('rejects unknown options and bad values with exit 2', async () => {
		for (const argv of [
			['drive', '--commons', '4', '--volts', '3', '--colour'],
			['drive', '--commons', 'four', '--volts', '3'],
			['drive', '--commons', '4', '--volts', '-3'],
			['drive', '--commons', '4', '--bias', '1/1', '--volts', '3'],
			['drive', '--commons', '4'],
			['nonsense']
		]) {
			const r = await runCli(argv);
			expect(r.code, argv.join(' ')).toBe(2);
			expect(r.stderr, argv.join(' ')).toMatch(/\S/);
			expect(r.stdout).toBe('');
		}
	});

	it('has --help everywhere', async () => {
		for (const argv of [['--help'], ['drive', '--help'], ['check', '--help'], ['demo', '--help']]) {
			const r = await runCli(argv);
			expect(r.code).toBe(0);
			expect(r.stdout).toMatch(/Usage: sunglyph/);
		}
	});
});

describe('sunglyph check', () => {
	it('passes the demo and fails a wiring clash with exit 1', async () => {
		const demo = (await runCli(['demo'])).stdout;
		const ok = await runCli(['check', 'demo.json'], { 'demo.json': demo });
		expect(ok.code).toBe(0);
		expect(ok.stdout).toMatch(/Overall: pass/);
		const clash = JSON.parse(demo);
		clash.electrodes[1].common = clash.electrodes[0].common;
		clash.electrodes[1].line = clash.electrodes[0].line;
		const bad = await runCli(['check', 'clash.json', '--json'], {
			'clash.json': JSON.stringify(clash)
		});
		expect(bad.code).toBe(1);
		expect(JSON.parse(bad.stdout).wiring.findings[0].message).toMatch(/1A, 1B share common COM1/);
	});

	it('exits 2 and names the JSON path for a corrupted copy', async () => {
		const demo = JSON.parse((await runCli(['demo'])).stdout);
		demo.electrodes[3].outline = [demo.electrodes[3].outline[0]];
		const r = await runCli(['check', 'bad.json'], { 'bad.json': JSON.stringify(demo) });
		expect(r.code).toBe(2);
		expect(r.stderr).toContain('electrodes[3].outline: expected at least 3 points');
		const missing = await runCli(['check', '/nonexistent/design.json']);
		expect(missing.code).toBe(2);
		expect(missing.stderr).toMatch(/cannot read \/nonexistent\/design\.json: no such file/);
		expect(missing.stderr).not.toMatch(/ENOENT/);
	});

	it('works through npx as installed', () => {
		const out = execFileSync(
			'npx',
			[
				'--no-install',
				'sunglyph',
				'drive',
				'--commons',
				'4',
				'--bias',
				'1/3',
				'--volts',
				'3',
				'--json'
			],
			{ encoding: 'utf8' }
		);
		expect(JSON.parse(out).selectionRatio).toBeCloseTo(1.7320508, 6);
		const bad = spawnSync('npx', ['--no-install', 'sunglyph', 'check', 'nope.json'], {
			encoding: 'utf8'
		});
		expect(bad.status).toBe(2);
	});
});
