/**
 * Ghosts as findings: one per (common, line, place), with the summed overlap area and the
 * electrodes whose plates or leads are involved. Visible ghosts fail; ghosts behind the bezel warn
 * (they switch, and show through any gap in the bezel or at an angle); under the seal there is no
 * fluid, so they pass with a note; so do idle overlaps, whose pair no electrode uses.
 */
import { finding, type Finding } from '../findings/finding';
import type { Ghost } from './ghost-check';
import { ringBounds } from './rings';

export function ghostFindings(ghosts: readonly Ghost[]): Finding[] {
	const groups = new Map<string, Ghost[]>();
	for (const g of ghosts) {
		const key = `${g.where}\u0000${g.common}\u0000${g.line}`;
		groups.set(key, [...(groups.get(key) ?? []), g]);
	}
	const out: Finding[] = [];
	for (const list of groups.values()) {
		const g = list[0];
		const area = list.reduce((s, x) => s + x.area_mm2, 0);
		const b = list.reduce((acc, x) => ringBounds(x.ring, acc), {
			minX: Infinity,
			minY: Infinity,
			maxX: -Infinity,
			maxY: -Infinity
		});
		const location = {
			x_mm: b.minX,
			y_mm: b.minY,
			width_mm: b.maxX - b.minX,
			height_mm: b.maxY - b.minY
		};
		const electrodes = [...new Set(list.flatMap((x) => x.electrodes))];
		const pair = `(${g.commonName}, ${g.lineName})`;
		const what = `${list.length} overlap${list.length > 1 ? 's' : ''} of ${area.toFixed(4)} mm²`;
		if (g.where === 'visible')
			out.push(
				finding({
					code: 'glass.ghost-visible',
					severity: 'fail',
					message: `Ghost in the viewing area: ${what} light whenever ${pair} is driven.`,
					fix: `Reroute the ${g.lineName} lead where the common plate is clear, or cut a window in ${g.commonName}'s plate.`,
					electrodes,
					location
				})
			);
		else if (g.where === 'bezel')
			out.push(
				finding({
					code: 'glass.ghost-hidden',
					severity: 'warn',
					message: `Ghost behind the bezel: ${what} switch whenever ${pair} is driven.`,
					fix: `Keep the bezel over it, or reroute the ${g.lineName} lead away from ${g.commonName}'s plate.`,
					electrodes,
					location
				})
			);
		else if (g.where === 'idle')
			out.push(
				finding({
					code: 'glass.ghost-idle',
					severity: 'pass',
					message: `${what} ${list.length > 1 ? 'cross' : 'crosses'} ${pair}, a pair no electrode uses: it is never selected, so ${list.length > 1 ? 'they stay' : 'it stays'} dark.`,
					fix: `Keep ${pair} unassigned, or reroute the ${g.lineName} lead before giving that pair an electrode.`,
					electrodes,
					location
				})
			);
		else
			out.push(
				finding({
					code: 'glass.ghost-under-seal',
					severity: 'pass',
					message: `${what} of ${pair} lie under the seal, where there is no fluid.`,
					electrodes,
					location
				})
			);
	}
	return out;
}
