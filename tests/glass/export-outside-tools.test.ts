/**
 * The exported artwork read back by independent tools: resvg renders the SVGs, dxf-parser reads the
 * DXF, @tracespace/parser reads the Gerber files. What they see must match the computed glass.
 */
import { Resvg } from '@resvg/resvg-js';
import { createParser } from '@tracespace/parser';
import DxfParser from 'dxf-parser';
import { beforeAll, describe, expect, it } from 'vitest';
import { glassExportFiles, type ExportFile } from '../../src/lib/core/export/glass-export';
import { DXF_LAYERS } from '../../src/lib/core/export/glass-dxf';
import { buildArtwork, type GlassArtwork, type Net } from '../../src/lib/core/glass/artwork';
import { ringBounds } from '../../src/lib/core/glass/rings';
import { plateArea_mm2 } from '../../src/lib/core/glass/plate-area';
import type { Design } from '../../src/lib/core/design/schema';
import { expectWithin } from '../helpers/tolerance';
import { routedDemo } from './fixture';

const PX_PER_MM = 40;
let design: Design;
let art: GlassArtwork;
let files: ExportFile[];
const file = (suffix: string) => files.find((f) => f.name.endsWith(suffix))!.content;

// Routing the demo and writing every file takes seconds on a busy machine: the same allowance as a test.
beforeAll(() => {
	design = routedDemo();
	art = buildArtwork(design);
	files = glassExportFiles(design);
}, 60_000);

/** The SVG without its outline strokes, so only conductors are drawn. */
const conductorsOnly = (svg: string) => svg.replace(/<g id="outlines"[\s\S]*?<\/g>\n/, '');

function render(svg: string) {
	const img = new Resvg(svg, { fitTo: { mode: 'zoom', value: 1 }, dpi: 25.4 * PX_PER_MM }).render();
	return { width: img.width, height: img.height, pixels: img.pixels };
}

const ringCount = (nets: readonly Net[]) =>
	nets.reduce((n, net) => n + net.conductors.reduce((m, c) => m + c.rings.length, 0), 0);

describe('exported SVG rendered by resvg (@resvg/resvg-js, an independent SVG renderer)', () => {
	it('is as large as the glass, in millimetres', () => {
		const { width, height } = render(file('-segment.svg'));
		expect(width).toBe(Math.round(design.glass.width_mm * PX_PER_MM));
		expect(height).toBe(Math.round(design.glass.height_mm * PX_PER_MM));
	});

	it("fills each plate's computed area to within 0.5 %", () => {
		const cases = (['segment', 'common'] as const).map((plate) => {
			const { pixels } = render(conductorsOnly(file(`-${plate}.svg`)));
			let coverage = 0;
			for (let i = 3; i < pixels.length; i += 4) coverage += pixels[i] / 255;
			const rendered_mm2 = coverage / PX_PER_MM ** 2;
			const computed_mm2 = plateArea_mm2(plate === 'segment' ? art.segment : art.common);
			return {
				label: `${plate} plate`,
				expected: 100,
				actual: (100 * rendered_mm2) / computed_mm2
			};
		});
		expectWithin(cases, { tolerance: 0.5, unit: '% of the computed area', source: 'resvg render' });
	});

	it("shows no pixel of one net touching another net's pixel", () => {
		for (const plate of ['segment', 'common'] as const) {
			const svg = conductorsOnly(file(`-${plate}.svg`)).replace(
				'<svg ',
				'<svg shape-rendering="crispEdges" '
			);
			const colours = [...svg.matchAll(/data-net="[^"]*" fill="#([0-9a-f]{6})"/g)].map((m) =>
				parseInt(m[1], 16)
			);
			expect(new Set(colours).size).toBe(colours.length);
			const netOf = new Map(colours.map((c, i) => [c, i]));
			const { width, height, pixels } = render(svg);
			const at = (x: number, y: number) => {
				const k = 4 * (y * width + x);
				if (pixels[k + 3] === 0) return -1;
				return netOf.get((pixels[k] << 16) | (pixels[k + 1] << 8) | pixels[k + 2]) ?? -2;
			};
			let touching = 0;
			for (let y = 0; y + 1 < height; y++)
				for (let x = 0; x + 1 < width; x++) {
					const here = at(x, y);
					if (here < 0) continue;
					for (const other of [at(x + 1, y), at(x, y + 1)])
						if (other >= 0 && other !== here) touching++;
				}
			expect(touching, `${plate} plate: touching pixel pairs`).toBe(0);
		}
	});
});

