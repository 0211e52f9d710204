/**
 * The overlay layer: selection frame and its handles, node handles, marquee, the shape being
 * drawn, guides, the snap marker and a readout. Rebuilt whole on every change — it holds a few
 * dozen items at most. Sizes are in screen pixels, converted with the view scale.
 */
import type paper from 'paper/dist/paper-core';
import type { Bounds } from '$lib/core/geometry/bounds';
import type { Contour, Electrode } from '$lib/core/design/schema';
import type { XY } from '$lib/core/geometry/vec';
import type { Overlay } from '../overlay';
import { HANDLE_SIZE_px, SIZE_HANDLES, sizeHandlePoint, turnHandlePoint } from '../handles';
import { contoursOf, nodeKey } from '../node-refs';
import { traceNodeKey } from '../trace-nodes';
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { PaperScene } from './paper-scene';

export const OVERLAY_COLOURS = {
	frame: '#2f6f9f',
	handleFill: '#ffffff',
	snap: '#c2410c',
	draft: '#1f5f8f',
	marqueeFill: '#2f6f9f22'
};

export interface OverlayScene {
	overlay: Overlay;
	frame: Bounds | null;
	handles: 'size' | 'turn' | 'none';
	nodes: {
		electrodes: readonly Electrode[];
		selected: ReadonlySet<string>;
		withHandles: ReadonlySet<string>;
		/** Traces being edited (a point of theirs is selected): centre line and points shown. */
		traces?: readonly Trace[];
	} | null;
}

export function drawOverlay(scene: PaperScene, model: OverlayScene): void {
	const scope = scene.scope;
	const layer = scene.layers.overlay;
	const px = 1 / scene.view.scale_px_per_mm;
	scene.activate();
	layer.removeChildren();
	const add = (item: paper.Item) => layer.addChild(item);
	const P = (p: XY) => new scope.Point(p.x, p.y);
	const stroke = (item: paper.Item, colour: string, width = 1, dash?: number[]) => {
		item.strokeColor = new scope.Color(colour);
		item.strokeWidth = width;
		item.strokeScaling = false;
		if (dash) item.dashArray = dash;
		return item;
	};
	const square = (p: XY, size_px: number, fill: string, line: string) => {
		const r = new scope.Path.Rectangle({
			point: [p.x - (size_px / 2) * px, p.y - (size_px / 2) * px],
			size: [size_px * px, size_px * px]
		});
		r.fillColor = new scope.Color(fill);
		return add(stroke(r, line));
	};
	const circle = (p: XY, r_px: number, fill: string, line: string) => {
		const c = new scope.Path.Circle({ center: P(p), radius: r_px * px });
		c.fillColor = new scope.Color(fill);
		return add(stroke(c, line));
	};
	const line = (a: XY, b: XY, colour: string, dash?: number[]) =>
		add(stroke(new scope.Path.Line({ from: P(a), to: P(b) }), colour, 1, dash));

	const { frame, overlay } = model;
	if (frame && frame.maxX >= frame.minX) {
		const rect = new scope.Path.Rectangle({
			from: [frame.minX, frame.minY],
			to: [frame.maxX, frame.maxY]
		});
		add(stroke(rect, OVERLAY_COLOURS.frame, 1, [4, 3]));
		if (model.handles === 'size')
			for (const h of SIZE_HANDLES)
				square(
					sizeHandlePoint(frame, h),
					HANDLE_SIZE_px,
					OVERLAY_COLOURS.handleFill,
					OVERLAY_COLOURS.frame
				);
		if (model.handles === 'turn') {
			const knob = turnHandlePoint(frame, scene.view.scale_px_per_mm);
			line({ x: knob.x, y: frame.minY }, knob, OVERLAY_COLOURS.frame);
			circle(knob, HANDLE_SIZE_px / 2 + 1, OVERLAY_COLOURS.handleFill, OVERLAY_COLOURS.frame);
			const c = { x: (frame.minX + frame.maxX) / 2, y: (frame.minY + frame.maxY) / 2 };
			line({ x: c.x - 5 * px, y: c.y }, { x: c.x + 5 * px, y: c.y }, OVERLAY_COLOURS.frame);
			line({ x: c.x, y: c.y - 5 * px }, { x: c.x, y: c.y + 5 * px }, OVERLAY_COLOURS.frame);
		}
	}
	if (model.nodes) drawNodes(model.nodes, { square, circle, line, px });
	if (overlay.marquee) {
		const m = overlay.marquee;
		const rect = new scope.Path.Rectangle({ from: [m.minX, m.minY], to: [m.maxX, m.maxY] });
		rect.fillColor = new scope.Color(OVERLAY_COLOURS.marqueeFill);
		add(stroke(rect, OVERLAY_COLOURS.frame, 1, [3, 3]));
	}
	if (overlay.ghosts) drawGhosts(scene, overlay.ghosts, { add, stroke });
	if (overlay.draft) drawDraft(scene, overlay.draft, { square, add, stroke, line });
	if (overlay.guide) line(overlay.guide.from, overlay.guide.to, OVERLAY_COLOURS.snap, [5, 3]);
	if (overlay.snap) drawSnap(scene, overlay.snap, { add, stroke, px });
	if (overlay.readout) {
		const at = overlay.readout.at;
		const text = new scope.PointText({
			point: [at.x + 12 * px, at.y + 22 * px],
			content: overlay.readout.text,
			fontSize: 11 * px,
			fontFamily: 'DejaVu Sans Mono, monospace',
			fillColor: new scope.Color('#1d1f1a')
		});
		const box = new scope.Path.Rectangle({
			rectangle: text.bounds.expand(6 * px, 4 * px),
			radius: 2 * px
		});
		box.fillColor = new scope.Color('#ffffffee');
		add(stroke(box, '#b9bbb0'));
		add(text);
	}
}

