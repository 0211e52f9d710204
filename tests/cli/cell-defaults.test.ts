// The command line's `cell` evaluates the same cell as a new design in the app when no option is
// given, and every cell field of the design can be set from the command line.
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli';
import { evaluateCell } from '../../src/lib/core/cell/evaluate-cell';
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../../src/lib/core/design/cell-schema';
import { CELL_FIELDS, LIGHTING_FIELDS } from '../../src/lib/core/design/cell-fields';

const cellJson = async (...argv: string[]) => {
	const r = await runCli(['cell', '--json', ...argv]);
	expect(r.code, r.stderr).toBe(0);
	return JSON.parse(r.stdout);
};

describe('sunglyph cell defaults', () => {
	it('with no options gives the switching voltages of the design default cell', async () => {
		const cli = await cellJson();
		const app = evaluateCell({
			cell: DEFAULT_CELL,
			lighting: DEFAULT_LIGHTING,
			temperature_C: 25,
			wavelength_nm: 550,
			volts_V: 0
		});
		expect(cli.v10_V).toBe(app.v10_V);
		expect(cli.v90_V).toBe(app.v90_V);
		expect(cli.off.srgbHex).toBe(app.off.srgbHex);
	});

	it('applies the chiral dose and pretilt only as given', async () => {
		const base = await cellJson();
		const explicit = await cellJson('--pretilt-deg', '2', '--d-over-p', '0.1');
		expect(explicit.v10_V).toBe(base.v10_V);
		// A dose of the twist's own sense raises the threshold and one of the opposite sense lowers
		// it: the term 4·K22·(d/p)·(φ/π) under the root of the TN threshold voltage (from memory;
		// the form given in reviews of twisted-nematic displays).
		const undoped = await cellJson('--d-over-p', '0');
		const same = await cellJson('--d-over-p', '0.25');
		const opposed = await cellJson('--d-over-p', '-0.25');
		expect(undoped.v10_V).not.toBe(base.v10_V);
		expect(same.v10_V).toBeGreaterThan(undoped.v10_V);
		expect(opposed.v10_V).toBeLessThan(undoped.v10_V);
	});

	it('has an option for every number of the cell and of the light, with its default in the help', async () => {
		const help = (await runCli(['cell', '--help'])).stdout;
		for (const f of [...Object.values(CELL_FIELDS), ...Object.values(LIGHTING_FIELDS)]) {
			const line = help.split('\n').findIndex((l) => l.trimStart().startsWith(`--${f.option} `));
			expect(line, f.option).toBeGreaterThan(-1);
			const block = help
				.split('\n')
				.slice(line, line + 3)
				.join(' ');
			expect(block, f.option).toMatch(
				new RegExp(`\\(default ${String(f.default).replace('.', '\\.')}`)
			);
		}
		expect(help).toMatch(/--mode KIND/);
		expect(help).toMatch(/--polarizer-k1 T/);
		expect(help).toMatch(/--reflectance R/);
	});

	it('takes the stack options', async () => {
		const stack = ['--reflector', 'diffuse-white', '--front-reflectance', '0'];
		const white = await cellJson(...stack, '--reflectance', '0.9');
		const dim = await cellJson(...stack, '--reflectance', '0.45');
		// With no front-surface glare, a reflector of half the reflectance returns half the light.
		expect(dim.off.Y / white.off.Y).toBeCloseTo(0.5, 6);
		const negative = await cellJson('--mode', 'negative');
		expect(negative.off.Y).toBeLessThan(negative.on.Y);
	});
});
