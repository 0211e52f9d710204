/** `sunglyph check <design.json>`: validation, wiring and the drive verdict of a design file. */
import { findingLines } from '../finding-text';
import { parseArgs } from 'node:util';
import { readDesignFile } from '../read-design';
import { analyzeDesignWithCell } from '../../lib/core/analyze-design';
import { opticsSummary, opticsLines } from '../optics-report';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { driveReportLines } from '../drive-report-text';
import { legibilityLines } from '../legibility-text';
import { loadSummaryLines } from '../load-report-text';
import { helpRows } from '../help-table';

export const CAUTION =
	'Predictions are models. Where a misreading can hurt someone, confirm with measured samples\n' +
	'of the glass and follow the applicable product standards and local regulations.';

export const CHECK_HELP = `Usage: sunglyph check <design.json> [--json]

Validates a design file and checks its wiring, its geometry against the design rules
(overlaps, gaps, widths, outlines, placement on the glass, character size) and its
multiplexed drive over the operating temperature range.

Exit status: 0 all checks pass, 1 a design check fails, 2 unreadable or invalid input,
3 an internal error (please report it).

${helpRows([
	{ flag: '--json', text: 'print the full report as JSON' },
	{ flag: '-h, --help', text: 'show this help' }
])}`;

export async function runCheck(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: { json: { type: 'boolean' }, help: { type: 'boolean', short: 'h' } }
	});
	if (values.help) {
		io.out(CHECK_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph check --help)');
	const parsed = await readDesignFile(positionals[0], io);
	if (!parsed.ok) return parsed.exitCode;
	const report = analyzeDesignWithCell(parsed.design);
	if (values.json) {
		io.out(JSON.stringify({ ...report, optics: opticsSummary(report) }, null, 2) + '\n');
	} else {
		const lines = [`${parsed.design.name}`, '', 'Wiring'];
		for (const f of report.wiring.findings) lines.push(...findingLines(f).map((l) => `  ${l}`));
		lines.push('', 'Rules');
		for (const f of report.rules.findings) lines.push(...findingLines(f).map((l) => `  ${l}`));
		lines.push('', 'Drive');
		lines.push(
			...driveReportLines(report.drive, { withCell: true })
				.join('\n')
				.split('\n')
				.map((l) => (l ? `  ${l}` : l))
		);
		lines.push('', 'Optics');
		lines.push(...opticsLines(report).map((l) => (l ? `  ${l}` : l)));
		if (report.legibility) {
			lines.push('', 'Legibility');
			lines.push(...legibilityLines(report.legibility).map((l) => (l ? `  ${l}` : l)));
		}
		lines.push('', 'Load');
		lines.push(...loadSummaryLines(report.load).map((l) => `  ${l}`));
		for (const f of report.load.findings) lines.push(...findingLines(f).map((l) => `  ${l}`));
		if (report.glass) {
			lines.push('', 'Glass');
			for (const f of report.glass.findings) lines.push(...findingLines(f).map((l) => `  ${l}`));
		}
		lines.push(
			'',
			`Overall: ${report.severity === 'fail' ? 'FAIL' : report.severity === 'warn' ? 'pass with warnings' : 'pass'}`
		);
		lines.push('', CAUTION);
		io.out(lines.join('\n') + '\n');
	}
	return report.severity === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