type Draw = {
	square: (p: XY, size_px: number, fill: string, line: string) => paper.Item;
	circle: (p: XY, r_px: number, fill: string, line: string) => paper.Item;
	line: (a: XY, b: XY, colour: string, dash?: number[]) => paper.Item;
	px: number;
};

function drawNodes(nodes: NonNullable<OverlayScene['nodes']>, draw: Draw): void {
	for (const e of nodes.electrodes) {
		contoursOf(e).forEach((contour, ci) => {
			contour.forEach((p, pi) => {
				const key = nodeKey({ electrodeId: e.id, contour: ci, index: pi });
				if (nodes.withHandles.has(key)) {
					for (const h of [p.in, p.out]) {
						if (!h) continue;
						const q = { x: p.x + h[0], y: p.y + h[1] };
						draw.line(p, q, OVERLAY_COLOURS.frame);
						draw.circle(q, 3.5, OVERLAY_COLOURS.handleFill, OVERLAY_COLOURS.frame);
					}
				}
				const on = nodes.selected.has(key);
				draw.square(p, on ? 8 : 7, on ? OVERLAY_COLOURS.frame : '#ffffff', OVERLAY_COLOURS.frame);
			});
		});
	}
	for (const t of nodes.traces ?? []) {
		for (let i = 0; i + 1 < t.points.length; i++)
			draw.line(t.points[i], t.points[i + 1], OVERLAY_COLOURS.frame, [3, 2]);
		t.points.forEach((p, index) => {
			const on = nodes.selected.has(traceNodeKey({ traceId: t.id, index }));
			draw.circle(p, on ? 4.5 : 4, on ? OVERLAY_COLOURS.frame : '#ffffff', OVERLAY_COLOURS.frame);
		});
	}
}

function drawDraft(
	scene: PaperScene,
	draft: NonNullable<Overlay['draft']>,
	draw: {
		square: Draw['square'];
		line: Draw['line'];
		add: (i: paper.Item) => paper.Item;
		stroke: (i: paper.Item, c: string, w?: number, d?: number[]) => paper.Item;
	}
): void {
	const scope = scene.scope;
	if (draft.points.length > 0) {
		const path = new scope.Path({
			segments: draft.points.map(
				(p) =>
					new scope.Segment(
						new scope.Point(p.x, p.y),
						p.in ? new scope.Point(p.in[0], p.in[1]) : undefined,
						p.out ? new scope.Point(p.out[0], p.out[1]) : undefined
					)
			),
			closed: draft.closed
		});
		if (draft.closed) path.fillColor = new scope.Color('#2f6f9f33');
		draw.add(draw.stroke(path, OVERLAY_COLOURS.draft, 1.5));
		if (!draft.closed)
			for (const p of draft.points) draw.square(p, 6, '#ffffff', OVERLAY_COLOURS.draft);
	}
	const last = draft.points[draft.points.length - 1];
	if (draft.rubber && last) draw.line(last, draft.rubber, OVERLAY_COLOURS.draft, [4, 3]);
}

function drawGhosts(
	scene: PaperScene,
	ghosts: readonly Contour[],
	draw: {
		add: (i: paper.Item) => paper.Item;
		stroke: (i: paper.Item, c: string, w?: number, d?: number[]) => paper.Item;
	}
): void {
	const scope = scene.scope;
	const paths = ghosts.map(
		(contour) =>
			new scope.Path({
				segments: contour.map(
					(p) =>
						new scope.Segment(
							new scope.Point(p.x, p.y),
							p.in ? new scope.Point(p.in[0], p.in[1]) : undefined,
							p.out ? new scope.Point(p.out[0], p.out[1]) : undefined
						)
				),
				closed: true
			})
	);
	const ghost = new scope.CompoundPath({ children: paths, fillRule: 'evenodd' });
	ghost.fillColor = new scope.Color(OVERLAY_COLOURS.marqueeFill);
	draw.add(draw.stroke(ghost, OVERLAY_COLOURS.draft, 1, [3, 2]));
}

function drawSnap(
	scene: PaperScene,
	snap: NonNullable<Overlay['snap']>,
	draw: {
		add: (i: paper.Item) => paper.Item;
		stroke: (i: paper.Item, c: string, w?: number) => paper.Item;
		px: number;
	}
): void {
	const scope = scene.scope;
	const { point: p, kind } = snap;
	const r = 6 * draw.px;
	let marker: paper.Item;
	if (kind === 'vertex') {
		marker = new scope.Path.Rectangle({ from: [p.x - r, p.y - r], to: [p.x + r, p.y + r] });
	} else if (kind === 'edge') {
		marker = new scope.Path({
			segments: [
				[p.x, p.y - r],
				[p.x + r, p.y],
				[p.x, p.y + r],
				[p.x - r, p.y]
			],
			closed: true
		});
	} else if (kind === 'angle') {
		marker = new scope.Path.Circle({ center: [p.x, p.y], radius: r });
	} else {
		marker = new scope.CompoundPath({
			children: [
				new scope.Path.Line({ from: [p.x - r, p.y], to: [p.x + r, p.y] }),
				new scope.Path.Line({ from: [p.x, p.y - r], to: [p.x, p.y + r] })
			]
		});
	}
	draw.add(draw.stroke(marker, OVERLAY_COLOURS.snap, 1.5));
	const label = new scope.PointText({
		point: [p.x + 9 * draw.px, p.y - 8 * draw.px],
		content: kind === 'angle' ? '15° step' : kind,
		fontSize: 10 * draw.px,
		fontFamily: 'DejaVu Sans, sans-serif',
		fillColor: new scope.Color(OVERLAY_COLOURS.snap)
	});
	draw.add(label);
}
