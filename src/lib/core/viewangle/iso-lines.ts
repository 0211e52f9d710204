/**
 * Iso-value lines of a map sampled on a polar grid (rows: polar angle from the normal outward;
 * columns: azimuth, periodic), by marching squares with linear interpolation along cell edges
 * (Lorensen & Cline's cube method in two dimensions). Segments come back in (polar, azimuth)
 * degrees; the caller projects them. Ambiguous saddle cells are split by the cell mean.
 */
export interface IsoSegment {
	from: [polar_deg: number, azimuth_deg: number];
	to: [polar_deg: number, azimuth_deg: number];
}

export function isoLines(options: {
	polar_deg: readonly number[];
	azimuth_deg: readonly number[];
	values: readonly (readonly number[])[];
	level: number;
}): IsoSegment[] {
	const { polar_deg, azimuth_deg, values, level } = options;
	const rows = polar_deg.length,
		cols = azimuth_deg.length;
	const segments: IsoSegment[] = [];
	const az = (j: number) => (j < cols ? azimuth_deg[j] : azimuth_deg[0] + 360);
	for (let i = 0; i + 1 < rows; i++) {
		for (let j = 0; j < cols; j++) {
			const j1 = (j + 1) % cols;
			// corners counter-clockwise in (row, col): a(i,j) b(i,j+1) c(i+1,j+1) d(i+1,j)
			const corners: [number, number, number][] = [
				[polar_deg[i], az(j), values[i][j]],
				[polar_deg[i], az(j + 1), values[i][j1]],
				[polar_deg[i + 1], az(j + 1), values[i + 1][j1]],
				[polar_deg[i + 1], az(j), values[i + 1][j]]
			];
			const points: [number, number][] = [];
			for (let k = 0; k < 4; k++) {
				const [p0, a0, v0] = corners[k];
				const [p1, a1, v1] = corners[(k + 1) % 4];
				if (!Number.isFinite(v0) || !Number.isFinite(v1)) continue;
				if (v0 < level !== v1 < level) {
					const t = (level - v0) / (v1 - v0);
					points.push([p0 + t * (p1 - p0), a0 + t * (a1 - a0)]);
				}
			}
			if (points.length === 2) segments.push({ from: points[0], to: points[1] });
			else if (points.length === 4) {
				const mean = corners.reduce((s, c) => s + c[2], 0) / 4;
				const firstAbove = corners[0][2] >= level;
				const pair = firstAbove === mean >= level ? [0, 3, 1, 2] : [0, 1, 2, 3];
				segments.push({ from: points[pair[0]], to: points[pair[1]] });
				segments.push({ from: points[pair[2]], to: points[pair[3]] });
			}
		}
	}
	return segments;
}
