/**
 * Flat rings onto a path sink (`geometry/path-sink.ts`): the one walk every artwork writer shares,
 * and the fixed-precision number format that keeps exports byte-identical from run to run.
 */
import type { PathSink } from '../geometry/path-sink';

export function drawRing(ring: Float64Array, sink: PathSink): void {
	if (ring.length < 6) return;
	sink.moveTo(ring[0], ring[1]);
	for (let i = 2; i < ring.length; i += 2) sink.lineTo(ring[i], ring[i + 1]);
	sink.closePath();
}

/** A number with at most `digits` decimals, no trailing zeros and never "-0". */
export function formatNumber(value: number, digits = 4): string {
	const text = value.toFixed(digits);
	const trimmed = text.includes('.') ? text.replace(/\.?0+$/, '') : text;
	return trimmed === '-0' ? '0' : trimmed;
}

/** SVG path data from rings (M … L … Z per ring), numbers at 0.1 µm. */
export class SvgPathData implements PathSink {
	private readonly parts: string[] = [];
	moveTo(x: number, y: number): void {
		this.parts.push(`M${formatNumber(x)} ${formatNumber(y)}`);
	}
	lineTo(x: number, y: number): void {
		this.parts.push(`L${formatNumber(x)} ${formatNumber(y)}`);
	}
	bezierCurveTo(c1x: number, c1y: number, c2x: number, c2y: number, x: number, y: number): void {
		const f = formatNumber;
		this.parts.push(`C${f(c1x)} ${f(c1y)} ${f(c2x)} ${f(c2y)} ${f(x)} ${f(y)}`);
	}
	closePath(): void {
		this.parts.push('Z');
	}
	toString(): string {
		return this.parts.join('');
	}
}

export function ringsToPathData(rings: readonly Float64Array[]): string {
	const sink = new SvgPathData();
	for (const ring of rings) drawRing(ring, sink);
	return sink.toString();
}

export const escapeXml = (text: string): string =>
	text.replace(
		/[<>&"']/g,
		(c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!
	);
