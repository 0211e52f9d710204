/** `sunglyph legibility <design.json>`: every light scenario, its luminances, contrast and verdicts. */
import { parseArgs } from 'node:util';
import { readDesignFile } from '../read-design';
import { analyzeCell } from '../../lib/core/cell/analyze-cell';
import {
	analyzeLegibility,
	type TemperatureEnd
} from '../../lib/core/legibility/analyze-legibility';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { legibilityLines } from '../legibility-text';
import { CAUTION } from './check';

export const LEGIBILITY_HELP = `Usage: sunglyph legibility <design.json> [--json] [--scenario NAME] [--end cold|room|hot]

Judges every light scenario of a design: background, off and on luminance with the
front-surface veil, contrast, colour differences, visual angles, the Adrian threshold and
the visibility level of each character group, with a verdict and a fix.

Exit status: 0 readable (warnings allowed), 1 a scenario is not readable, 2 bad input.

  --scenario NAME   only this scenario (repeatable)
  --end END         the cell at the cold end, room temperature or hot end  (default room)
  --json            print the report as JSON
  -h, --help        show this help`;

export async function runLegibility(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			json: { type: 'boolean' },
			scenario: { type: 'string', multiple: true },
			end: { type: 'string' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(LEGIBILITY_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph legibility --help)');
	const end = (values.end ?? 'room') as TemperatureEnd;
	if (!['cold', 'room', 'hot'].includes(end))
		throw new CliError(`--end: expected cold, room or hot, got "${values.end}"`);
	const path = positionals[0];
	const parsed = await readDesignFile(path, io);
	if (!parsed.ok) return parsed.exitCode;
	const design = parsed.design;
	const known = design.legibility.scenarios.map((s) => s.name);
	for (const name of values.scenario ?? []) {
		if (!known.includes(name))
			throw new CliError(`--scenario: no scenario "${name}" (scenarios: ${known.join(', ')})`);
	}
	let cell;
	try {
		cell = analyzeCell(design);
	} catch (error) {
		io.err(
			`${path}: the cell model failed: ${error instanceof Error ? error.message : String(error)}\n`
		);
		return EXIT.checkFailed;
	}
	const report = analyzeLegibility({ design, cell, end, scenarioNames: values.scenario });
	if (values.json) io.out(JSON.stringify(report, null, 2) + '\n');
	else io.out([design.name, '', ...legibilityLines(report), '', CAUTION].join('\n') + '\n');
	return report.severity === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
