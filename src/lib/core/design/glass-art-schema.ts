/**
 * The glass-drawing section of the design document (added in version 6): what a glass maker needs
 * beyond the electrodes — seal line, fill gap, contact ledge, common transfer points, back-plate
 * overlap margin and the traces (leads) of both plates.
 *
 * The glass outline and viewing area stay in `design.glass`; the ledge's edge and pin pitch stay in
 * `design.pinout` (one source of truth each). Defaults are common practice from glass-maker design
 * guides: seal ≈ 1 mm; contact ledge ≥ 3 mm for an elastomeric connector with pitch ≥ 0.5 mm;
 * metal pins at 1.5, 1.8, 2.0 or 2.54 mm pitch; back plate larger than its segments by
 * 0.05–0.15 mm per side; leads ≥ ≈ 0.05 mm wide.
 *
 * Units: millimetres (`_mm`). Coordinates are glass coordinates (x right, y down, origin top-left).
 */
import { z } from 'zod';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const lengthIn = (min_mm: number, max_mm: number) =>
	finite().refine(
		(v) => v >= min_mm && v <= max_mm,
		`expected a length from ${min_mm} to ${max_mm} mm`
	);
const ref = () =>
	z
		.string()
		.min(1, 'expected a non-empty id')
		.max(64, 'expected an id of at most 64 characters')
		.regex(/^[A-Za-z0-9_.:-]+$/, 'expected an id of letters, digits and _ . : -');

export const connectorSchema = z.enum(['elastomeric', 'metal-pin']);
export const plateSchema = z.enum(['segment', 'common']);

export const sealSchema = z.strictObject({
	/** Width of the seal line. */
	width_mm: lengthIn(0.2, 10),
	/** Distance from the back glass's edge to the outside of the seal. */
	inset_mm: lengthIn(0, 20),
	/** Length of the opening left in the seal for filling, centred on the edge opposite the ledge. */
	fillGap_mm: lengthIn(0, 50)
});

export const ledgeSchema = z.strictObject({
	connector: connectorSchema,
	/** Depth of the contact ledge, measured from the glass edge inwards. */
	depth_mm: lengthIn(0.5, 30)
});

export const tracePointSchema = z.strictObject({ x: finite(), y: finite() });

export const traceSchema = z.strictObject({
	id: ref(),
	plate: plateSchema,
	/** The segment line (segment plate) or common (common plate) the trace belongs to. */
	net: ref(),
	width_mm: lengthIn(0.005, 5),
	points: z.array(tracePointSchema).min(2, 'expected at least 2 points').max(4096)
});

export const transferSchema = z.strictObject({
	common: ref(),
	x_mm: finite(),
	y_mm: finite(),
	diameter_mm: lengthIn(0.1, 5)
});

export const glassArtSchema = z.strictObject({
	seal: sealSchema,
	ledge: ledgeSchema,
	/** How far each back plate extends beyond its electrodes, per side. */
	overlapMargin_mm: lengthIn(0, 1),
	/** Width of automatically routed traces. */
	traceWidth_mm: lengthIn(0.005, 5),
	transfers: z.array(transferSchema).max(256),
	traces: z.array(traceSchema).max(4096)
});

export type Connector = z.infer<typeof connectorSchema>;
export type Plate = z.infer<typeof plateSchema>;
export type Seal = z.infer<typeof sealSchema>;
export type Ledge = z.infer<typeof ledgeSchema>;
export type Trace = z.infer<typeof traceSchema>;
export type Transfer = z.infer<typeof transferSchema>;
export type GlassArt = z.infer<typeof glassArtSchema>;

/** Metal-pin pitches a ledge may use (common practice). */
export const METAL_PIN_PITCHES_mm: readonly number[] = [1.5, 1.8, 2.0, 2.54];
/** Smallest elastomeric-connector pitch and ledge depth (common practice). */
export const ELASTOMERIC_MIN_PITCH_mm = 0.5;
export const ELASTOMERIC_MIN_LEDGE_mm = 3;

export const DEFAULT_GLASS_ART: GlassArt = {
	seal: { width_mm: 1, inset_mm: 0.5, fillGap_mm: 2 },
	ledge: { connector: 'elastomeric', depth_mm: 3 },
	overlapMargin_mm: 0.1,
	traceWidth_mm: 0.1,
	transfers: [],
	traces: []
};

/** Version 6 adds the glass drawing with defaults: no traces or transfer points yet. */
export function addGlassArt(doc: Record<string, unknown>): Record<string, unknown> {
	return { ...doc, glassArt: doc.glassArt ?? JSON.parse(JSON.stringify(DEFAULT_GLASS_ART)) };
}
