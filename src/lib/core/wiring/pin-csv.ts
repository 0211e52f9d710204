/**
 * The pin map as CSV: one row per pin — number, function (COMk/SEGk), the record's name, its
 * position along the edge in mm, and for a segment line the electrode at each common (several
 * names joined by " + " mark a doubled crossing).
 */
import type { Design } from '../design/schema';
import { crossingMatrix } from './crossing-matrix';
import { csvText } from './csv';
import { pinLayout } from './pin-layout';

export function pinCsv(design: Design): string {
	const matrix = crossingMatrix(design);
	const nameOf = new Map(design.electrodes.map((e) => [e.id, e.name || e.id]));
	const column = new Map(design.segmentLines.map((l, i) => [l.id, i]));
	const header = [
		'pin',
		'function',
		'name',
		'position_mm',
		...design.commons.map((_, i) => `at COM${i + 1}`)
	];
	const rows = pinLayout(design).pins.map((pin) => {
		const at =
			pin.role === 'line'
				? matrix.cells.map((row) =>
						row[column.get(pin.ref.id)!].electrodes.map((id) => nameOf.get(id)).join(' + ')
					)
				: design.commons.map(() => '');
		return [pin.number, pin.label, pin.ref.name, pin.along_mm.toFixed(3), ...at];
	});
	return csvText([header, ...rows]);
}
