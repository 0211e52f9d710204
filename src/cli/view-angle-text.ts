/** The viewing-angle report as terminal lines: contrast table, best direction, cones, parallax. */
import type { ViewAngleReport } from '../lib/core/viewangle/view-angle-report';
import { fixed, formatTable } from './table';

export function viewAngleLines(report: ViewAngleReport): string[] {
	const { map, parallax } = report;
	const bestIndex = map.azimuth_deg.reduce(
		(best, a, i) =>
			Math.abs(((a - map.best.azimuth_deg + 540) % 360) - 180) <
			Math.abs(((map.azimuth_deg[best] - map.best.azimuth_deg + 540) % 360) - 180)
				? i
				: best,
		0
	);
	const header = ['polar \\ azimuth', ...map.azimuth_deg.map((a) => `${a}°`)];
	const rows = map.polar_deg.map((p, i) => [`${p}°`, ...map.contrast[i].map((c) => fixed(c, 1))]);
	return [
		`Contrast ratio, on against off segments, at ${map.temperature_C} °C (off ${fixed(map.off_V, 2)} V, on ${fixed(map.on_V, 2)} V rms)`,
		"(azimuth clockwise from 3 o'clock as the viewer sees the glass; below 1 = inverted)",
		formatTable([header, ...rows]),
		'',
		`Best viewing direction: ${map.best.clock} o'clock (azimuth ${fixed(map.best.azimuth_deg, 1)}°), typical contrast ${fixed(map.best.typicalContrast, 2)}:1`,
		`Twist from the rubbing directions: ${fixed(report.twistFromRubbing_deg, 1)}°`,
		'',
		'Cone where contrast stays at or above a level (polar extent, deg)',
		formatTable([
			['level', 'best direction', 'narrowest azimuth'],
			...map.cones.map((c) => [
				`${c.level}:1`,
				fixed(c.extent_deg[bestIndex], 1),
				fixed(Math.min(...c.extent_deg), 1)
			])
		]),
		'',
		`Parallax shadow offset (rear glass ${parallax.rearGlass_mm} mm)` +
			(parallax.narrowest ? `, narrowest stroke ${fixed(parallax.narrowest.width_mm, 2)} mm` : ''),
		formatTable([
			['polar', 'offset mm'],
			...parallax.table.map((r) => [`${r.polar_deg}°`, fixed(r.offset_mm, 3)])
		])
	];
}
