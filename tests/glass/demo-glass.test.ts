/**
 * The demo's glass drawing: the demo ships without one, and the generator, with nothing drawn by
 * hand, joins every electrode to its pad on both plates and passes every glass rule (no fail, no
 * warning), with a transfer point per common and leads for every line and common.
 */
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import { checkGlass } from '../../src/lib/core/glass/check-glass';
import { planGlass } from '../../src/lib/core/glass/plan-glass';

describe('the demo glass drawing', () => {
	it('comes out of the generator whole and passing', { timeout: 120_000 }, () => {
		const demo = demoDesign();
		expect(demo.glassArt.traces).toEqual([]);
		const plan = planGlass(demo);
		expect(plan.findings).toEqual([]);
		const drawn = { ...demo, glassArt: plan.glassArt };
		expect(drawn.glassArt.transfers.map((t) => t.common).sort()).toEqual(
			demo.commons.map((c) => c.id).sort()
		);
		const nets = new Set(drawn.glassArt.traces.map((t) => `${t.plate}:${t.net}`));
		for (const line of demo.segmentLines) expect(nets, line.id).toContain(`segment:${line.id}`);
		for (const common of demo.commons) {
			expect(nets, common.id).toContain(`common:${common.id}`);
			expect(nets, common.id).toContain(`segment:${common.id}`);
		}
		expect(checkGlass(drawn).findings.filter((f) => f.severity !== 'pass')).toEqual([]);
		// The design check then judges the drawing too, and finds nothing to fail on.
		const report = analyzeDesign(drawn);
		expect(report.glass?.findings.some((f) => f.code === 'glass.ok')).toBe(true);
		expect(report.severity).not.toBe('fail');
	});
});
