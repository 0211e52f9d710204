/** Messages between the page and the viewing-angle worker. */
import type { Design } from '$lib/core/design/schema';
import type { ViewAngleReport } from '$lib/core/viewangle/view-angle-report';

export interface ViewAngleRequest {
	id: number;
	design: Design;
	polarStep_deg: number;
	azimuthStep_deg: number;
}

export type ViewAngleResponse =
	| { id: number; kind: 'progress'; done: number; total: number }
	| { id: number; kind: 'result'; report: ViewAngleReport; elapsed_ms: number; cached: boolean }
	| { id: number; kind: 'error'; message: string };

/** What the map depends on: the cell, light, drive and orientation, and the grid. */
export function viewAngleKey(request: Omit<ViewAngleRequest, 'id'>): string {
	const { cell, lighting, drive, orientation, electrodes } = request.design;
	return JSON.stringify([
		cell,
		lighting,
		drive,
		orientation,
		electrodes.length,
		request.polarStep_deg,
		request.azimuthStep_deg
	]);
}
