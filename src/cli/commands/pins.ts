/** `sunglyph pins <file> [--csv | --header | --segments]`: the pin map and the firmware map. */
import { parseArgs } from 'node:util';
import { pinLayout } from '../../lib/core/wiring/pin-layout';
import { pinCsv } from '../../lib/core/wiring/pin-csv';
import { segmentHeader } from '../../lib/core/wiring/segment-header';
import { segmentMapCsv } from '../../lib/core/wiring/segment-map-csv';
import { crossingMatrix } from '../../lib/core/wiring/crossing-matrix';
import { CliError, EXIT } from '../cli-error';
import type { CliIo } from '../io';
import { readDesign } from '../read-design';
import { formatTable } from '../table';

export const PINS_HELP = `Usage: sunglyph pins <design.json> [--csv | --header | --segments]

Lists the glass's pins along the contact edge chosen in the design (pinout: edge, order,
pitch) with the electrode each segment line drives at each common.

  --csv        the pin map as CSV (pin, function COMk/SEGk, name, position, electrode at each common)
  --header     a C header for firmware: every electrode's (common, line) bit and a
               character-to-segments table for 7-segment groups
  --segments   the firmware segment map as CSV (group, segment, common and line bit)
  -h, --help   show this help`;

export async function runPins(args: string[], io: CliIo): Promise<number> {
	const { values, positionals } = parseArgs({
		args,
		strict: true,
		allowPositionals: true,
		options: {
			csv: { type: 'boolean' },
			header: { type: 'boolean' },
			segments: { type: 'boolean' },
			help: { type: 'boolean', short: 'h' }
		}
	});
	if (values.help) {
		io.out(PINS_HELP + '\n');
		return EXIT.ok;
	}
	if (positionals.length !== 1)
		throw new CliError('expected exactly one design file (see sunglyph pins --help)');
	const formats = (['csv', 'header', 'segments'] as const).filter((f) => values[f]);
	if (formats.length > 1) throw new CliError('choose one of --csv, --header and --segments');
	const design = await readDesign(io, positionals[0]);
	if (values.csv) io.out(pinCsv(design));
	else if (values.header) io.out(segmentHeader(design));
	else if (values.segments) io.out(segmentMapCsv(design));
	else io.out(pinText(design));
	return EXIT.ok;
}

function pinText(design: Parameters<typeof pinLayout>[0]): string {
	const layout = pinLayout(design);
	const matrix = crossingMatrix(design);
	const name = new Map(design.electrodes.map((e) => [e.id, e.name || e.id]));
	const column = new Map(design.segmentLines.map((l, i) => [l.id, i]));
	const rows = [
		['pin', 'function', 'name', 'at mm', ...design.commons.map((_, i) => `COM${i + 1}`)]
	];
	for (const pin of layout.pins) {
		const at =
			pin.role === 'line'
				? matrix.cells.map(
						(r) => r[column.get(pin.ref.id)!].electrodes.map((id) => name.get(id)).join('+') || '·'
					)
				: design.commons.map(() => '');
		rows.push([String(pin.number), pin.label, pin.ref.name, pin.along_mm.toFixed(2), ...at]);
	}
	const { edge, order, pitch_mm } = design.pinout;
	const fit = layout.fits
		? `fits the ${layout.edgeLength_mm} mm edge`
		: `DOES NOT FIT the ${layout.edgeLength_mm} mm edge`;
	return (
		`${design.name}: ${layout.pins.length} pins on the ${edge} edge, ${order}, ${pitch_mm} mm pitch ` +
		`(${layout.rowLength_mm.toFixed(2)} mm, ${fit})\n\n${formatTable(rows)}\n`
	);
}
