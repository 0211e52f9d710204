/**
 * The skeleton of a segmented character: three column axes (left, centre, right) leaning with the
 * slant and three row axes (top, middle, bottom), each the centre line of a bar. Slant is a
 * shear about the baseline (y = y_mm + height_mm): a point at height y moves right by
 * tan(slant)·(baseline − y). Column axes are placed so the outer edges of the left and right bars
 * are `width_mm` apart horizontally at every height, and every bar is `stroke_mm` wide measured
 * perpendicular to itself.
 */
import { degToRad, normalize, type XY } from '../geometry/vec';
import type { SegmentCharacterParams } from './segment-params';

export type Column = 'L' | 'C' | 'R';
export type Row = 'T' | 'M' | 'B';
export type JointName = `${Column}${Row}`;

export interface AxisLine {
	readonly point: XY;
	/** Unit direction: +x for rows, downward along the slant for columns. */
	readonly dir: XY;
}

export interface SegmentFrame {
	readonly params: SegmentCharacterParams;
	readonly half: number;
	readonly gap: number;
	/** tan(slant). */
	readonly lean: number;
	readonly baseline: number;
	/** Unit direction of columns, pointing down. */
	readonly down: XY;
	readonly across: XY;
	readonly columns: Readonly<Record<Column, AxisLine>>;
	readonly rows: Readonly<Record<Row, AxisLine>>;
	joint(name: JointName): XY;
}

export function segmentFrame(params: SegmentCharacterParams): SegmentFrame {
	const { x_mm: x0, y_mm: y0, width_mm: w, height_mm: h } = params;
	const half = params.stroke_mm / 2;
	const lean = Math.tan(degToRad(params.slant_deg));
	const baseline = y0 + h;
	const down = normalize({ x: -lean, y: 1 });
	const across = { x: 1, y: 0 };
	const secant = Math.sqrt(1 + lean * lean);
	const column = (xAtBaseline: number): AxisLine => ({
		point: { x: xAtBaseline, y: baseline },
		dir: down
	});
	const columns = {
		L: column(x0 + half * secant),
		C: column(x0 + w / 2),
		R: column(x0 + w - half * secant)
	};
	const row = (y: number): AxisLine => ({ point: { x: x0, y }, dir: across });
	const rows = { T: row(y0 + half), M: row(y0 + h / 2), B: row(y0 + h - half) };
	const joint = (name: JointName): XY => {
		const y = rows[name[1] as Row].point.y;
		return { x: columns[name[0] as Column].point.x + lean * (baseline - y), y };
	};
	return { params, half, gap: params.gap_mm, lean, baseline, down, across, columns, rows, joint };
}
