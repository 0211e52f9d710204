/** `sunglyph demo`: writes the demo design to stdout. */
import { parseArgs } from 'node:util';
import { demoDesign } from '../../lib/core/design/demo';
import { serializeDesign } from '../../lib/core/design/parse-design';
import { EXIT } from '../cli-error';
import type { CliIo } from '../io';

export const DEMO_HELP = `Usage: sunglyph demo

Writes the demo design (a fictional garden-water timer's readout) as JSON to stdout,
e.g.  sunglyph demo > controller.json`;

export function runDemo(args: string[], io: CliIo): number {
	const { values } = parseArgs({
		args,
		strict: true,
		allowPositionals: false,
		options: { help: { type: 'boolean', short: 'h' } }
	});
	io.out(values.help ? DEMO_HELP + '\n' : serializeDesign(demoDesign()));
	return EXIT.ok;
}
