/**
 * From the design's cell section to the models' inputs: the fluid (a preset or the user's own),
 * the cell geometry for the director solver, and the optical stack for the Jones model.
 */
import type { CellSettings } from '../design/cell-schema';
import type { LcMaterial } from '../lc/material';
import { LC_PRESETS, presetById } from '../lc/presets';
import type { CellGeometry } from '../lc/cell';
import { reflectiveStackForMode, type ReflectiveStackSpec } from '../optics/stack-spec';
import type { PolarizerSpec } from '../optics/polarizer-models';
import type { ReflectorSpec } from '../optics/reflector';

export function materialOfCell(cell: CellSettings): LcMaterial {
	if ('custom' in cell.material) return cell.material.custom;
	const preset = presetById(cell.material.preset);
	if (!preset) {
		throw new Error(
			`unknown material preset "${cell.material.preset}" (known: ${LC_PRESETS.map((m) => m.id).join(', ')})`
		);
	}
	return preset;
}

export function geometryOfCell(cell: CellSettings): CellGeometry {
	return {
		gap_um: cell.gap_um,
		twist_deg: cell.twist_deg,
		pretilt_deg: cell.pretilt_deg,
		gapToPitch: cell.gapToPitch
	};
}

function polarizerSpec(choice: CellSettings['polarizer']): PolarizerSpec {
	if (choice.kind === 'ideal') return { kind: 'ideal' };
	if (choice.kind === 'custom') return { kind: 'principal', k1: choice.k1, k2: choice.k2 };
	return { kind: 'iodinePva' };
}

function reflectorSpec(choice: CellSettings['reflector']): ReflectorSpec {
	const { reflectance, depolarizedFraction, transmittance } = choice;
	if (choice.kind === 'diffuse-white') return { kind: 'diffuseWhite', reflectance };
	if (choice.kind === 'brushed-metal')
		return { kind: 'brushedMetal', reflectance, depolarizedFraction };
	return { kind: 'transflective', reflectance, transmittance, depolarizedFraction };
}

/**
 * The optical stack. The display mode sets the rear polarizer relative to the twist; a caller may
 * instead fix the angle between the polarizers (0° parallel, 90° crossed).
 */
export function stackOfCell(
	cell: CellSettings,
	options: { polarizerAngle_deg?: number } = {}
): ReflectiveStackSpec {
	const stack = reflectiveStackForMode({
		mode: cell.mode,
		twist_deg: cell.twist_deg,
		polarizer: polarizerSpec(cell.polarizer),
		reflector: reflectorSpec(cell.reflector),
		frontSurfaceReflectance: cell.frontSurfaceReflectance
	});
	if (options.polarizerAngle_deg === undefined) return stack;
	return {
		...stack,
		rear: { ...stack.rear, axis_deg: stack.front.axis_deg + options.polarizerAngle_deg }
	};
}
