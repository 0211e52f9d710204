/**
 * The viewing-angle map of a design: for each direction (polar 0…max, all azimuths) the look of
 * the background, off and on segments under the design's drive at one temperature, their
 * contrast ratio (brighter over darker, first-surface reflection included, as the cell report),
 * ΔE00 between off and on segments, and the on segment's colour shift (ΔE00 against the on
 * segment seen along the normal). Then the best viewing direction and the cone of directions
 * where the contrast stays at or above each iso-contrast level.
 *
 * Cost: two director solves, two hemisphere averages, and one oblique stack evaluation per
 * direction and state; the normal (polar 0) is computed once for all azimuths.
 */
import type { Design } from '../design/schema';
import { deltaE2000 } from '../color/delta-e-2000';
import { createCellView, type SeenColor } from './cell-view';
import { driveVoltage, roomTemperature } from './cell-reflectance-at';
import { bestDirection, type BestDirection } from './best-direction';

export const ISO_CONTRAST_LEVELS = [3, 5, 10, 20] as const;
export const MAX_POLAR_deg = 60;
export const MAX_DIRECTIONS = 20000;

export interface MapSwatch {
	Y: number;
	hex: string;
}

export interface ContrastMap {
	temperature_C: number;
	off_V: number;
	on_V: number;
	polar_deg: number[];
	azimuth_deg: number[];
	/** [polarIndex][azimuthIndex] */
	contrast: number[][];
	deltaE00: number[][];
	onShiftDeltaE00: number[][];
	off: MapSwatch[][];
	on: MapSwatch[][];
	best: BestDirection;
	/** Per level: the largest polar angle up to which contrast ≥ level, per azimuth. */
	cones: { level: number; extent_deg: number[] }[];
}

export interface ContrastMapOptions {
	design: Design;
	polarStep_deg?: number;
	azimuthStep_deg?: number;
	maxPolar_deg?: number;
	temperature_C?: number;
	onProgress?: (done: number, total: number) => void;
}

export function mapAngles(options: {
	polarStep_deg: number;
	azimuthStep_deg: number;
	maxPolar_deg: number;
}): { polar_deg: number[]; azimuth_deg: number[] } {
	const { polarStep_deg, azimuthStep_deg, maxPolar_deg } = options;
	if (!(polarStep_deg >= 0.5 && polarStep_deg <= 60))
		throw new RangeError(`polar step must lie between 0.5 and 60°, got ${polarStep_deg}`);
	if (!(azimuthStep_deg >= 1 && azimuthStep_deg <= 180))
		throw new RangeError(`azimuth step must lie between 1 and 180°, got ${azimuthStep_deg}`);
	if (!(maxPolar_deg > 0 && maxPolar_deg <= 80))
		throw new RangeError(`largest polar angle must lie in (0, 80]°, got ${maxPolar_deg}`);
	const polar_deg: number[] = [];
	for (let p = 0; p <= maxPolar_deg + 1e-9; p += polarStep_deg) polar_deg.push(+p.toFixed(6));
	const azimuth_deg: number[] = [];
	for (let a = 0; a < 360 - 1e-9; a += azimuthStep_deg) azimuth_deg.push(+a.toFixed(6));
	if (polar_deg.length * azimuth_deg.length > MAX_DIRECTIONS)
		throw new RangeError(
			`too many directions (${polar_deg.length}×${azimuth_deg.length}); use larger steps`
		);
	return { polar_deg, azimuth_deg };
}

function coneExtent(polar_deg: number[], column: number[], level: number): number {
	let extent = 0;
	for (let p = 0; p < polar_deg.length; p++) {
		if (column[p] < level) {
			if (p === 0) return 0;
			const a = column[p - 1],
				b = column[p];
			return polar_deg[p - 1] + ((a - level) / (a - b)) * (polar_deg[p] - polar_deg[p - 1]);
		}
		extent = polar_deg[p];
	}
	return extent;
}

const swatch = (c: SeenColor): MapSwatch => ({ Y: c.Y, hex: c.srgbHex });

export function contrastMap(options: ContrastMapOptions): ContrastMap {
	const { design } = options;
	const { polar_deg, azimuth_deg } = mapAngles({
		polarStep_deg: options.polarStep_deg ?? 5,
		azimuthStep_deg: options.azimuthStep_deg ?? 15,
		maxPolar_deg: options.maxPolar_deg ?? MAX_POLAR_deg
	});
	const temperature_C = options.temperature_C ?? roomTemperature(design);
	const view = createCellView({ design, temperature_C });
	const off_V = driveVoltage(design, 'off');
	const on_V = driveVoltage(design, 'on');
	const offState = view.stateAt(off_V);
	const onState = view.stateAt(on_V, offState.profile);
	const total = polar_deg.length;
	const contrast: number[][] = [],
		deltaE00: number[][] = [],
		onShift: number[][] = [],
		off: MapSwatch[][] = [],
		on: MapSwatch[][] = [];
	const normalOn = view.seen(onState, { polar_deg: 0, azimuth_deg: 0 });
	polar_deg.forEach((polar, p) => {
		const rowC: number[] = [],
			rowE: number[] = [],
			rowS: number[] = [],
			rowOff: MapSwatch[] = [],
			rowOn: MapSwatch[] = [];
		let first: [SeenColor, SeenColor] | null = null;
		for (const azimuth of azimuth_deg) {
			const pair: [SeenColor, SeenColor] =
				polar === 0 && first
					? first
					: [
							view.seen(offState, { polar_deg: polar, azimuth_deg: azimuth }),
							view.seen(onState, { polar_deg: polar, azimuth_deg: azimuth })
						];
			first ??= pair;
			const [a, b] = pair;
			const hi = Math.max(a.Y, b.Y),
				lo = Math.min(a.Y, b.Y);
			rowC.push(lo > 0 ? hi / lo : Infinity);
			rowE.push(deltaE2000(a, b));
			rowS.push(deltaE2000(b, normalOn));
			rowOff.push(swatch(a));
			rowOn.push(swatch(b));
		}
		contrast.push(rowC);
		deltaE00.push(rowE);
		onShift.push(rowS);
		off.push(rowOff);
		on.push(rowOn);
		options.onProgress?.(p + 1, total);
	});
	// A readout inverts where the on segment turns brighter than the off one: count that as
	// contrast below 1 for the best direction and the cones.
	const signed = contrast.map((row, p) =>
		row.map((c, a) => (on[p][a].Y > off[p][a].Y === (design.cell.mode === 'positive') ? 1 / c : c))
	);
	const best = bestDirection({ polar_deg, azimuth_deg, contrast: signed });
	const cones = ISO_CONTRAST_LEVELS.map((level) => ({
		level,
		extent_deg: azimuth_deg.map((_, a) =>
			coneExtent(
				polar_deg,
				signed.map((row) => row[a]),
				level
			)
		)
	}));
	return {
		temperature_C,
		off_V,
		on_V,
		polar_deg,
		azimuth_deg,
		contrast: signed,
		deltaE00,
		onShiftDeltaE00: onShift,
		off,
		on,
		best,
		cones
	};
}
