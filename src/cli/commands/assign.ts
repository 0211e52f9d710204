/** `sunglyph assign <file> --commons N [--out file]`: wires a design automatically. */
import { parseArgs } from 'node:util';
import { applyPatch } from '../../lib/core/commands/patch';
import { autoAssign } from '../../lib/core/commands/auto-assign';
import { serializeDesign } from '../../lib/core/design/parse-design';
import { analyzeWiring } from '../../lib/core/drive/analyze-drive';
import { MAX_AUTO_COMMONS } from '../../lib/core/wiring/wiring-plan';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { parseInteger } from '../parse-numbers';
import { readDesign } from '../read-design';
import { writeFileAtomic } from '../write-atomic';
import { findingLines } from '../finding-text';

export const ASSIGN_HELP = `Usage: sunglyph assign <design.json> --commons N [--out FILE]

Assigns every unlocked electrode a common and a segment line for N commons (1–${MAX_AUTO_COMMONS}):
the fewest lines per character, commons in horizontal bands, locked electrodes kept.
Without --out the wired design is written to stdout; with it, FILE is replaced atomically
and a summary is printed.

Exit status: 0 wired without conflict, 1 the wiring still fails a check (e.g. locked
electrodes that clash), 2 unreadable or invalid input.

  --commons N   number of commons (back planes) to drive
  --out FILE    write the wired design to FILE (may be the input file)
  -h, --help    show this help`;

export async function runAssign(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			commons: { type: 'string' },
			out: { type: 'string' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(ASSIGN_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph assign --help)');
	if (values.commons === undefined) throw new CliError('--commons: expected a number of commons');
	const commons = parseInteger('commons', values.commons);
	if (commons < 1 || commons > MAX_AUTO_COMMONS)
		throw new CliError(`--commons: expected 1 to ${MAX_AUTO_COMMONS}, got ${commons}`);
	const design = await readDesign(io, positionals[0]);
	const wired = applyPatch(design, autoAssign(design, { commons }));
	const wiring = analyzeWiring(wired);
	if (values.out === undefined) {
		io.out(serializeDesign(wired));
	} else {
		await writeFileAtomic(values.out, serializeDesign(wired));
		io.out(`Wrote ${values.out}\n`);
		for (const f of wiring.findings) io.out(findingLines(f).join('\n') + '\n');
	}
	return wiring.severity === 'fail' ? EXIT.checkFailed : EXIT.ok;
}
