/** Help of `sunglyph cell`: every option with its range and the design default it falls back to. */
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../lib/core/design/cell-schema';
import { CELL_FIELDS, LIGHTING_FIELDS } from '../lib/core/design/cell-fields';
import { LC_PRESETS } from '../lib/core/lc/presets';
import { flagWidth, helpRows, quantityRow, type HelpRow } from './help-table';
import { MODES, POLARIZERS, REFLECTORS } from './cell-settings-from-args';

const presetOf = (cell: typeof DEFAULT_CELL) =>
	'preset' in cell.material ? cell.material.preset : cell.material.custom.id;

const CELL_ROWS: HelpRow[] = [
	{
		flag: '--material ID',
		text: `fluid preset: ${LC_PRESETS.map((m) => m.id).join(', ')}`,
		default: presetOf(DEFAULT_CELL)
	},
	{
		flag: '--delta-n DN',
		text: "replace the fluid's birefringence by a constant Δn (no dispersion)"
	},
	...Object.values(CELL_FIELDS).map((f) => quantityRow(f)),
	{
		flag: '--mode KIND',
		text: `${MODES.join(' or ')} (dark or light segments)`,
		default: DEFAULT_CELL.mode
	},
	{ flag: '--polarizer KIND', text: POLARIZERS.join(', '), default: DEFAULT_CELL.polarizer.kind },
	{ flag: '--polarizer-k1 T', text: 'custom polarizer: pass-axis transmittance, 0 to 1' },
	{ flag: '--polarizer-k2 T', text: 'custom polarizer: block-axis transmittance, 0 to 1' },
	{ flag: '--ideal-polarizers', text: 'same as --polarizer ideal' },
	{ flag: '--reflector KIND', text: REFLECTORS.join(', '), default: DEFAULT_CELL.reflector.kind },
	{
		flag: '--reflectance R',
		text: "reflector's reflectance, 0 to 1",
		default: "the reflector's own"
	},
	{ flag: '--depolarized-fraction F', text: 'share of light the reflector depolarizes, 0 to 1' },
	{
		flag: '--reflector-transmittance T',
		text: 'transflector: share passed to the backlight, 0 to 1'
	}
];

const LIGHT_ROWS: HelpRow[] = [
	{
		flag: '--illuminant NAME',
		text: 'A, D50, D65, D<cct> such as D75, F2, F11 or E',
		default: DEFAULT_LIGHTING.illuminant
	},
	{
		flag: '--observer 2|10',
		text: 'CIE 1931 2° or CIE 1964 10° observer',
		default: String(DEFAULT_LIGHTING.observer)
	},
	...Object.values(LIGHTING_FIELDS).map((f) => quantityRow(f)),
	{ flag: '--temperature-c T', text: 'cell temperature in °C', default: '25' },
	{ flag: '--wavelength-nm NM', text: 'wavelength of the transmittance figure', default: '550 nm' },
	{ flag: '--volts V', text: 'RMS voltage of the driven pixel; 0 = saturated', default: '0' },
	{
		flag: '--polarizers crossed|parallel',
		text: 'angle between the polarizers, overriding the one --mode sets',
		default: 'as --mode sets: crossed for a positive 90° cell'
	},
	{ flag: '--json', text: 'print JSON' },
	{ flag: '-h, --help', text: 'show this help' }
];

const WIDTH = flagWidth(CELL_ROWS, LIGHT_ROWS);

export const CELL_HELP = `Usage: sunglyph cell [options] [--json]

Evaluates a reflective twisted-nematic cell: single-pass transmission, the electro-optic curve
with V10/V50/V90, and the colour of the unpowered and driven pixel. Every option left out takes
the default of a new design, so this is the same cell the app starts from.

Cell:
${helpRows(CELL_ROWS, WIDTH)}

Light and figures:
${helpRows(LIGHT_ROWS, WIDTH)}`;
