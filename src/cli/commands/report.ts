/** `sunglyph report <design.json> --out <file>`: the printable design report, HTML or PDF. */
import { parseArgs } from 'node:util';
import { readDesignFile } from '../read-design';
import { analyzeDesignWithCell } from '../../lib/core/analyze-design';
import { designReportHtml, type PaperSize } from '../../lib/core/export/report/design-report-html';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { writeFileAtomic } from '../write-file-atomic';
import { htmlToPdf } from '../print-pdf';

export const REPORT_HELP = `Usage: sunglyph report <design.json> --out <file> [--pdf] [--paper a4|letter]

Writes the design report: the drawing at true size with a scale bar, the pin map, the drive
table and window plot, the cell figures, the design rules, the electrical load (per line and
common, total current, battery life), the legibility table, the glass summary (outline, seal,
ledge, pads, back plates, ghosts), every finding of every check with its code, the model's
limits and the cautions. HTML is self-contained (inline styles and SVG); --pdf prints it through the
system's Chromium (headless, no GPU).

Exit status: 0 written (whatever the design's verdict), 2 unreadable or invalid input,
3 the PDF could not be printed.

  --out FILE      where to write (required); written whole or not at all
  --pdf           write a PDF instead of HTML
  --paper SIZE    a4 (default) or letter
  -h, --help      show this help`;

export async function runReport(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			out: { type: 'string' },
			pdf: { type: 'boolean' },
			paper: { type: 'string' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(REPORT_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph report --help)');
	if (!values.out) throw new CliError('--out: where should the report go? (see --help)');
	const paper = values.paper ?? 'a4';
	if (paper !== 'a4' && paper !== 'letter')
		throw new CliError(`--paper: expected a4 or letter, got "${paper}"`);
	const path = positionals[0];
	const parsed = await readDesignFile(path, io);
	if (!parsed.ok) return parsed.exitCode;
	const design = parsed.design;
	const html = designReportHtml({
		design,
		report: analyzeDesignWithCell(design),
		paper: paper as PaperSize
	});
	await writeFileAtomic(values.out, values.pdf ? await htmlToPdf(html) : html);
	io.err(`wrote ${values.out}\n`);
	return EXIT.ok;
}
