/** `sunglyph load <design.json>`: capacitance, drive current, battery life and trace settling. */
import { parseArgs } from 'node:util';
import { analyzeLoad } from '../../lib/core/load/analyze-load';
import { LOAD_PATTERNS, type LoadPattern } from '../../lib/core/load/load-settings';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { loadReportLines } from '../load-report-text';
import { parseNumber } from '../parse-numbers';
import { readDesignFile } from '../read-design';

export const LOAD_HELP = `Usage: sunglyph load <design.json> [--pattern P] [--battery-mAh N] [--per-electrode] [--json]

Electrical load of the display: capacitance per electrode, segment line and common (from the
real electrode areas and the fluid's ε⊥/ε∥), drive power and current over the real multiplexed
waveform, battery life, and the settling of known ITO traces.

Exit status: 0 within limits, 1 a load check fails (budget, trace settling), 2 bad input.

  --pattern all-on|all-off|reading   picture shown            (default: the design's, else reading)
  --battery-mAh N                    battery capacity         (default: the design's, else none)
  --per-electrode                    also list every electrode's area, capacitance and current
  --json                             print the report as JSON
  -h, --help                         show this help`;

export async function runLoad(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			pattern: { type: 'string' },
			'battery-mAh': { type: 'string' },
			'per-electrode': { type: 'boolean' },
			json: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(LOAD_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph load --help)');
	const pattern = values.pattern;
	if (pattern !== undefined && !(LOAD_PATTERNS as readonly string[]).includes(pattern))
		throw new CliError(`--pattern: "${pattern}" is not one of ${LOAD_PATTERNS.join(', ')}`);
	let battery_mAh: number | undefined;
	if (values['battery-mAh'] !== undefined) {
		battery_mAh = parseNumber('battery-mAh', values['battery-mAh']);
		if (!(battery_mAh > 0 && battery_mAh <= 1e7))
			throw new CliError('--battery-mAh: expected a capacity above 0 and at most 10 000 000 mAh');
	}
	const design = await readDesignFile(positionals[0], io);
	if (!design.ok) return design.exitCode;
	const report = analyzeLoad(design.design, {
		pattern: pattern as LoadPattern | undefined,
		battery_mAh
	});
	io.out(
		values.json
			? JSON.stringify(report, null, 2) + '\n'
			: [
					design.design.name,
					'',
					...loadReportLines(report, { perElectrode: values['per-electrode'] })
				].join('\n') + '\n'
	);
	return report.severity === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
