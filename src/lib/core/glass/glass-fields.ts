/**
 * The editable quantities of the glass drawing, declared once: label, unit, range (the schema's),
 * and how to read and write each on a design. The app's glass panel loops over this list.
 */
import type { GlassArt } from '../design/glass-art-schema';
import type { Design } from '../design/schema';

export interface GlassField {
	key: string;
	label: string;
	unit: string;
	min: number;
	max: number;
	read: (d: Design) => number;
	write: (art: GlassArt, value: number) => GlassArt;
}

export const GLASS_FIELDS: readonly GlassField[] = [
	{
		key: 'seal-width',
		label: 'Seal width',
		unit: 'mm',
		min: 0.2,
		max: 10,
		read: (d) => d.glassArt.seal.width_mm,
		write: (a, v) => ({ ...a, seal: { ...a.seal, width_mm: v } })
	},
	{
		key: 'seal-inset',
		label: 'Seal inset',
		unit: 'mm',
		min: 0,
		max: 20,
		read: (d) => d.glassArt.seal.inset_mm,
		write: (a, v) => ({ ...a, seal: { ...a.seal, inset_mm: v } })
	},
	{
		key: 'fill-gap',
		label: 'Fill gap',
		unit: 'mm',
		min: 0,
		max: 50,
		read: (d) => d.glassArt.seal.fillGap_mm,
		write: (a, v) => ({ ...a, seal: { ...a.seal, fillGap_mm: v } })
	},
	{
		key: 'ledge-depth',
		label: 'Ledge depth',
		unit: 'mm',
		min: 0.5,
		max: 30,
		read: (d) => d.glassArt.ledge.depth_mm,
		write: (a, v) => ({ ...a, ledge: { ...a.ledge, depth_mm: v } })
	},
	{
		key: 'overlap-margin',
		label: 'Back-plate margin',
		unit: 'mm',
		min: 0,
		max: 1,
		read: (d) => d.glassArt.overlapMargin_mm,
		write: (a, v) => ({ ...a, overlapMargin_mm: v })
	},
	{
		key: 'trace-width',
		label: 'Trace width',
		unit: 'mm',
		min: 0.005,
		max: 5,
		read: (d) => d.glassArt.traceWidth_mm,
		write: (a, v) => ({ ...a, traceWidth_mm: v })
	}
];
