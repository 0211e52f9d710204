/**
 * The two ITO patterns a glass maker builds, as nets of conductors: the segment plate (front
 * glass: electrodes, their leads, the pads, the landing of each common's transfer point and its
 * lead to the pad) and the common plate (back glass: one back plate per common made of its grown
 * pieces and the leads joining them, and the transfer point). Plates are derived from the drawing
 * every time (so they follow every edit); leads are the design's stored traces, less any too far
 * off the glass to draw (`trace-faults.ts`, which reports them).
 *
 * Every conductor is a list of flat rings in millimetres; an electrode's rings are filled even-odd
 * (outline and holes), every other conductor's rings are filled non-zero (overlapping leads).
 */
import type { Plate, Transfer } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { flattenContour } from '../geometry/flatten';
import { platePieces, PLATE_FLATTEN_um, type MarginConflict } from './back-plate-pieces';
import { glassLayout, type GlassLayout } from './layout';
import { rectRing } from './rings';
import { traceDrawable } from './trace-faults';
import { traceRings } from './trace-rings';
import { dotRing, transferPoints } from './transfer-points';

export type ConductorKind = 'electrode' | 'plate' | 'trace' | 'pad' | 'transfer';

export interface Conductor {
	id: string;
	name: string;
	kind: ConductorKind;
	rings: Float64Array[];
	evenOdd: boolean;
	/** Electrode ids this conductor stands for (an electrode, or a back-plate piece). */
	electrodes: string[];
}

export interface Net {
	/** Segment line or common id. */
	id: string;
	name: string;
	kind: 'common' | 'segment';
	conductors: Conductor[];
}

export interface GlassArtwork {
	layout: GlassLayout;
	transfers: Transfer[];
	segment: Net[];
	common: Net[];
	conflicts: MarginConflict[];
}

export function buildArtwork(design: Design): GlassArtwork {
	const layout = glassLayout(design);
	const transfers = transferPoints(design, layout);
	const { pieces, conflicts } = platePieces(design);
	const tracesOf = (plate: Plate, net: string): Conductor[] =>
		design.glassArt.traces
			.filter((t) => t.plate === plate && t.net === net && traceDrawable(t, layout.glass))
			.map((t) => ({
				id: t.id,
				name: t.id,
				kind: 'trace',
				rings: traceRings(t),
				evenOdd: false,
				electrodes: []
			}));
	const dotOf = (common: string, prefix: string): Conductor[] =>
		transfers
			.filter((t) => t.common === common)
			.map((t) => ({
				id: `${prefix}-${common}`,
				name: `transfer ${common}`,
				kind: 'transfer',
				rings: [dotRing(t)],
				evenOdd: false,
				electrodes: []
			}));
	const segment: Net[] = layout.pads.map((pad) => {
		const electrodes: Conductor[] =
			pad.kind === 'segment'
				? design.electrodes
						.filter((e) => e.line === pad.net)
						.map((e) => ({
							id: e.id,
							name: e.name || e.id,
							kind: 'electrode',
							rings: [e.outline, ...e.holes].map((c) =>
								flattenContour(c, { tolerance_um: PLATE_FLATTEN_um })
							),
							evenOdd: true,
							electrodes: [e.id]
						}))
				: dotOf(pad.net, 'landing');
		const padConductor: Conductor = {
			id: `pad-${pad.pin}`,
			name: `pin ${pad.pin} ${pad.name}`,
			kind: 'pad',
			rings: [rectRing(pad.rect)],
			evenOdd: false,
			electrodes: []
		};
		return {
			id: pad.net,
			name: pad.name,
			kind: pad.kind,
			conductors: [...electrodes, ...tracesOf('segment', pad.net), padConductor]
		};
	});
	const common: Net[] = design.commons.map((c) => ({
		id: c.id,
		name: c.name || c.id,
		kind: 'common',
		conductors: [
			...pieces
				.filter((p) => p.common === c.id)
				.map((p): Conductor => ({
					id: `plate-${p.electrode.id}`,
					name: `back of ${p.electrode.name || p.electrode.id}`,
					kind: 'plate',
					rings: p.grown,
					evenOdd: true,
					electrodes: [p.electrode.id]
				})),
			...tracesOf('common', c.id),
			...dotOf(c.id, 'transfer')
		]
	}));
	return { layout, transfers, segment, common, conflicts };
}
