/** `sunglyph cell`: evaluates a reflective TN cell without a design file. */
import { parseArgs } from 'node:util';
import { evaluateCell } from '../../lib/core/cell/evaluate-cell';
import { parseNumber } from '../parse-numbers';
import { QUANTITIES, cellSettingsFromArgs, pick } from '../cell-settings-from-args';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { fixed, formatTable } from '../table';
import { PIXEL_TABLE_HEAD, pixelRow } from '../optics-report';
import { CELL_HELP } from '../cell-help';

export { CELL_HELP };

export function runCell(args: string[], io: CliIo): number {
	const { values } = parseArgs({
		args,
		strict: true,
		allowPositionals: false,
		options: {
			...Object.fromEntries(QUANTITIES.map((f) => [f.option, { type: 'string' as const }])),
			material: { type: 'string' },
			'delta-n': { type: 'string' },
			mode: { type: 'string' },
			polarizer: { type: 'string' },
			'polarizer-k1': { type: 'string' },
			'polarizer-k2': { type: 'string' },
			reflectance: { type: 'string' },
			'depolarized-fraction': { type: 'string' },
			'reflector-transmittance': { type: 'string' },
			'wavelength-nm': { type: 'string' },
			volts: { type: 'string' },
			polarizers: { type: 'string' },
			'ideal-polarizers': { type: 'boolean' },
			illuminant: { type: 'string' },
			observer: { type: 'string' },
			reflector: { type: 'string' },
			'temperature-c': { type: 'string' },
			json: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(CELL_HELP + '\n');
		return EXIT.ok;
	}
	const num = (name: keyof typeof values, fallback: number) =>
		values[name] === undefined ? fallback : parseNumber(name, values[name] as string);
	const { cell, lighting } = cellSettingsFromArgs(values as Record<string, string | boolean>);
	const wavelength_nm = num('wavelength-nm', 550);
	if (!(wavelength_nm >= 380 && wavelength_nm <= 780))
		throw new CliError('--wavelength-nm: expected 380–780 nm');
	const volts_V = num('volts', 0);
	if (volts_V < 0) throw new CliError('--volts: expected 0 V or more');
	const polarizers =
		values.polarizers === undefined
			? undefined
			: pick('polarizers', values.polarizers, ['crossed', 'parallel']);
	let result;
	try {
		result = evaluateCell({
			cell,
			lighting,
			temperature_C: num('temperature-c', 25),
			wavelength_nm,
			volts_V,
			polarizerAngle_deg: polarizers === undefined ? undefined : polarizers === 'crossed' ? 90 : 0
		});
	} catch (error) {
		throw new CliError(error instanceof Error ? error.message : String(error));
	}
	const state = (s: typeof result.off) => ({
		voltage_V: s.voltage_V,
		Y: s.Y,
		x: s.x,
		y: s.y,
		L: s.L,
		a: s.a,
		b: s.b,
		srgbHex: s.srgbHex
	});
	if (values.json) {
		const { transmittance, v10_V, v50_V, v90_V, contrastRatio, temperature_C } = result;
		io.out(
			JSON.stringify(
				{
					temperature_C,
					wavelength_nm,
					volts_V,
					transmittance,
					v10_V,
					v50_V,
					v90_V,
					off: state(result.off),
					on: state(result.on),
					contrastRatio
				},
				null,
				2
			) + '\n'
		);
		return EXIT.ok;
	}
	io.out(
		[
			formatTable([
				['transmittance', `${fixed(result.transmittance, 6)} at ${wavelength_nm} nm, ${volts_V} V`],
				[
					'V10 / V50 / V90',
					`${fixed(result.v10_V, 3)} / ${fixed(result.v50_V, 3)} / ${fixed(result.v90_V, 3)} V`
				],
				['contrast ratio', fixed(result.contrastRatio, 2)]
			]),
			'',
			formatTable([PIXEL_TABLE_HEAD, pixelRow('off', result.off), pixelRow('on', result.on)])
		].join('\n') + '\n'
	);
	return EXIT.ok;
}
