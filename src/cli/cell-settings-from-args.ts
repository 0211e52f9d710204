/**
 * The `cell` command's options turned into the design's cell and light sections. Every option
 * left out takes the design default (design/cell-schema.ts), so the command line and the app
 * evaluate the same cell; ranges come from the one declaration in design/cell-fields.ts.
 */
import {
	DEFAULT_CELL,
	DEFAULT_LIGHTING,
	cellSchema,
	lightingSchema,
	type CellSettings,
	type Lighting
} from '../lib/core/design/cell-schema';
import { CELL_FIELDS, LIGHTING_FIELDS } from '../lib/core/design/cell-fields';
import { LC_PRESETS, presetById } from '../lib/core/lc/presets';
import { illuminantByName } from '../lib/core/color/illuminant-by-name';
import { formatJsonPath } from '../lib/core/design/issues';
import { parseNumber } from './parse-numbers';
import { CliError } from './cli-error';

export const REFLECTORS = ['diffuse-white', 'brushed-metal', 'transflective'] as const;
export const POLARIZERS = ['neutral-grey', 'ideal', 'custom'] as const;
export const MODES = ['positive', 'negative'] as const;
export const QUANTITIES = [...Object.values(CELL_FIELDS), ...Object.values(LIGHTING_FIELDS)];

/** The option that sets each document field, for error messages. */
const OPTION_OF_FIELD: Record<string, string> = {
	...Object.fromEntries(QUANTITIES.map((f) => [f.key, `--${f.option}`])),
	illuminant: '--illuminant',
	material: '--delta-n',
	k1: '--polarizer-k1',
	k2: '--polarizer-k2',
	reflectance: '--reflectance',
	depolarizedFraction: '--depolarized-fraction',
	transmittance: '--reflector-transmittance'
};

type Values = Record<string, string | boolean | undefined>;

export function pick<T extends string>(option: string, value: string, allowed: readonly T[]): T {
	if (!(allowed as readonly string[]).includes(value)) {
		throw new CliError(`--${option}: "${value}" is not one of ${allowed.join(', ')}`);
	}
	return value as T;
}

const text = (values: Values, option: string) => {
	const v = values[option];
	return typeof v === 'string' ? v : undefined;
};
const optionalNumber = (values: Values, option: string) => {
	const v = text(values, option);
	return v === undefined ? undefined : parseNumber(option, v);
};

function materialOf(values: Values): CellSettings['material'] {
	const fallback = 'preset' in DEFAULT_CELL.material ? DEFAULT_CELL.material.preset : '';
	const presetId = text(values, 'material') ?? fallback;
	const preset = presetById(presetId);
	if (!preset)
		throw new CliError(
			`--material: unknown preset "${presetId}" (known: ${LC_PRESETS.map((m) => m.id).join(', ')})`
		);
	const deltaN = optionalNumber(values, 'delta-n');
	if (deltaN === undefined) return { preset: presetId };
	if (!(deltaN > 0 && deltaN < 1))
		throw new CliError('--delta-n: expected a birefringence between 0 and 1');
	const o = preset.ordinary;
	return {
		custom: {
			...preset,
			id: `${preset.id}-dn`,
			label: `${preset.label}, Δn = ${deltaN}`,
			extraordinary: { a: o.a + deltaN, b_um2: o.b_um2, c_um4: o.c_um4 }
		}
	};
}

function polarizerOf(values: Values): CellSettings['polarizer'] {
	const given = text(values, 'polarizer');
	const kind = values['ideal-polarizers']
		? 'ideal'
		: pick('polarizer', given ?? DEFAULT_CELL.polarizer.kind, POLARIZERS);
	if (kind !== 'custom') {
		if (values['polarizer-k1'] !== undefined || values['polarizer-k2'] !== undefined)
			throw new CliError('--polarizer-k1/--polarizer-k2 need --polarizer custom');
		return { kind };
	}
	const k1 = optionalNumber(values, 'polarizer-k1');
	const k2 = optionalNumber(values, 'polarizer-k2');
	if (k1 === undefined || k2 === undefined)
		throw new CliError('--polarizer custom needs --polarizer-k1 and --polarizer-k2');
	return { kind, k1, k2 };
}

function reflectorOf(values: Values): CellSettings['reflector'] {
	const kind = pick(
		'reflector',
		text(values, 'reflector') ?? DEFAULT_CELL.reflector.kind,
		REFLECTORS
	);
	const reflector: CellSettings['reflector'] = { kind };
	const reflectance = optionalNumber(values, 'reflectance');
	const depolarizedFraction = optionalNumber(values, 'depolarized-fraction');
	const transmittance = optionalNumber(values, 'reflector-transmittance');
	if (reflectance !== undefined) reflector.reflectance = reflectance;
	if (depolarizedFraction !== undefined) reflector.depolarizedFraction = depolarizedFraction;
	if (transmittance !== undefined) {
		if (kind !== 'transflective')
			throw new CliError('--reflector-transmittance needs --reflector transflective');
		reflector.transmittance = transmittance;
	}
	return reflector;
}

export function cellSettingsFromArgs(values: Values): { cell: CellSettings; lighting: Lighting } {
	const cellInput: Record<string, unknown> = {
		...DEFAULT_CELL,
		material: materialOf(values),
		mode: pick('mode', text(values, 'mode') ?? DEFAULT_CELL.mode, MODES),
		polarizer: polarizerOf(values),
		reflector: reflectorOf(values)
	};
	for (const f of Object.values(CELL_FIELDS))
		cellInput[f.key] = optionalNumber(values, f.option) ?? f.default;
	const cell = validated(cellSchema, cellInput, 'cell');
	const illuminant = text(values, 'illuminant') ?? DEFAULT_LIGHTING.illuminant;
	try {
		illuminantByName(illuminant);
	} catch (error) {
		throw new CliError(`--illuminant: ${(error as Error).message}`);
	}
	const observer = Number(
		pick('observer', text(values, 'observer') ?? String(DEFAULT_LIGHTING.observer), ['2', '10'])
	) as 2 | 10;
	const lightingInput: Record<string, unknown> = { ...DEFAULT_LIGHTING, illuminant, observer };
	for (const f of Object.values(LIGHTING_FIELDS))
		lightingInput[f.key] = optionalNumber(values, f.option) ?? f.default;
	return { cell, lighting: validated(lightingSchema, lightingInput, 'lighting') };
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
	const last = issue.path[issue.path.length - 1];
	const option = OPTION_OF_FIELD[String(issue.path[0])] ?? OPTION_OF_FIELD[String(last)];
	throw new CliError(`${option ?? formatJsonPath([root, ...issue.path])}: ${issue.message}`);
}
