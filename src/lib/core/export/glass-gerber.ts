/**
 * One plate as Gerber RS-274X (the published open Gerber format specification): millimetres
 * (%MOMM*%), coordinates 4.6 with leading zeros omitted (%FSLAX46Y46*%), dark polarity, one G36/G37
 * region per conductor ring; an electrode's holes are cleared (%LPC*%) right after its outline and
 * dark polarity restored. Gerber's y axis points up: y is written as glass height − y.
 */
import type { Plate } from '../design/glass-art-schema';
import type { GlassArtwork } from '../glass/artwork';
import type { PathSink } from '../geometry/path-sink';
import { drawRing } from './ring-sink';

const coordinate = (v_mm: number) => String(Math.round(v_mm * 1e6));

class GerberRegionSink implements PathSink {
	constructor(
		private readonly out: string[],
		private readonly height_mm: number
	) {}
	private xy(x: number, y: number): string {
		return `X${coordinate(x)}Y${coordinate(this.height_mm - y)}`;
	}
	private first = '';
	moveTo(x: number, y: number): void {
		this.first = this.xy(x, y);
		this.out.push('G36*', `${this.first}D02*`);
	}
	lineTo(x: number, y: number): void {
		this.out.push(`${this.xy(x, y)}D01*`);
	}
	bezierCurveTo(): void {
		throw new Error('Gerber writer expects flattened rings');
	}
	closePath(): void {
		this.out.push(`${this.first}D01*`, 'G37*');
	}
}

export function plateGerber(options: { art: GlassArtwork; plate: Plate; name: string }): string {
	const { art, plate } = options;
	const H = art.layout.glass.height_mm;
	const safe = options.name.replace(/[^A-Za-z0-9 ._-]/g, '_');
	const out = [
		`G04 sunglyph ${plate} plate of ${safe}, ITO pattern seen from the viewer*`,
		'%FSLAX46Y46*%',
		'%MOMM*%',
		`%TF.FileFunction,Other,${plate} plate ITO*%`,
		'%LPD*%',
		'G01*'
	];
	const sink = new GerberRegionSink(out, H);
	for (const net of plate === 'segment' ? art.segment : art.common) {
		out.push(`G04 net ${net.id.replace(/[^A-Za-z0-9._-]/g, '_')}*`);
		for (const c of net.conductors) {
			if (c.evenOdd) {
				drawRing(c.rings[0], sink);
				if (c.rings.length > 1) {
					out.push('%LPC*%');
					for (const hole of c.rings.slice(1)) drawRing(hole, sink);
					out.push('%LPD*%');
				}
			} else for (const r of c.rings) drawRing(r, sink);
		}
	}
	out.push('M02*');
	return out.join('\n') + '\n';
}
