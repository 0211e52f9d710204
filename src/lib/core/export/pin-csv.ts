/**
 * The pin map as CSV (RFC 4180 quoting): one row per pad along the ledge, in pin order, with its
 * centre in glass millimetres, whether it is a common or a segment line, and the electrodes it
 * drives as "electrode@partner" pairs (the common for a segment line, the line for a common).
 */
import type { Design } from '../design/schema';
import type { Pad } from '../glass/layout';
import { formatNumber as f } from './ring-sink';

const cell = (v: string) => (/[",\n\r]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);

export function pinMapCsv(design: Design, pads: readonly Pad[]): string {
	const names = new Map(
		[...design.commons, ...design.segmentLines].map((r) => [r.id, r.name || r.id])
	);
	const rows = [['pin', 'kind', 'id', 'name', 'x_mm', 'y_mm', 'electrodes']];
	for (const pad of pads) {
		const driven = design.electrodes
			.filter((e) => (pad.kind === 'common' ? e.common === pad.net : e.line === pad.net))
			.map((e) => {
				const partner = pad.kind === 'common' ? e.line : e.common;
				return `${e.name || e.id}@${partner ? (names.get(partner) ?? partner) : '-'}`;
			});
		rows.push([
			String(pad.pin),
			pad.kind,
			pad.net,
			pad.name,
			f(pad.rect.x_mm + pad.rect.width_mm / 2),
			f(pad.rect.y_mm + pad.rect.height_mm / 2),
			driven.join(';')
		]);
	}
	return rows.map((r) => r.map(cell).join(',')).join('\r\n') + '\r\n';
}
