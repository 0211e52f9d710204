/**
 * Speed figures of the viewing-angle model, measured with the same helper as bench/run.ts:
 * one direction with both states (81 wavelengths, 60 slabs, hemisphere average done once per
 * state beforehand), and the full 13 × 24 contrast map including its two director solves.
 */
import { createCellView } from '../src/lib/core/viewangle/cell-view';
import { contrastMap } from '../src/lib/core/viewangle/contrast-map';
import type { Design } from '../src/lib/core/design/schema';

interface Measured {
	name: string;
	target_ms: number | null;
	runs: number;
	body: (i: number) => void;
}

export function viewAngleBenchmarks(demo: Design): Measured[] {
	const view = createCellView({ design: demo, temperature_C: 25 });
	const off = view.stateAt(1.57);
	const on = view.stateAt(2.71, off.profile);
	return [
		{
			name: 'one viewing direction, both states, 81 λ, 60 slabs',
			target_ms: 3,
			runs: 200,
			body: (i) => {
				const direction = { polar_deg: 35, azimuth_deg: (i * 7) % 360 };
				view.seen(off, direction);
				view.seen(on, direction);
			}
		},
		{
			name: 'contrast map 13 polar × 24 azimuth, both states',
			target_ms: 1500,
			runs: 5,
			body: () => {
				contrastMap({ design: demo, polarStep_deg: 5, azimuthStep_deg: 15 });
			}
		}
	];
}
