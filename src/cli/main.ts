/**
 * The sunglyph command line: parses arguments, calls the core, prints. One error handler maps
 * every failure to a one-line message on stderr and an exit code.
 */
import { readFile } from 'node:fs/promises';
import { CliError, EXIT } from './cli-error';
import type { CliIo } from './io';
import { runDrive } from './commands/drive';
import { runCheck } from './commands/check';
import { runDemo } from './commands/demo';
import { runCell } from './commands/cell';
import { runIlluminant } from './commands/illuminant';
import { runReport } from './commands/report';
import { runAssign } from './commands/assign';
import { runPins } from './commands/pins';
import { runLegibility } from './commands/legibility';
import { runViewAngle } from './commands/view-angle';
import { runLoad } from './commands/load';
import { joinNegativeValues } from './parse-numbers';

export const MAIN_HELP = `sunglyph: design and check reflective segment LCD glass

Usage: sunglyph <command> [options]

Commands:
  drive        RMS levels, selection ratio and Alt–Pleshko limit of a multiplexed drive
  cell         evaluate a reflective TN cell: transmission, V10/V50/V90, colours
  illuminant   X, Y, Z and x, y of a CIE illuminant's white
  check FILE   validate a design; check its wiring, drive and optics
  report FILE  write the printable design report (HTML, or PDF with --pdf)
  legibility FILE  light scenarios, contrast with glare, visual angle, threshold, verdicts
  view-angle FILE  contrast over viewing directions, best direction, parallax shadow
  load FILE    capacitance, drive current, battery life and ITO trace settling of a design
  demo         write the demo design to stdout
  assign FILE  wire a design automatically for N commons (--commons N [--out FILE])
  pins FILE    pin map along the glass edge; --csv, --header (C) or --segments (CSV)

Run "sunglyph <command> --help" for a command's options.`;

type Command = (args: string[], io: CliIo) => number | Promise<number>;
const COMMANDS: Record<string, Command> = {
	drive: runDrive,
	cell: runCell,
	illuminant: runIlluminant,
	check: runCheck,
	report: runReport,
	demo: runDemo,
	assign: runAssign,
	pins: runPins,
	legibility: runLegibility,
	'view-angle': runViewAngle
	load: runLoad,
};

const processIo: CliIo = {
	out: (text) => process.stdout.write(text),
	err: (text) => process.stderr.write(text),
	readFile: (path) => readFile(path, 'utf8')
};

export async function main(argv: string[], io: CliIo = processIo): Promise<number> {
	const [name, ...rest] = argv;
	if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
		io.out(MAIN_HELP + '\n');
		return name === undefined ? EXIT.badInput : EXIT.ok;
	}
	const command = COMMANDS[name];
	if (!command) {
		io.err(`sunglyph: unknown command "${name}" (commands: ${Object.keys(COMMANDS).join(', ')})\n`);
		return EXIT.badInput;
	}
	try {
		return await command(joinNegativeValues(rest), io);
	} catch (error) {
		if (error instanceof CliError) {
			io.err(`sunglyph ${name}: ${error.message}\n`);
			return error.exitCode;
		}
		if (
			error instanceof Error &&
			'code' in error &&
			String(error.code).startsWith('ERR_PARSE_ARGS')
		) {
			io.err(`sunglyph ${name}: ${error.message}\n`);
			return EXIT.badInput;
		}
		throw error;
	}
}
