/**
 * Routing costs over the other plate: a lead pays for crossing a common only where the crossing
 * pair drives an electrode (it would light a ghost) and there is fluid to switch — dearest in the
 * viewing area, less behind the bezel, nothing under the seal. Geometry of the two-electrode glass
 * (viewing area 3–27 × 3–14 mm, seal inside 1.5 mm of the glass edge).
 */
import { describe, expect, it } from 'vitest';
import { ghostCosts } from '../../src/lib/core/glass/ghost-costs';
import { glassLayout } from '../../src/lib/core/glass/layout';
import { RouteGrid } from '../../src/lib/core/glass/route-grid';
import { twoElectrodeGlass } from './fixture';

const strip = (x0: number, x1: number, y: number) =>
	Float64Array.from([x0, y - 0.2, x1, y - 0.2, x1, y + 0.2, x0, y + 0.2]);

describe('ghost costs', () => {
	const design = twoElectrodeGlass();
	const layout = glassLayout(design);
	const grid = new RouteGrid({ domain: layout.glass, cell_mm: 0.1 });
	// One COM2 conductor across the whole glass at y = 10 (viewing area), one at y = 2.2 (behind
	// the bezel: inside the seal, above the viewing area), one at y = 0.8 (under the seal).
	const conductors = [strip(0.5, 29.5, 10), strip(0.5, 29.5, 2.2), strip(0.5, 29.5, 0.8)].map(
		(ring) => ({ common: 1, ring })
	);
	const costs = ghostCosts({ design, layout, grid, conductors });
	const costOf = (lit: number[]) => costs.of(lit);
	const at = (cost: Float32Array, x: number, y: number) =>
		cost[Math.floor(y / 0.1) * grid.nx + Math.floor(x / 0.1)];

	it('charge a lead over a common it shares an electrode with, by where the ghost would show', () => {
		const lit = costOf([1]);
		const idle = costOf([0]);
		const view = at(lit, 20.05, 10.05) - at(idle, 20.05, 10.05);
		const bezel = at(lit, 20.05, 2.25) - at(idle, 20.05, 2.25);
		const seal = at(lit, 20.05, 0.85) - at(idle, 20.05, 0.85);
		expect(view).toBeGreaterThan(bezel);
		expect(bezel).toBeGreaterThan(0);
		expect(seal).toBe(0);
	});

	it('charge nothing extra over a common whose pair with the line drives nothing', () => {
		const idle = costOf([0]);
		const none = costOf([]);
		expect(at(idle, 20.05, 10.05)).toBe(at(none, 20.05, 10.05));
		// Off the conductor the lit cost is the plain viewing-area cost.
		expect(at(costOf([1]), 20.05, 8.05)).toBe(at(none, 20.05, 8.05));
		// The viewing area costs a little more than the border, so leads keep to the border.
		expect(at(none, 20.05, 8.05)).toBeGreaterThan(at(none, 20.05, 2.05));
	});
});
