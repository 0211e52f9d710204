/** `sunglyph view-angle <design.json>`: contrast over viewing directions and the best direction. */
import { parseArgs } from 'node:util';
import { overallSeverity } from '../../lib/core/findings/finding';
import { viewAngleReport } from '../../lib/core/viewangle/view-angle-report';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { readDesign } from '../read-design';
import { parseNumber } from '../parse-numbers';
import { findingLines } from '../finding-text';
import { CAUTION } from './check';
import { viewAngleLines } from '../view-angle-text';

export const VIEW_ANGLE_HELP = `Usage: sunglyph view-angle <design.json> [options]

Contrast ratio of on against off segments over viewing directions (polar 0–60°, all azimuths)
for the design's drive, the best viewing direction as a clock hour, iso-contrast cones and the
parallax shadow. Azimuths run clockwise from 3 o'clock as the viewer sees the glass.

Exit status: 0 no failed check, 1 a check fails, 2 unreadable or invalid input.

  --polar-step DEG      polar angle step, 0.5–60 (default 5)
  --azimuth-step DEG    azimuth step, 1–180 (default 15)
  --temperature-c C     temperature (default 25 °C, clamped to the design's range)
  --json                print the full report as JSON
  -h, --help            show this help`;

export async function runViewAngle(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			'polar-step': { type: 'string' },
			'azimuth-step': { type: 'string' },
			'temperature-c': { type: 'string' },
			json: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(VIEW_ANGLE_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph view-angle --help)');
	const polarStep_deg =
		values['polar-step'] === undefined ? 5 : parseNumber('polar-step', values['polar-step']);
	const azimuthStep_deg =
		values['azimuth-step'] === undefined ? 15 : parseNumber('azimuth-step', values['azimuth-step']);
	if (!(polarStep_deg >= 0.5 && polarStep_deg <= 60))
		throw new CliError(`--polar-step: expected 0.5 to 60 degrees, got ${polarStep_deg}`);
	if (!(azimuthStep_deg >= 1 && azimuthStep_deg <= 180))
		throw new CliError(`--azimuth-step: expected 1 to 180 degrees, got ${azimuthStep_deg}`);
	const temperature_C =
		values['temperature-c'] === undefined
			? undefined
			: parseNumber('temperature-c', values['temperature-c']);
	const design = await readDesign(io, positionals[0]);
	if (temperature_C !== undefined) {
		const { min_C, max_C } = design.drive.temperature;
		if (!(temperature_C >= min_C && temperature_C <= max_C))
			throw new CliError(
				`--temperature-c: expected a temperature within the design's range ${min_C} to ${max_C} °C`
			);
	}
	const report = viewAngleReport({ design, polarStep_deg, azimuthStep_deg, temperature_C });
	const severity = overallSeverity(report.findings);
	if (values.json) {
		io.out(JSON.stringify({ ...report, severity }, null, 2) + '\n');
	} else {
		const lines = [design.name, '', ...viewAngleLines(report), '', 'Findings'];
		for (const f of report.findings) lines.push(...findingLines(f).map((l) => `  ${l}`));
		lines.push('', CAUTION);
		io.out(lines.join('\n') + '\n');
	}
	return severity === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
