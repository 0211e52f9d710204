/**
 * Every artwork file of the glass, as names and text: SVG per plate and a composite (with the
 * ghosts), one DXF, Gerber per plate and the pin-map CSV. Pure and deterministic: the app's
 * downloads and the CLI's files are these exact strings.
 */
import type { Design } from '../design/schema';
import { checkGlass } from '../glass/check-glass';
import { glassDxf } from './glass-dxf';
import { plateGerber } from './glass-gerber';
import { compositeSvg, plateSvg } from './glass-svg';
import { pinMapCsv } from './pin-csv';

export const EXPORT_FORMATS = ['svg', 'dxf', 'gerber', 'csv'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export interface ExportFile {
	name: string;
	mime: string;
	content: string;
}

/** A file-name stem from the design name: letters, digits and dashes. */
export function fileStem(name: string): string {
	const stem = name
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 60);
	return stem || 'glass';
}

export function glassExportFiles(
	design: Design,
	formats: readonly ExportFormat[] = EXPORT_FORMATS
): ExportFile[] {
	const report = checkGlass(design);
	const art = report.artwork;
	const stem = fileStem(design.name);
	const viewing = design.glass.viewingArea;
	const files: ExportFile[] = [];
	if (formats.includes('svg')) {
		for (const plate of ['segment', 'common'] as const)
			files.push({
				name: `${stem}-${plate}.svg`,
				mime: 'image/svg+xml',
				content: plateSvg({ art, plate, name: design.name, viewing })
			});
		files.push({
			name: `${stem}-composite.svg`,
			mime: 'image/svg+xml',
			content: compositeSvg({ art, name: design.name, viewing, ghosts: report.ghosts })
		});
	}
	if (formats.includes('dxf'))
		files.push({
			name: `${stem}.dxf`,
			mime: 'application/dxf',
			content: glassDxf({ art, viewing })
		});
	if (formats.includes('gerber'))
		for (const plate of ['segment', 'common'] as const)
			files.push({
				name: `${stem}-${plate}.gbr`,
				mime: 'application/vnd.gerber',
				content: plateGerber({ art, plate, name: design.name })
			});
	if (formats.includes('csv'))
		files.push({
			name: `${stem}-pins.csv`,
			mime: 'text/csv',
			content: pinMapCsv(design, art.layout.pads)
		});
	return files;
}
