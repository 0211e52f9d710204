/**
 * The glass check inside the design check: `analyzeDesign` (the app's findings list and the
 * report) and `sunglyph check --json` carry the glass findings of the stored drawing, and a design
 * with no glass drawing yet is not judged on it. Expected areas are worked by hand beside each case.
 */
import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { generateGlass } from '../../src/lib/core/commands/generate-glass';
import { addTrace } from '../../src/lib/core/commands/set-glass-art';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import type { Design } from '../../src/lib/core/design/schema';
import { checkGlass } from '../../src/lib/core/glass/check-glass';
import { runCli } from '../cli/run-cli';
import { crossedPairGlass, twoElectrodeGlass } from './fixture';

const glassCodes = (d: Design) =>
	(analyzeDesign(d).glass?.findings ?? []).filter((f) => f.severity !== 'pass').map((f) => f.code);

/**
 * The generated two-electrode glass (with E3 on the crossing pair) plus a hand-drawn SEG1 lead whose
 * last run crosses COM2's plate.
 */
function withGhostLead(): Design {
	const d = crossedPairGlass();
	const routed = applyPatch(d, generateGlass(d));
	// Last run at y = 8.07, 0.04 mm wide (band 8.05–8.09), under COM2's plate margin below E2
	// (plate 14.9–20.1 × 4.9–8.1): overlap 5.2 mm × 0.04 mm = 0.208 mm² (hand calculation).
	const points = [
		{ x: 9.9, y: 6.5 },
		{ x: 12, y: 6.5 },
		{ x: 12, y: 8.07 },
		{ x: 22, y: 8.07 }
	];
	return applyPatch(
		routed,
		addTrace(routed, { id: 'hand', plate: 'segment', net: 'seg1', width_mm: 0.04, points })
	);
}

describe('glass findings in the design check', () => {
	it('leave a design without a glass drawing unjudged', () => {
		const d = twoElectrodeGlass();
		expect(d.glassArt.traces).toEqual([]);
		const report = analyzeDesign(d);
		expect(report.glass).toBeNull();
		// Without the drawing the glass check itself reports opens; the design check does not.
		expect(checkGlass(d).findings.map((f) => f.code)).toContain('glass.open');
		expect(report.severity).not.toBe('fail');
	});

	it('pass a generated drawing and fail the same drawing with a ghost lead', () => {
		const d = twoElectrodeGlass();
		const routed = applyPatch(d, generateGlass(d));
		expect(glassCodes(routed)).toEqual([]);
		expect(analyzeDesign(routed).severity).not.toBe('fail');
		const ghosted = withGhostLead();
		const report = analyzeDesign(ghosted);
		// The run also meets SEG2's own lead on its way to x = 22: a short, reported beside the ghost.
		expect(glassCodes(ghosted).sort()).toEqual(['glass.ghost-visible', 'glass.short']);
		expect(report.severity).toBe('fail');
		const ghost = report.glass!.findings.find((f) => f.code === 'glass.ghost-visible')!;
		expect(ghost.message).toContain('(COM2, SEG1)');
		expect(ghost.message).toContain('0.2080 mm²');
		expect(ghost.electrodes).toContain('e2');
	});

	it('judge the stored leads, never a fresh routing', () => {
		const routed = applyPatch(twoElectrodeGlass(), generateGlass(twoElectrodeGlass()));
		const cut = {
			...routed,
			glassArt: {
				...routed.glassArt,
				traces: routed.glassArt.traces.filter((t) => !(t.plate === 'segment' && t.net === 'seg2'))
			}
		};
		const opens = analyzeDesign(cut).glass!.findings.filter((f) => f.code === 'glass.open');
		expect(opens.flatMap((f) => f.electrodes)).toEqual(['e2']);
	});

	it('show the same glass findings in `sunglyph check --json`, which exits 1', async () => {
		const ghosted = withGhostLead();
		const { code, stdout } = await runCli(['check', 'ghost.json', '--json'], {
			'ghost.json': serializeDesign(ghosted)
		});
		expect(code).toBe(1);
		const json = JSON.parse(stdout);
		expect(json.glass.findings).toEqual(analyzeDesign(ghosted).glass!.findings);
		const text = await runCli(['check', 'ghost.json'], { 'ghost.json': serializeDesign(ghosted) });
		expect(text.stdout).toMatch(/Glass\n.*Ghost in the viewing area/s);
	});
});
