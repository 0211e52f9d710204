/**
 * The demo's glass drawing: generated for its electrodes with nothing drawn by hand, it joins every
 * electrode to its pad on both plates and passes every glass rule (no fail, no warning), both as
 * stored in the demo file and when generated afresh.
 */
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { checkGlass } from '../../src/lib/core/glass/check-glass';
import { planGlass } from '../../src/lib/core/glass/plan-glass';
import type { Design } from '../../src/lib/core/design/schema';

const open = (d: Design) => checkGlass(d).findings.filter((f) => f.severity !== 'pass');

describe('the demo glass drawing', () => {
	it('is stored with a transfer point per common and leads for every line and common', () => {
		const demo = demoDesign();
		expect(demo.glassArt.transfers.map((t) => t.common).sort()).toEqual(
			demo.commons.map((c) => c.id).sort()
		);
		const nets = new Set(demo.glassArt.traces.map((t) => `${t.plate}:${t.net}`));
		for (const line of demo.segmentLines) expect(nets, line.id).toContain(`segment:${line.id}`);
		for (const common of demo.commons) {
			expect(nets, common.id).toContain(`common:${common.id}`);
			expect(nets, common.id).toContain(`segment:${common.id}`);
		}
		expect(open(demo)).toEqual([]);
	});

	it('comes out of the generator whole and passing', { timeout: 120_000 }, () => {
		const demo = demoDesign();
		const plan = planGlass({ ...demo, glassArt: { ...demo.glassArt, traces: [], transfers: [] } });
		expect(plan.findings).toEqual([]);
		expect(open({ ...demo, glassArt: plan.glassArt })).toEqual([]);
	});
});
