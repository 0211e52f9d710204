/**
 * Electrodes as paper items, re-synced from the design by record identity: an unchanged electrode
 * record keeps its item untouched, a replaced one gets new segments, so a drag that moves a few
 * electrodes among hundreds touches only those. Looks (fill, outline) are compared by a short key.
 */
import type paper from 'paper/dist/paper-core';
import type { Contour, Electrode } from '$lib/core/design/schema';
import { diffRecords } from '../record-diff';
import type { PaperScene } from './paper-scene';

export interface ElectrodeLook {
	fill: string;
	opacity: number;
	stroke: string | null;
	strokeWidth_px: number;
	dash: readonly number[] | null;
}

type ShapeItem = paper.Path | paper.CompoundPath;

interface Entry {
	record: Electrode;
	item: ShapeItem;
	lookKey: string;
}

const lookKey = (l: ElectrodeLook) =>
	`${l.fill}|${l.opacity}|${l.stroke}|${l.strokeWidth_px}|${l.dash?.join(',') ?? ''}`;

export class ElectrodeItems {
	#entries = new Map<string, Entry>();
	#records = new Map<string, Electrode>();
	#scene: PaperScene;

	constructor(scene: PaperScene) {
		this.#scene = scene;
	}

	sync(electrodes: readonly Electrode[], lookOf: (e: Electrode) => ElectrodeLook): void {
		const scope = this.#scene.scope;
		const layer = this.#scene.layers.electrodes;
		this.#scene.activate();
		const diff = diffRecords(this.#records, electrodes);
		for (const id of diff.removed) {
			this.#entries.get(id)?.item.remove();
			this.#entries.delete(id);
		}
		for (const record of diff.changed) {
			const entry = this.#entries.get(record.id)!;
			const next = this.#reshape(scope, entry.item, record);
			if (next !== entry.item) {
				entry.item.replaceWith(next);
				entry.lookKey = '';
			}
			entry.item = next;
			entry.record = record;
		}
		for (const record of diff.added) {
			const item = buildShape(scope, record);
			item.data = { electrode: record.id };
			this.#entries.set(record.id, { record, item, lookKey: '' });
			layer.addChild(item);
		}
		if (diff.reordered || diff.added.length > 0) {
			layer.addChildren(electrodes.map((e) => this.#entries.get(e.id)!.item));
		}
		this.#records = new Map(electrodes.map((e) => [e.id, e]));
		for (const e of electrodes) {
			const entry = this.#entries.get(e.id)!;
			const look = lookOf(e);
			const key = lookKey(look);
			if (key === entry.lookKey) continue;
			entry.lookKey = key;
			applyLook(scope, entry.item, look);
		}
	}

	#reshape(scope: paper.PaperScope, item: ShapeItem, record: Electrode): ShapeItem {
		if (record.holes.length === 0 && item instanceof scope.Path) {
			item.removeSegments();
			item.addSegments(segmentsOf(scope, record.outline));
			return item;
		}
		const next = buildShape(scope, record);
		next.data = { electrode: record.id };
		return next;
	}

	clear(): void {
		for (const entry of this.#entries.values()) entry.item.remove();
		this.#entries.clear();
		this.#records.clear();
	}
}

function segmentsOf(scope: paper.PaperScope, contour: Contour): paper.Segment[] {
	return contour.map(
		(p) =>
			new scope.Segment(
				new scope.Point(p.x, p.y),
				p.in ? new scope.Point(p.in[0], p.in[1]) : undefined,
				p.out ? new scope.Point(p.out[0], p.out[1]) : undefined
			)
	);
}

function buildShape(scope: paper.PaperScope, e: Electrode): ShapeItem {
	const outline = new scope.Path({ segments: segmentsOf(scope, e.outline), closed: true });
	if (e.holes.length === 0) return outline;
	const holes = e.holes.map(
		(h) => new scope.Path({ segments: segmentsOf(scope, h), closed: true })
	);
	return new scope.CompoundPath({ children: [outline, ...holes], fillRule: 'evenodd' });
}

function applyLook(scope: paper.PaperScope, item: ShapeItem, look: ElectrodeLook): void {
	// Translucency goes into the fill colour: an item opacity below 1 would make paper.js draw
	// every electrode through an offscreen canvas.
	const fill = new scope.Color(look.fill);
	fill.alpha = look.opacity;
	item.fillColor = fill;
	item.strokeColor = look.stroke ? new scope.Color(look.stroke) : null;
	item.strokeWidth = look.strokeWidth_px;
	item.strokeScaling = false;
	item.dashArray = look.dash ? [...look.dash] : [];
	item.strokeJoin = 'round';
}
