/**
 * The sunglyph command line: parses arguments, calls the core, prints. One error handler maps
 * every failure to a one-line message on stderr and an exit code. Each command's module is
 * loaded only when that command runs, so a quick drive calculation never loads the cell model.
 */
import { readFile } from 'node:fs/promises';
import { CliError, EXIT, REPORT_TO } from './cli-error';
import { escapeControls } from '../lib/core/text/escape-controls';
import type { CliIo } from './io';
import { joinNegativeValues } from './parse-numbers';

export const MAIN_HELP = `sunglyph: design and check reflective segment LCD glass

Usage: sunglyph <command> [options]

Commands:
  drive            RMS levels, selection ratio and Alt–Pleshko limit of a multiplexed drive
  cell             evaluate a reflective TN cell: transmission, V10/V50/V90, colours
  illuminant       X, Y, Z and x, y of a CIE illuminant's white
  check FILE       validate a design; check wiring, rules, drive, optics, load, legibility
  assign FILE      wire a design automatically for N commons (--commons N [--out FILE])
  pins FILE        pin map along the glass edge; --csv, --header (C) or --segments (CSV)
  load FILE        capacitance, drive current, battery life and ITO trace settling
  legibility FILE  light scenarios, contrast with glare, visual angle, threshold, verdicts
  view-angle FILE  contrast over viewing directions, best direction, parallax shadow
  export FILE      write the glass artwork: SVG, DXF, Gerber per plate and the pin-map CSV
  report FILE      write the printable design report (HTML, or PDF with --pdf)
  demo             write the demo design to stdout

Exit status: 0 pass, 1 the design fails a check, 2 bad input, 3 internal error.

Run "sunglyph <command> --help" for a command's options.`;

type Command = (args: string[], io: CliIo) => number | Promise<number>;
const COMMANDS: Record<string, () => Promise<Command>> = {
	drive: async () => (await import('./commands/drive')).runDrive,
	cell: async () => (await import('./commands/cell')).runCell,
	illuminant: async () => (await import('./commands/illuminant')).runIlluminant,
	check: async () => (await import('./commands/check')).runCheck,
	demo: async () => (await import('./commands/demo')).runDemo,
	report: async () => (await import('./commands/report')).runReport,
	assign: async () => (await import('./commands/assign')).runAssign,
	pins: async () => (await import('./commands/pins')).runPins,
	legibility: async () => (await import('./commands/legibility')).runLegibility,
	'view-angle': async () => (await import('./commands/view-angle')).runViewAngle,
	load: async () => (await import('./commands/load')).runLoad,
	export: async () => (await import('./commands/export')).runExport
};

const processIo: CliIo = {
	out: (text) => process.stdout.write(text),
	err: (text) => process.stderr.write(text),
	readFile: (path) => readFile(path, 'utf8'),
	readBytes: (path) => readFile(path)
};

/** Every line the CLI prints passes through here, so no input can drive the terminal. */
function safeIo(io: CliIo): CliIo {
	return {
		...io,
		out: (text) => io.out(escapeControls(text)),
		err: (text) => io.err(escapeControls(text))
	};
}

function isParseArgsError(error: unknown): boolean {
	return (
		error instanceof Error && 'code' in error && String(error.code).startsWith('ERR_PARSE_ARGS')
	);
}

export async function main(argv: string[], rawIo: CliIo = processIo): Promise<number> {
	const io = safeIo(rawIo);
	const [name, ...rest] = argv;
	if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
		io.out(MAIN_HELP + '\n');
		return name === undefined ? EXIT.badInput : EXIT.ok;
	}
	const load = Object.hasOwn(COMMANDS, name) ? COMMANDS[name] : undefined;
	if (!load) {
		io.err(`sunglyph: unknown command "${name}" (commands: ${Object.keys(COMMANDS).join(', ')})\n`);
		return EXIT.badInput;
	}
	try {
		const command = await load();
		return await command(joinNegativeValues(rest), io);
	} catch (error) {
		if (error instanceof CliError) {
			io.err(`sunglyph ${name}: ${error.message}\n`);
			return error.exitCode;
		}
		if (isParseArgsError(error)) {
			io.err(`sunglyph ${name}: ${(error as Error).message}\n`);
			return EXIT.badInput;
		}
		const what = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
		const firstLine = what.split('\n')[0].slice(0, 300);
		io.err(`sunglyph ${name}: internal error (${firstLine}); ${REPORT_TO}\n`);
		return EXIT.internal;
	}
}
