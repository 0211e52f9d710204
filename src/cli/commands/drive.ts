/** `sunglyph drive`: RMS levels of a multiplexed drive, optionally against a cell's thresholds. */
import { parseArgs } from 'node:util';
import { analyzeDrive } from '../../lib/core/drive/analyze-drive';
import { parseBias, parseInteger, parseNumberWithin } from '../parse-numbers';
import { BOUNDS } from '../../lib/core/design/bound-ranges';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { driveReportLines } from '../drive-report-text';
import { helpRows } from '../help-table';

export const DRIVE_HELP = `Usage: sunglyph drive --commons N --bias 1/a --volts V [options]

RMS voltages, selection ratio and the Alt–Pleshko limit of a multiplexed segment drive.

${helpRows([
	{ flag: '--commons N', text: 'number of commons (duty 1/N); 1 is static drive (required)' },
	{ flag: '--bias 1/a', text: 'bias, e.g. 1/3 (non-integer divisors allowed)', default: '1/3' },
	{ flag: '--volts V', text: 'drive amplitude (LCD supply) in volts (required)' },
	{
		flag: '--v10 V --v90 V',
		text: "the cell's 10 % and 90 % voltages at the reference temperature: adds the operating window and a verdict"
	},
	{ flag: '--reference-c T', text: 'reference temperature of --v10/--v90 in °C', default: '25' },
	{ flag: '--tc-mv-per-k K', text: 'temperature coefficient of V10/V90 in mV/K', default: '0' },
	{
		flag: '--min-c T --max-c T',
		text: 'operating temperature range in °C',
		default: 'the reference temperature'
	},
	{ flag: '--json', text: 'print a JSON object instead of a table' },
	{ flag: '-h, --help', text: 'show this help' }
])}`;

export function runDrive(args: string[], io: CliIo): number {
	const { values } = parseArgs({
		args,
		strict: true,
		allowPositionals: false,
		options: {
			commons: { type: 'string' },
			bias: { type: 'string' },
			volts: { type: 'string' },
			v10: { type: 'string' },
			v90: { type: 'string' },
			'reference-c': { type: 'string' },
			'tc-mv-per-k': { type: 'string' },
			'min-c': { type: 'string' },
			'max-c': { type: 'string' },
			json: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(DRIVE_HELP + '\n');
		return EXIT.ok;
	}
	if (values.commons === undefined) throw new CliError('--commons is required (e.g. --commons 4)');
	if (values.volts === undefined) throw new CliError('--volts is required (e.g. --volts 3.0)');
	const commons = parseInteger('commons', values.commons);
	if (commons < 1 || commons > 256) throw new CliError(`--commons: ${commons} is outside 1–256`);
	const biasDivisor = values.bias === undefined ? 3 : parseBias(values.bias);
	const amplitude_V = parseNumberWithin('volts', values.volts, BOUNDS.voltage_V);
	if (amplitude_V <= 0) throw new CliError('--volts: expected a voltage above 0');
	const hasCell = values.v10 !== undefined || values.v90 !== undefined;
	if (hasCell && (values.v10 === undefined || values.v90 === undefined)) {
		throw new CliError('--v10 and --v90 go together');
	}
	const reference_C =
		values['reference-c'] === undefined
			? 25
			: parseNumberWithin('reference-c', values['reference-c'], BOUNDS.operating_C);
	const v10_V = hasCell ? parseNumberWithin('v10', values.v10, BOUNDS.voltage_V) : 1;
	const v90_V = hasCell ? parseNumberWithin('v90', values.v90, BOUNDS.voltage_V) : 1.5;
	if (hasCell && !(v10_V > 0 && v90_V > v10_V))
		throw new CliError('--v90 must exceed --v10, both above 0');
	const temperature = (option: 'min-c' | 'max-c') =>
		values[option] === undefined
			? reference_C
			: parseNumberWithin(option, values[option], BOUNDS.operating_C);
	const min_C = temperature('min-c');
	const max_C = temperature('max-c');
	if (min_C > max_C) throw new CliError('--min-c must not exceed --max-c');
	const report = analyzeDrive({
		drive: {
			commons,
			biasDivisor,
			amplitude_V,
			frameRate_Hz: 64,
			inversion: 'line',
			temperature: { min_C, max_C }
		},
		thresholds: {
			source: 'manual',
			v10_V,
			v90_V,
			reference_C,
			tempCoeff_mV_per_K:
				values['tc-mv-per-k'] === undefined
					? 0
					: parseNumberWithin('tc-mv-per-k', values['tc-mv-per-k'], BOUNDS.tempCoeff_mV_per_K)
		}
	});
	if (values.json) {
		const json = {
			commons,
			biasDivisor,
			amplitude_V,
			static: report.isStatic,
			onRms_V: report.onRms_V,
			offRms_V: report.offRms_V,
			selectionRatio: report.selectionRatio,
			altPleshkoLimit: report.altPleshkoLimit,
			optimalBias: report.optimalBias,
			...(hasCell
				? {
						window: report.window.window,
						best_V: report.window.best_V,
						margin_V: report.window.margin_V,
						margin_percent: report.window.margin_percent,
						severity: report.severity,
						findings: report.findings
					}
				: {})
		};
		io.out(JSON.stringify(json, null, 2) + '\n');
	} else {
		io.out(driveReportLines(report, { withCell: hasCell }).join('\n') + '\n');
	}
	return hasCell && report.severity === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
