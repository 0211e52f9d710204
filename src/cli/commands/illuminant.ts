/** `sunglyph illuminant <name>`: tristimulus values and chromaticity of an illuminant's white. */
import { parseArgs } from 'node:util';
import { illuminantByName } from '../../lib/core/color/illuminant-by-name';
import { illuminantWhitePoint } from '../../lib/core/color/spectrum-to-xyz';
import { xyzToXy } from '../../lib/core/color/chromaticity';
import { observerName } from '../../lib/core/cell/cell-optics';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { formatTable } from '../table';
import { helpRows } from '../help-table';

export const ILLUMINANT_HELP = `Usage: sunglyph illuminant <name> [--observer 2|10] [--json]

X, Y, Z (Y = 100) and x, y of a CIE illuminant's white, integrated over 380–780 nm in 5 nm steps.
Names: A, D50, D65, D<cct> such as D75, F2, F11, E.

${helpRows([
	{ flag: '--observer 2|10', text: 'CIE 1931 2° or CIE 1964 10° observer', default: '2' },
	{ flag: '--json', text: 'print JSON' },
	{ flag: '-h, --help', text: 'show this help' }
])}`;

export function runIlluminant(args: string[], io: CliIo): number {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			observer: { type: 'string' },
			json: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(ILLUMINANT_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected one illuminant name, e.g. sunglyph illuminant D65');
	const observerText = values.observer ?? '2';
	if (observerText !== '2' && observerText !== '10')
		throw new CliError(`--observer: "${observerText}" is not 2 or 10`);
	let illuminant;
	try {
		illuminant = illuminantByName(positionals[0]);
	} catch (error) {
		throw new CliError((error as Error).message);
	}
	const white = illuminantWhitePoint({
		illuminant,
		observer: observerName(Number(observerText) as 2 | 10)
	});
	const { x, y } = xyzToXy(white);
	const result = {
		illuminant: positionals[0],
		observer: Number(observerText),
		X: white.X,
		Y: white.Y,
		Z: white.Z,
		x,
		y
	};
	if (values.json) io.out(JSON.stringify(result, null, 2) + '\n');
	else
		io.out(
			formatTable([
				['illuminant', `${positionals[0]} (${observerText}° observer)`],
				['X Y Z', [white.X, white.Y, white.Z].map((v) => v.toFixed(3)).join('  ')],
				['x y', `${x.toFixed(5)}  ${y.toFixed(5)}`]
			]) + '\n'
		);
	return EXIT.ok;
}
