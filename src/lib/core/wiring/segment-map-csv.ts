/** The firmware segment map as CSV: group, segment, electrode, and its COM/SEG bit (0-based). */
import type { Design } from '../design/schema';
import { csvText } from './csv';
import { segmentMap } from './segment-map';

export function segmentMapCsv(design: Design): string {
	const rows: (string | number)[][] = [
		['group', 'segment', 'electrode_id', 'electrode', 'common', 'line', 'com_index', 'seg_index']
	];
	for (const group of segmentMap(design)) {
		for (const bit of group.bits) {
			rows.push([
				group.name,
				bit.segment,
				bit.electrode,
				bit.name,
				bit.common === null ? '' : `COM${bit.common + 1}`,
				bit.line === null ? '' : `SEG${bit.line + 1}`,
				bit.common ?? '',
				bit.line ?? ''
			]);
		}
	}
	return csvText(rows);
}
