/**
 * The design as an SVG drawing in millimetres: glass outline, viewing area, and electrodes filled
 * with a colour chosen per electrode. A string out, no file system and no DOM.
 */
import type { Design, Electrode } from '../design/schema';
import { shapeToPathData } from '../geometry/path-data';

const escapeXml = (text: string) =>
	text.replace(
		/[<>&"']/g,
		(c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!
	);

export function designToSvg(
	design: Design,
	options: { fillOf?: (electrode: Electrode) => string; background?: string } = {}
): string {
	const fillOf = options.fillOf ?? (() => '#222');
	const { width_mm, height_mm, viewingArea: va } = design.glass;
	const paths = design.electrodes.map(
		(e) =>
			`<path id="${escapeXml(e.id)}" d="${shapeToPathData(e)}" fill="${fillOf(e)}" fill-rule="evenodd"><title>${escapeXml(e.name)}</title></path>`
	);
	return [
		`<svg xmlns="http://www.w3.org/2000/svg" width="${width_mm}mm" height="${height_mm}mm" viewBox="0 0 ${width_mm} ${height_mm}">`,
		`<title>${escapeXml(design.name)}</title>`,
		`<rect x="0" y="0" width="${width_mm}" height="${height_mm}" fill="${options.background ?? '#fff'}" stroke="#888" stroke-width="0.1"/>`,
		`<rect x="${va.x_mm}" y="${va.y_mm}" width="${va.width_mm}" height="${va.height_mm}" fill="none" stroke="#aaa" stroke-width="0.08" stroke-dasharray="0.6 0.4"/>`,
		...paths,
		'</svg>',
		''
	].join('\n');
}
