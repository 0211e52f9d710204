/** `sunglyph cell`: evaluates a reflective TN cell without a design file. */
import { parseArgs } from 'node:util';
import { evaluateCell } from '../../lib/core/cell/evaluate-cell';
import {
	DEFAULT_CELL,
	DEFAULT_LIGHTING,
	cellSchema,
	lightingSchema,
	type CellSettings
} from '../../lib/core/design/cell-schema';
import { LC_PRESETS, presetById } from '../../lib/core/lc/presets';
import { illuminantByName } from '../../lib/core/color/illuminant-by-name';
import { formatJsonPath } from '../../lib/core/design/issues';
import { parseNumber } from '../parse-numbers';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { fixed, formatTable } from '../table';
import { PIXEL_TABLE_HEAD, pixelRow } from '../optics-report';

const OPTION_OF_FIELD: Record<string, string> = {
	gap_um: '--gap-um',
	twist_deg: '--twist',
	pretilt_deg: '--pretilt-deg',
	illuminant: '--illuminant',
	material: '--delta-n'
};

const REFLECTORS = ['diffuse-white', 'brushed-metal', 'transflective'] as const;

export const CELL_HELP = `Usage: sunglyph cell [options] [--json]

Evaluates a reflective twisted-nematic cell: single-pass transmission, the electro-optic curve
with V10/V50/V90, and the colour of the unpowered and driven pixel.

  --twist DEG             total twist, 0–270                             (default 90)
  --gap-um UM             cell gap                                       (default 5)
  --material ID           fluid preset: ${LC_PRESETS.map((m) => m.id).join(', ')}
                                                                         (default generic-reflective-tn)
  --delta-n DN            replace the fluid's birefringence by a constant Δn (no dispersion)
  --pretilt-deg DEG       pretilt at both plates                         (default 0, the textbook cell)
  --wavelength-nm NM      wavelength of the transmittance figure         (default 550)
  --volts V               RMS voltage of the driven pixel; 0 = saturated (default 0)
  --polarizers crossed|parallel   angle between the polarizers           (default crossed)
  --ideal-polarizers      lossless polarizers instead of the neutral-grey model
  --illuminant NAME       A, D50, D65, D<cct> such as D75, F2, F11 or E  (default D65)
  --observer 2|10         CIE 1931 2° or CIE 1964 10° observer           (default 2)
  --reflector KIND        ${REFLECTORS.join(', ')}         (default brushed-metal)
  --temperature-c T       cell temperature                               (default 25)
  --json                  print JSON
  -h, --help              show this help`;

function pick<T extends string>(option: string, value: string, allowed: readonly T[]): T {
	if (!(allowed as readonly string[]).includes(value)) {
		throw new CliError(`--${option}: "${value}" is not one of ${allowed.join(', ')}`);
	}
	return value as T;
}

export function runCell(args: string[], io: CliIo): number {
	const { values } = parseArgs({
		args,
		strict: true,
		allowPositionals: false,
		options: {
			twist: { type: 'string' },
			'gap-um': { type: 'string' },
			material: { type: 'string' },
			'delta-n': { type: 'string' },
			'pretilt-deg': { type: 'string' },
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
	const presetId = values.material ?? 'generic-reflective-tn';
	const preset = presetById(presetId);
	if (!preset)
		throw new CliError(
			`--material: unknown preset "${presetId}" (known: ${LC_PRESETS.map((m) => m.id).join(', ')})`
		);
	let material: CellSettings['material'] = { preset: presetId };
	if (values['delta-n'] !== undefined) {
		const deltaN = parseNumber('delta-n', values['delta-n']);
		if (!(deltaN > 0 && deltaN < 1))
			throw new CliError('--delta-n: expected a birefringence between 0 and 1');
		const o = preset.ordinary;
		material = {
			custom: {
				...preset,
				id: `${preset.id}-dn`,
				label: `${preset.label}, Δn = ${deltaN}`,
				extraordinary: { a: o.a + deltaN, b_um2: o.b_um2, c_um4: o.c_um4 }
			}
		};
	}
	const cellInput = {
		...DEFAULT_CELL,
		material,
		twist_deg: num('twist', 90),
		gap_um: num('gap-um', 5),
		pretilt_deg: num('pretilt-deg', 0),
		mode: 'positive' as const,
		polarizer: values['ideal-polarizers']
			? { kind: 'ideal' as const }
			: { kind: 'neutral-grey' as const },
		reflector: { kind: pick('reflector', values.reflector ?? 'brushed-metal', REFLECTORS) }
	};
	const cell = validated(cellSchema, cellInput, 'cell');
	const illuminant = values.illuminant ?? 'D65';
	try {
		illuminantByName(illuminant);
	} catch (error) {
		throw new CliError(`--illuminant: ${(error as Error).message}`);
	}
	const observer = Number(pick('observer', values.observer ?? '2', ['2', '10'])) as 2 | 10;
	const lighting = validated(
		lightingSchema,
		{ ...DEFAULT_LIGHTING, illuminant, observer },
		'lighting'
	);
	const wavelength_nm = num('wavelength-nm', 550);
	if (!(wavelength_nm >= 380 && wavelength_nm <= 780))
		throw new CliError('--wavelength-nm: expected 380–780 nm');
	const volts_V = num('volts', 0);
	if (volts_V < 0) throw new CliError('--volts: expected 0 V or more');
	const polarizers = pick('polarizers', values.polarizers ?? 'crossed', ['crossed', 'parallel']);
	let result;
	try {
		result = evaluateCell({
			cell,
			lighting,
			temperature_C: num('temperature-c', 25),
			wavelength_nm,
			volts_V,
			polarizerAngle_deg: polarizers === 'crossed' ? 90 : 0
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

function validated<T>(
	schema: {
		safeParse: (
			v: unknown
		) =>
			| { success: true; data: T }
			| { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } };
	},
	value: unknown,
	root: string
): T {
	const parsed = schema.safeParse(value);
	if (parsed.success) return parsed.data;
	const issue = parsed.error.issues[0];
	const option = OPTION_OF_FIELD[String(issue.path[0])];
	throw new CliError(`${option ?? formatJsonPath([root, ...issue.path])}: ${issue.message}`);
}
