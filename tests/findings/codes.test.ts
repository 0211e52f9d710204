import { describe, expect, it } from 'vitest';
import { FINDING_CODES, isKnownFindingCode } from '../../src/lib/core/findings/codes';
import { analyzeDesignWithCell } from '../../src/lib/core/analyze-design';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';

/** Every finding an analysis reports must carry a registered, documented code. */
function allFindings(design: Design) {
	const report = analyzeDesignWithCell(design);
	return [
		...report.wiring.findings,
		...report.drive.findings,
		...report.opticsFindings,
		...report.rules.findings
	];
}

describe('finding codes', () => {
	it('are unique, dotted lower-case words, each with a meaning', () => {
		const codes = FINDING_CODES.map((c) => c.code);
		expect(new Set(codes).size).toBe(codes.length);
		for (const c of FINDING_CODES) {
			expect(c.code).toMatch(/^[a-z]+(\.[a-z0-9-]+)+$/);
			expect(c.meaning.length).toBeGreaterThan(10);
		}
	});

	it('cover every finding the demo and a failing variant report', () => {
		const demo = demoDesign();
		const failing: Design = {
			...demo,
			drive: { ...demo.drive, amplitude_V: 1, frameRate_Hz: 10, biasDivisor: 2 },
			electrodes: demo.electrodes.map((e, i) => (i < 2 ? { ...e, common: null } : e))
		};
		const empty: Design = { ...demo, electrodes: [], groups: [] };
		const findings = [...allFindings(demo), ...allFindings(failing), ...allFindings(empty)];
		expect(findings.map((f) => f.code)).toContain('wiring.unassigned');
		expect(findings.map((f) => f.code)).toContain('drive.amplitude-too-low');
		expect(findings.map((f) => f.code)).toContain('rule.empty-design');
		for (const f of findings) expect(isKnownFindingCode(f.code), f.code).toBe(true);
		for (const f of findings.filter((x) => x.severity !== 'pass')) expect(f.fix).not.toBe('');
	});
});
