/**
 * Checks for electrode data coming into a command: contours of at least 3 finite points, and
 * common/line ids that exist in the design.
 */
import type { Contour, Design } from '../design/schema';
import { requireThat } from './command-error';

export function checkContour(contour: Contour, what: string): void {
	requireThat(contour.length >= 3, `${what} needs at least 3 points`);
	for (const p of contour) {
		const values = [p.x, p.y, ...(p.in ?? []), ...(p.out ?? [])];
		requireThat(
			values.every(Number.isFinite),
			`${what} has a coordinate that is not a finite number`
		);
	}
}

export function checkAssignment(
	design: Design,
	assignment: { common?: string | null; line?: string | null }
): void {
	if (assignment.common != null) {
		requireThat(
			design.commons.some((c) => c.id === assignment.common),
			`unknown common "${assignment.common}"`
		);
	}
	if (assignment.line != null) {
		requireThat(
			design.segmentLines.some((l) => l.id === assignment.line),
			`unknown segment line "${assignment.line}"`
		);
	}
}
