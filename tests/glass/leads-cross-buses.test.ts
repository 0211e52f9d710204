/**
 * A net of a segment plate routed first stands once the common plate is laid only if none of its
 * leads lies over a common-plate lead it would light. On the two-electrode glass (viewing area 3–27 × 3–14 mm):
 * a SEG1 lead along y = 11 and a COM2 bus down x = 17.5 cross at (17.5, 11) inside the viewing area.
 */
import { describe, expect, it } from 'vitest';
import type { Trace } from '../../src/lib/core/design/glass-art-schema';
import { glassLayout } from '../../src/lib/core/glass/layout';
import { leadsCrossBuses } from '../../src/lib/core/glass/leads-cross-buses';
import { twoElectrodeGlass } from './fixture';

const trace = (id: string, plate: Trace['plate'], net: string, pts: number[]): Trace => ({
	id,
	plate,
	net,
	width_mm: 0.1,
	points: Array.from({ length: pts.length / 2 }, (_, i) => ({ x: pts[2 * i], y: pts[2 * i + 1] }))
});

describe('leads over buses', () => {
	const design = twoElectrodeGlass();
	const layout = glassLayout(design);
	const lead = trace('lead', 'segment', 'seg1', [7, 8, 7, 11, 22, 11]);
	const bus = trace('bus', 'common', 'com2', [17.5, 8, 17.5, 13]);
	const cross = (lit: number[], buses = [bus]) =>
		leadsCrossBuses({ design, layout, leads: [lead], buses, litOf: () => lit }).has('seg1');

	it('finds a lead over a bus of a common it lights', () => {
		expect(cross([0, 1])).toBe(true);
	});

	it('lets a lead cross a common it shares no electrode with', () => {
		expect(cross([0])).toBe(false);
	});

	it('ignores a bus the lead does not meet, and a crossing under the seal', () => {
		expect(cross([0, 1], [trace('far', 'common', 'com2', [25, 4, 25, 6])])).toBe(false);
		// x = 1.0 lies under the seal (0.5–1.5 mm from the edge): no fluid there.
		const under = trace('lead', 'segment', 'seg1', [1, 5, 1, 15]);
		const sealBus = trace('bus', 'common', 'com2', [0.6, 10, 1.4, 10]);
		expect(
			leadsCrossBuses({ design, layout, leads: [under], buses: [sealBus], litOf: () => [0, 1] })
				.size
		).toBe(0);
	});

	it('names only the nets whose leads cross', () => {
		const other = trace('other', 'segment', 'seg2', [7, 4, 12, 4]);
		const crossing = leadsCrossBuses({
			design,
			layout,
			leads: [lead, other],
			buses: [bus],
			litOf: () => [0, 1]
		});
		expect([...crossing]).toEqual(['seg1']);
	});
});
