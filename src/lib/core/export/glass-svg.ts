/**
 * SVG artwork of the glass: one file per plate and a composite. Millimetres throughout (viewBox in
 * mm, width and height with the unit), conductors flattened to 5 µm, numbers at 0.1 µm.
 *
 * Structure: a group `outlines` (glass, viewing area, seal parts, ledge: strokes only), then per
 * plate a group `<plate>-plate` holding one group per net (`net-<id>`, its own fill colour) with one
 * path per electrode, back-plate piece, trace, pad and transfer point (id, data-name). The
 * composite adds the ghosts found by the glass check in a group `ghosts`.
 */
import type { Plate } from '../design/glass-art-schema';
import type { Rect } from '../design/schema';
import type { GlassArtwork, Net } from '../glass/artwork';
import type { Ghost } from '../glass/ghost-check';
import { escapeXml, formatNumber as f, ringsToPathData } from './ring-sink';

/** Distinct, stable net colours: hues stepped by the golden angle. */
export function netColour(index: number, plate: Plate): string {
	const hue = (index * 137.508 + (plate === 'common' ? 60 : 0)) % 360;
	const l = plate === 'common' ? 0.35 : 0.45;
	const a = 0.6 * Math.min(l, 1 - l);
	const channel = (n: number) => {
		const k = (n + hue / 30) % 12;
		const v = l - a * Math.max(-1, Math.min(k - 3, 9 - k, 1));
		return Math.round(v * 255)
			.toString(16)
			.padStart(2, '0');
	};
	return `#${channel(0)}${channel(8)}${channel(4)}`;
}

const rect = (id: string, r: Rect) =>
	`<rect id="${id}" x="${f(r.x_mm)}" y="${f(r.y_mm)}" width="${f(r.width_mm)}" height="${f(r.height_mm)}"/>`;

function outlines(art: GlassArtwork, viewing: Rect): string[] {
	const l = art.layout;
	return [
		'<g id="outlines" fill="none" stroke="#000" stroke-width="0.05">',
		rect('glass-outline', l.glass),
		rect('viewing-area', viewing),
		rect('ledge', l.ledge),
		...l.sealParts.map((r, i) => rect(`seal-${i + 1}`, r)),
		'</g>'
	];
}

function plateGroup(nets: readonly Net[], plate: Plate, opacity = 1): string[] {
	const lines = [
		`<g id="${plate}-plate" data-plate="${plate}"${opacity < 1 ? ` opacity="${opacity}"` : ''}>`
	];
	nets.forEach((net, i) => {
		lines.push(
			`<g id="${plate}-net-${escapeXml(net.id)}" data-net="${escapeXml(net.name)}" fill="${netColour(i, plate)}">`
		);
		for (const c of net.conductors) {
			const rule = c.evenOdd ? ' fill-rule="evenodd"' : '';
			lines.push(
				`<path id="${plate}-${escapeXml(c.id)}" data-name="${escapeXml(c.name)}" data-kind="${c.kind}"${rule} d="${ringsToPathData(c.rings)}"/>`
			);
		}
		lines.push('</g>');
	});
	lines.push('</g>');
	return lines;
}

function svgDocument(options: { title: string; glass: Rect; body: string[] }): string {
	const { width_mm: w, height_mm: h } = options.glass;
	return [
		'<?xml version="1.0" encoding="UTF-8"?>',
		`<svg xmlns="http://www.w3.org/2000/svg" width="${f(w)}mm" height="${f(h)}mm" viewBox="0 0 ${f(w)} ${f(h)}">`,
		`<title>${escapeXml(options.title)}</title>`,
		...options.body,
		'</svg>',
		''
	].join('\n');
}

export function plateSvg(options: {
	art: GlassArtwork;
	plate: Plate;
	name: string;
	viewing: Rect;
}): string {
	const { art, plate } = options;
	return svgDocument({
		title: `${options.name}: ${plate} plate`,
		glass: art.layout.glass,
		body: [
			...outlines(art, options.viewing),
			...plateGroup(plate === 'segment' ? art.segment : art.common, plate)
		]
	});
}

export function compositeSvg(options: {
	art: GlassArtwork;
	name: string;
	viewing: Rect;
	ghosts: readonly Ghost[];
}): string {
	const { art } = options;
	const ghosts = [
		'<g id="ghosts" fill="#ff0000" stroke="#ff0000" stroke-width="0.03">',
		...options.ghosts
			.filter((g) => g.where !== 'idle')
			.map(
				(g, i) =>
					`<path id="ghost-${i + 1}" data-pair="${escapeXml(`${g.commonName}/${g.lineName}`)}" data-where="${g.where}" d="${ringsToPathData([g.ring])}"/>`
			),
		'</g>'
	];
	return svgDocument({
		title: `${options.name}: both plates`,
		glass: art.layout.glass,
		body: [
			...outlines(art, options.viewing),
			...plateGroup(art.common, 'common', 0.5),
			...plateGroup(art.segment, 'segment', 0.6),
			...ghosts
		]
	});
}
