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
import { runExport } from './commands/export';
import { joinNegativeValues } from './parse-numbers';

export const MAIN_HELP = `sunglyph: design and check reflective segment LCD glass

Usage: sunglyph <command> [options]

Commands:
  drive        RMS levels, selection ratio and Alt–Pleshko limit of a multiplexed drive
  cell         evaluate a reflective TN cell: transmission, V10/V50/V90, colours
  illuminant   X, Y, Z and x, y of a CIE illuminant's white
  check FILE   validate a design; check its wiring, drive and optics
  demo         write the demo design to stdout
  export FILE  write the glass artwork: SVG, DXF, Gerber per plate and the pin-map CSV

Run "sunglyph <command> --help" for a command's options.`;

type Command = (args: string[], io: CliIo) => number | Promise<number>;
const COMMANDS: Record<string, Command> = {
	drive: runDrive,
	cell: runCell,
	illuminant: runIlluminant,
	check: runCheck,
	demo: runDemo,
	export: runExport
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
