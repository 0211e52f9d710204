/**
 * Everything under the electrodes: the glass outline and viewing area, the grid, and the common
 * plates (each common's extent on the back plate, as a dashed frame in its colour). Grid lines sit
 * on pixel centres so they stay crisp at any zoom.
 */
import type { Design } from '$lib/core/design/schema';
import type { Bounds } from '$lib/core/geometry/bounds';
import { gridLines } from '../ruler-ticks';
import { visibleDocRect } from '../view-transform';
import type { PaperScene } from './paper-scene';

export function drawGlass(
	scene: PaperScene,
	options: { glass: Design['glass']; background: string | null }
): void {
	const { scope } = scene;
	const layer = scene.layers.glass;
	scene.activate();
	layer.removeChildren();
	const { glass } = options;
	const plate = new scope.Path.Rectangle({
		from: [0, 0],
		to: [glass.width_mm, glass.height_mm]
	});
	plate.fillColor = new scope.Color(options.background ?? '#fbfbf7');
	plate.strokeColor = new scope.Color('#8d9086');
	plate.strokeWidth = 1;
	plate.strokeScaling = false;
	layer.addChild(plate);
	const va = glass.viewingArea;
	const viewing = new scope.Path.Rectangle({
		from: [va.x_mm, va.y_mm],
		to: [va.x_mm + va.width_mm, va.y_mm + va.height_mm]
	});
	viewing.strokeColor = new scope.Color('#a5a89c');
	viewing.strokeWidth = 1;
	viewing.strokeScaling = false;
	viewing.dashArray = [6, 4];
	layer.addChild(viewing);
}

export function drawGrid(
	scene: PaperScene,
	options: { pitch_mm: number; width_px: number; height_px: number }
): void {
	const { scope, view } = scene;
	const layer = scene.layers.grid;
	scene.activate();
	layer.removeChildren();
	const rect = visibleDocRect(view, { width_px: options.width_px, height_px: options.height_px });
	const s = view.scale_px_per_mm;
	const crisp = (v_mm: number, offset_px: number) =>
		(Math.round(v_mm * s + offset_px) + 0.5 - offset_px) / s;
	const common = { pitch_mm: options.pitch_mm, scale_px_per_mm: s };
	const xs = gridLines({ ...common, from_mm: rect.minX, to_mm: rect.maxX });
	const ys = gridLines({ ...common, from_mm: rect.minY, to_mm: rect.maxY });
	for (const major of [false, true]) {
		const paths = [
			...xs.lines
				.filter((l) => l.major === major)
				.map((l) => {
					const x = crisp(l.at_mm, view.offsetX_px);
					return new scope.Path.Line({ from: [x, rect.minY], to: [x, rect.maxY] });
				}),
			...ys.lines
				.filter((l) => l.major === major)
				.map((l) => {
					const y = crisp(l.at_mm, view.offsetY_px);
					return new scope.Path.Line({ from: [rect.minX, y], to: [rect.maxX, y] });
				})
		];
		if (paths.length === 0) continue;
		const grid = new scope.CompoundPath({ children: paths });
		grid.strokeColor = new scope.Color(major ? '#0000002e' : '#00000017');
		grid.strokeWidth = 1;
		grid.strokeScaling = false;
		layer.addChild(grid);
	}
}

export function drawPlates(
	scene: PaperScene,
	options: {
		plates: readonly { name: string; colour: string; bounds: Bounds }[];
		margin_mm: number;
	}
): void {
	const { scope } = scene;
	const layer = scene.layers.plates;
	const px = 1 / scene.view.scale_px_per_mm;
	scene.activate();
	layer.removeChildren();
	options.plates.forEach((plate, index) => {
		const b = plate.bounds;
		if (!(b.maxX >= b.minX)) return;
		const m = options.margin_mm;
		const frame = new scope.Path.Rectangle({
			from: [b.minX - m, b.minY - m],
			to: [b.maxX + m, b.maxY + m],
			radius: m
		});
		frame.fillColor = new scope.Color(plate.colour);
		frame.fillColor.alpha = 0.07;
		frame.strokeColor = new scope.Color(plate.colour);
		frame.strokeWidth = 1.25;
		frame.strokeScaling = false;
		frame.dashArray = [7, 4];
		layer.addChild(frame);
		// Labels step sideways so commons with the same corner stay readable.
		const label = new scope.PointText({
			point: [b.minX - m + (3 + 48 * index) * px, b.minY - m - 4 * px],
			content: plate.name,
			fontSize: 10.5 * px,
			fontFamily: 'DejaVu Sans, sans-serif',
			fillColor: new scope.Color(plate.colour)
		});
		layer.addChild(label);
	});
}
