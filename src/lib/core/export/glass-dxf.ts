/**
 * The glass drawing as ASCII DXF (AutoCAD R12 group-code layout, the openly documented DXF
 * reference), units millimetres ($INSUNITS 4). One layer per plate and per outline kind; every
 * conductor ring and outline is a closed POLYLINE (flag 70 = 1). Curves are flattened to 5 µm
 * before they get here (stated in the layer table's description-free R12 form, so in this header).
 * DXF's y axis points up: y is written as glass height − y, so the drawing reads as seen from
 * the viewer.
 */
import type { Rect } from '../design/schema';
import type { GlassArtwork, Net } from '../glass/artwork';
import type { PathSink } from '../geometry/path-sink';
import { rectRing } from '../glass/rings';
import { drawRing, formatNumber as f } from './ring-sink';

export const DXF_LAYERS = [
	{ name: 'GLASS_OUTLINE', colour: 7 },
	{ name: 'VIEWING_AREA', colour: 3 },
	{ name: 'SEAL', colour: 8 },
	{ name: 'LEDGE', colour: 9 },
	{ name: 'SEGMENT_PLATE', colour: 1 },
	{ name: 'COMMON_PLATE', colour: 5 }
] as const;

class DxfPolylineSink implements PathSink {
	private readonly out: string[];
	private points: [number, number][] = [];
	constructor(
		out: string[],
		private readonly layer: string,
		private readonly height_mm: number
	) {
		this.out = out;
	}
	moveTo(x: number, y: number): void {
		this.points = [[x, y]];
	}
	lineTo(x: number, y: number): void {
		this.points.push([x, y]);
	}
	bezierCurveTo(): void {
		throw new Error('DXF writer expects flattened rings');
	}
	closePath(): void {
		const o = this.out;
		o.push('0', 'POLYLINE', '8', this.layer, '66', '1', '10', '0', '20', '0', '30', '0', '70', '1');
		for (const [x, y] of this.points)
			o.push('0', 'VERTEX', '8', this.layer, '10', f(x), '20', f(this.height_mm - y), '30', '0');
		o.push('0', 'SEQEND', '8', this.layer);
		this.points = [];
	}
}

function netsTo(nets: readonly Net[], sink: PathSink): void {
	for (const net of nets)
		for (const c of net.conductors) for (const r of c.rings) drawRing(r, sink);
}

export function glassDxf(options: { art: GlassArtwork; viewing: Rect }): string {
	const { art } = options;
	const H = art.layout.glass.height_mm;
	const W = art.layout.glass.width_mm;
	const out: string[] = [
		'999',
		'sunglyph glass drawing, millimetres, curves flattened to 5 um',
		'0',
		'SECTION',
		'2',
		'HEADER',
		'9',
		'$ACADVER',
		'1',
		'AC1009',
		'9',
		'$INSUNITS',
		'70',
		'4',
		'9',
		'$EXTMIN',
		'10',
		'0',
		'20',
		'0',
		'30',
		'0',
		'9',
		'$EXTMAX',
		'10',
		f(W),
		'20',
		f(H),
		'30',
		'0',
		'0',
		'ENDSEC',
		'0',
		'SECTION',
		'2',
		'TABLES',
		'0',
		'TABLE',
		'2',
		'LAYER',
		'70',
		String(DXF_LAYERS.length)
	];
	for (const l of DXF_LAYERS)
		out.push('0', 'LAYER', '2', l.name, '70', '0', '62', String(l.colour), '6', 'CONTINUOUS');
	out.push('0', 'ENDTAB', '0', 'ENDSEC', '0', 'SECTION', '2', 'ENTITIES');
	const sink = (layer: string) => new DxfPolylineSink(out, layer, H);
	drawRing(rectRing(art.layout.glass), sink('GLASS_OUTLINE'));
	drawRing(rectRing(options.viewing), sink('VIEWING_AREA'));
	for (const r of art.layout.sealParts) drawRing(rectRing(r), sink('SEAL'));
	drawRing(rectRing(art.layout.ledge), sink('LEDGE'));
	netsTo(art.segment, sink('SEGMENT_PLATE'));
	netsTo(art.common, sink('COMMON_PLATE'));
	out.push('0', 'ENDSEC', '0', 'EOF');
	return out.join('\n') + '\n';
}
