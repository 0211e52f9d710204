/** `sunglyph export <design.json> --out <dir>`: the glass artwork files a glass maker builds from. */
import { mkdir, rename, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { readDesignFile } from '../read-design';
import {
	EXPORT_FORMATS,
	glassExportFiles,
	type ExportFormat
} from '../../lib/core/export/glass-export';
import { overallSeverity } from '../../lib/core/findings/finding';
import { checkGlass } from '../../lib/core/glass/check-glass';
import { planGlass } from '../../lib/core/glass/plan-glass';
import { CliError, EXIT } from '../cli-error';
import { findingLines } from '../finding-text';
import type { CliIo } from '../io';

export const EXPORT_HELP = `Usage: sunglyph export <design.json> --out <dir> [--format svg,dxf,gerber,csv] [--generate]

Writes the glass artwork: SVG per plate and a composite with the ghosts, DXF (mm, one layer per
plate and outline), Gerber RS-274X per plate and the pin-map CSV, then prints the glass check.
The same design gives byte-identical files every time, and the same files as the app.

Exit status: 0 written and the glass check passes, 1 written but the glass check fails,
2 unreadable or invalid input (nothing written).

  --out DIR      folder for the files (created if missing)
  --format LIST  comma-separated: ${EXPORT_FORMATS.join(', ')} (default: all)
  --generate     route the transfer points and traces again before exporting
  -h, --help     show this help`;

function parseFormats(text: string | undefined): ExportFormat[] {
	if (text === undefined) return [...EXPORT_FORMATS];
	const list = text
		.split(',')
		.map((s) => s.trim())
		.filter(Boolean);
	for (const f of list)
		if (!(EXPORT_FORMATS as readonly string[]).includes(f))
			throw new CliError(`--format: unknown format "${f}" (expected ${EXPORT_FORMATS.join(', ')})`);
	if (list.length === 0) throw new CliError('--format: expected at least one format');
	return list as ExportFormat[];
}

export async function runExport(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			out: { type: 'string' },
			format: { type: 'string' },
			generate: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(EXPORT_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph export --help)');
	if (!values.out) throw new CliError('--out: expected a folder for the files');
	const formats = parseFormats(values.format);
	const path = positionals[0];
	const parsed = await readDesignFile(path, io);
	if (!parsed.ok) return parsed.exitCode;
	let design = parsed.design;
	const planFindings = [];
	if (values.generate) {
		const plan = planGlass(design);
		design = { ...design, glassArt: plan.glassArt };
		planFindings.push(...plan.findings);
	}
	const files = glassExportFiles(design, formats);
	try {
		await mkdir(values.out, { recursive: true });
		for (const file of files) {
			const target = join(values.out, file.name);
			await writeFile(`${target}.part`, file.content, 'utf8');
			await rename(`${target}.part`, target);
		}
	} catch (error) {
		const reason = error instanceof Error && 'code' in error ? String(error.code) : String(error);
		throw new CliError(`cannot write to ${values.out}: ${reason}`);
	}
	const findings = [...planFindings, ...checkGlass(design).findings];
	const lines = [
		`${design.name}: wrote ${files.map((f) => f.name).join(', ')} to ${values.out}`,
		'',
		'Glass'
	];
	for (const f of findings) lines.push(...findingLines(f).map((l) => `  ${l}`));
	io.out(lines.join('\n') + '\n');
	return overallSeverity(findings) === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