describe('exported DXF read by dxf-parser (an independent DXF reader)', () => {
	it('has the layers, one closed polyline per ring and the glass as its extents', () => {
		const dxf = new DxfParser().parseSync(file('.dxf'))!;
		expect(Object.keys(dxf.tables.layer.layers).sort()).toEqual(
			DXF_LAYERS.map((l) => l.name).sort()
		);
		const byLayer = new Map<string, number>();
		for (const e of dxf.entities) byLayer.set(e.layer, (byLayer.get(e.layer) ?? 0) + 1);
		expect(Object.fromEntries(byLayer)).toEqual({
			GLASS_OUTLINE: 1,
			VIEWING_AREA: 1,
			SEAL: art.layout.sealParts.length,
			LEDGE: 1,
			SEGMENT_PLATE: ringCount(art.segment),
			COMMON_PLATE: ringCount(art.common)
		});
		const polylines = dxf.entities as unknown as {
			layer: string;
			shape: boolean;
			vertices: { x: number; y: number }[];
		}[];
		expect(polylines.every((p) => p.shape)).toBe(true);
		const xs = polylines.flatMap((p) => p.vertices.map((v) => v.x));
		const ys = polylines.flatMap((p) => p.vertices.map((v) => v.y));
		expect([Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)]).toEqual([
			0,
			0,
			design.glass.width_mm,
			design.glass.height_mm
		]);
		// The segment plate's extents, y flipped back to glass coordinates.
		const seg = polylines.filter((p) => p.layer === 'SEGMENT_PLATE').flatMap((p) => p.vertices);
		const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
		for (const net of art.segment)
			for (const c of net.conductors) for (const r of c.rings) ringBounds(r, b);
		const H = design.glass.height_mm;
		expectWithin(
			[
				{ label: 'min x', expected: b.minX, actual: Math.min(...seg.map((v) => v.x)) },
				{ label: 'max x', expected: b.maxX, actual: Math.max(...seg.map((v) => v.x)) },
				{ label: 'min y', expected: b.minY, actual: H - Math.max(...seg.map((v) => v.y)) },
				{ label: 'max y', expected: b.maxY, actual: H - Math.min(...seg.map((v) => v.y)) }
			],
			{ tolerance: 1e-4, unit: 'mm', source: 'dxf-parser read-back' }
		);
	});
});

describe('exported Gerber read by @tracespace/parser (an independent Gerber parser)', () => {
	it('has one region per conductor ring, in millimetres, within the plate extents', () => {
		for (const plate of ['segment', 'common'] as const) {
			const parser = createParser();
			parser.feed(file(`-${plate}.gbr`));
			const tree = parser.results();
			const nodes = tree.children as unknown as { type: string; [k: string]: unknown }[];
			expect(nodes.find((n) => n.type === 'units')?.units).toBe('mm');
			const nets = plate === 'segment' ? art.segment : art.common;
			const regions = nodes.filter((n) => n.type === 'regionMode' && n.region === true).length;
			expect(regions, `${plate} regions`).toBe(ringCount(nets));
			const coords = nodes
				.filter((n) => n.type === 'graphic')
				.map((n) => n.coordinates as { x: string; y: string })
				.map((c) => ({ x: Number(c.x) / 1e6, y: design.glass.height_mm - Number(c.y) / 1e6 }));
			const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
			for (const net of nets)
				for (const c of net.conductors) for (const r of c.rings) ringBounds(r, b);
			expectWithin(
				[
					{
						label: `${plate} min x`,
						expected: b.minX,
						actual: Math.min(...coords.map((c) => c.x))
					},
					{
						label: `${plate} max x`,
						expected: b.maxX,
						actual: Math.max(...coords.map((c) => c.x))
					},
					{
						label: `${plate} min y`,
						expected: b.minY,
						actual: Math.min(...coords.map((c) => c.y))
					},
					{ label: `${plate} max y`, expected: b.maxY, actual: Math.max(...coords.map((c) => c.y)) }
				],
				{ tolerance: 1e-6, unit: 'mm', source: '@tracespace/parser read-back' }
			);
		}
	});
});

describe('export is deterministic', () => {
	it('gives byte-identical files from run to run', () => {
		const again = glassExportFiles(routedDemo());
		expect(again.map((f) => [f.name, f.content])).toEqual(files.map((f) => [f.name, f.content]));
	});
});
