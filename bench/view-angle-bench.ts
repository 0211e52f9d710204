/**
 * Speed figures of the viewing-angle model, measured with the same helper as bench/run.ts:
 * one direction with both states (81 wavelengths, 60 slabs, hemisphere average done once per
 * state beforehand), the full 13 × 24 contrast map including its two director solves, and the
 * oblique views a legibility scenario off the normal needs (three hemisphere averages, profiles
 * from the cell report, nothing cached).
 */
import { createCellView } from '../src/lib/core/viewangle/cell-view';
import { contrastMap } from '../src/lib/core/viewangle/contrast-map';
import type { Design } from '../src/lib/core/design/schema';
import { analyzeCell } from '../src/lib/core/cell/analyze-cell';
import { clearObliqueViewCache, obliqueViews } from '../src/lib/core/legibility/oblique-views';

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
	const room = analyzeCell(demo).statesByTemperature[1];
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
		},
		{
			name: 'legibility: oblique views of 3 states, 1 direction, uncached',
			target_ms: null,
			runs: 20,
			body: () => {
				clearObliqueViewCache();
				obliqueViews({
					design: demo,
					states: room,
					directions: [{ polar_deg: 15, azimuth_deg: 90 }]
				});
			}
		}
	];
}
