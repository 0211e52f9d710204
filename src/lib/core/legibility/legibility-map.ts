/**
 * The legibility map: the visibility level of the smallest character group over illuminance
 * (log axis, 1 lx to 120 klx) × reading distance (log axis), in the light of one scenario: its
 * illuminant, mirrored luminance scaled with the illuminance (the scenario's ratio L_mirrored/E),
 * backlight, viewing angle and reader's age. A point is readable when VL reaches the reading
 * factor, the height reaches 16′ and the contrast 3:1 (the same rules as the verdicts).
 *
 * Every state's luminance is linear in E: L = ρ·E/π + R_s·(L_m/E)·E + L_backlight, so one
 * evaluation of the scenario's light gives the whole map.
 */
import type { LegibilitySettings, Scenario } from '../design/legibility-schema';
import type { CharacterGroup } from './character-groups';
import { groupMetrics } from './group-metrics';
import { CHARACTER_HEIGHT_MIN, CONTRAST_RATIO_MIN } from './legibility-limits';
import type { ScenarioLight } from './scenario-light';

export interface LegibilityMap {
	illuminances_lx: number[];
	distances_mm: number[];
	/** VL at [distance index][illuminance index], row-major. */
	visibilityLevel: Float64Array;
	readable: Uint8Array;
	group: string;
}

export const MAP_ILLUMINANCE_LX = { min: 1, max: 120_000 } as const;

function logSpace(min: number, max: number, count: number): number[] {
	const a = Math.log10(min);
	const b = Math.log10(max);
	return Array.from({ length: count }, (_, i) => 10 ** (a + ((b - a) * i) / (count - 1)));
}

export function legibilityMap(options: {
	scenario: Scenario;
	light: ScenarioLight;
	/** R_s to count the veil with; default the light's own (at the scenario's viewing angle). */
	frontSurfaceReflectance?: number;
	groups: readonly CharacterGroup[];
	settings: Pick<LegibilitySettings, 'readableVL'>;
	columns?: number;
	rows?: number;
	distanceRange_mm?: { min: number; max: number };
}): LegibilityMap {
	const { scenario, light } = options;
	const columns = options.columns ?? 48;
	const rows = options.rows ?? 24;
	const range = options.distanceRange_mm ?? { min: 150, max: 6000 };
	const illuminances_lx = logSpace(MAP_ILLUMINANCE_LX.min, MAP_ILLUMINANCE_LX.max, columns);
	const distances_mm = logSpace(range.min, range.max, rows);
	const smallest = [...options.groups].sort((a, b) => a.height_mm - b.height_mm)[0];
	const visibilityLevel = new Float64Array(columns * rows);
	const readable = new Uint8Array(columns * rows);
	if (!smallest) return { illuminances_lx, distances_mm, visibilityLevel, readable, group: '' };
	const veilPerLux =
		options.frontSurfaceReflectance === undefined
			? light.veil_cdm2 / scenario.illuminance_lx
			: (options.frontSurfaceReflectance * scenario.mirrored_cdm2) / scenario.illuminance_lx;
	const at = (name: 'background' | 'off' | 'on', e: number) =>
		(light.diffuse[name] * e) / Math.PI + veilPerLux * e + light.backlit_cdm2[name];
	for (let c = 0; c < columns; c++) {
		const e = illuminances_lx[c];
		const bg = at('background', e);
		const off = at('off', e);
		const on = at('on', e);
		const cr = Math.max(off, on) / Math.max(Math.min(off, on), 1e-12);
		for (let r = 0; r < rows; r++) {
			const m = groupMetrics({
				group: smallest,
				scenario: { ...scenario, distance_mm: distances_mm[r] },
				background_cdm2: bg,
				on_cdm2: on,
				off_cdm2: off
			});
			const i = r * columns + c;
			visibilityLevel[i] = m.visibilityLevel;
			readable[i] =
				m.visibilityLevel >= options.settings.readableVL &&
				m.height_arcmin >= CHARACTER_HEIGHT_MIN.value &&
				cr >= CONTRAST_RATIO_MIN.value
					? 1
					: 0;
		}
	}
	return { illuminances_lx, distances_mm, visibilityLevel, readable, group: smallest.name };
}
