import { describe, expect, it } from 'vitest';
import { isKnownFindingCode } from '../../src/lib/core/findings/codes';
import { checkDesignRules } from '../../src/lib/core/rules/check-design-rules';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design, Electrode } from '../../src/lib/core/design/schema';
import { generateSevenSegment } from '../../src/lib/core/glyphs/seven-segment';
import { box, designWith, electrode, points } from './rule-fixtures';

const codesOf = (design: Design) => checkDesignRules(design).findings.map((f) => f.code);
const findingOf = (design: Design, code: string) =>
	checkDesignRules(design).findings.find((f) => f.code === code);

/** A 7-segment digit group at the demo's viewing distance (600 mm unless overridden). */
function digitDesign(options: { height_mm: number; stroke_mm: number; distance_mm?: number }) {
	const generated = generateSevenSegment({
		x_mm: 20,
		y_mm: 8,
		height_mm: options.height_mm,
		width_mm: options.height_mm * 0.7,
		stroke_mm: options.stroke_mm,
		gap_mm: 0.1,
		slant_deg: 0
	});
	const electrodes: Electrode[] = generated.parts.map((p, k) =>
		electrode(p.outline, { id: `d${p.key}`, line: `s${k}` })
	);
	const demo = demoDesign();
	return designWith(electrodes, {
		groups: [
			{
				id: 'digit',
				name: 'Digit',
				members: electrodes.map((e) => e.id),
				generator: { kind: generated.kind, params: generated.params }
			}
		],
		viewing: { distance_mm: options.distance_mm ?? demo.viewing.distance_mm }
	});
}

describe('design-rule check', () => {
	it('passes the demo with no failing or warning rule', () => {
		const report = checkDesignRules(demoDesign());
		expect(report.severity).toBe('pass');
		expect(report.findings.map((f) => f.code)).toContain('rule.ok');
	});

	it('fails an empty design instead of passing it', () => {
		const report = checkDesignRules(designWith([]));
		expect(report.severity).toBe('fail');
		expect(report.findings.map((f) => f.code)).toEqual(['rule.empty-design']);
	});

	it('reports overlapping electrodes as a short, naming both, and not separated ones', () => {
		const a = electrode(box(10, 10, 5, 5), { id: 'left' });
		const b = electrode(box(14, 10, 5, 5), { id: 'right' });
		const f = findingOf(designWith([a, b]), 'rule.overlap');
		expect(f?.severity).toBe('fail');
		expect(f?.electrodes).toEqual(['left', 'right']);
		expect(f?.message).toContain('5 mm²'.replace('5', '5.00'));
		expect(f?.location).toMatchObject({ x_mm: 10, y_mm: 10, width_mm: 9, height_mm: 5 });
		// Touching edge to edge is a short too; on the same crossing it only warns.
		const touching = electrode(box(15, 10, 5, 5));
		expect(codesOf(designWith([a, touching]))).toContain('rule.overlap');
		const twin = electrode(box(15, 10, 5, 5), { common: a.common!, line: a.line! });
		expect(findingOf(designWith([a, twin]), 'rule.overlap')?.severity).toBe('warn');
		const apart = electrode(box(15.1, 10, 5, 5));
		expect(codesOf(designWith([a, apart]))).not.toContain('rule.overlap');
	});

	it('measures the gap: 1 µm fails the 0.05 mm minimum, 0.06 mm passes', () => {
		const a = electrode(box(10, 10, 5, 5));
		const near = electrode(box(15.001, 10, 5, 5));
		const f = findingOf(designWith([a, near]), 'rule.min-gap');
		expect(f?.severity).toBe('fail');
		expect(f?.message).toContain('0.001 mm apart');
		// Diagonal neighbours: corner to corner 0.03·√2 ≈ 0.042 mm, still under the limit.
		const diagonal = electrode(box(15.03, 15.03, 2, 2));
		expect(codesOf(designWith([a, diagonal]))).toContain('rule.min-gap');
		const fine = electrode(box(15.06, 10, 5, 5));
		expect(codesOf(designWith([a, fine]))).not.toContain('rule.min-gap');
		const limit = designWith([a, electrode(box(15.002, 10, 5, 5))]);
		expect(codesOf({ ...limit, rules: { ...limit.rules, minGap_mm: 0.001 } })).not.toContain(
			'rule.min-gap'
		);
	});

	it('finds parts narrower than the minimum width: a 5 µm sliver and a thin neck', () => {
		const sliver = electrode(box(10, 10, 5, 0.005), { id: 'sliver' });
		const f = findingOf(designWith([sliver]), 'rule.min-width');
		expect(f?.electrodes).toEqual(['sliver']);
		expect(f?.message).toContain('everywhere');
		// Two pads joined by a 0.03 mm neck split when shrunk.
		const dumbbell = electrode(
			points(
				10,
				10,
				12,
				10,
				12,
				10.985,
				13,
				10.985,
				13,
				10,
				15,
				10,
				15,
				12,
				13,
				12,
				13,
				11.015,
				12,
				11.015,
				12,
				12,
				10,
				12
			)
		);
		expect(findingOf(designWith([dumbbell]), 'rule.min-width')?.message).toContain('split in 2');
		// Exactly the limit, a pointed bar and an annulus with 0.2 mm ring pass.
		const exact = electrode(box(10, 10, 5, 0.05));
		const pointed = electrode(
			points(10, 20, 10.75, 19.25, 14.25, 19.25, 15, 20, 14.25, 20.75, 10.75, 20.75)
		);
		const ring = electrode(box(30, 10, 4, 4), { holes: [box(30.2, 10.2, 3.6, 3.6)] });
		expect(codesOf(designWith([exact, pointed, ring]))).not.toContain('rule.min-width');
		const thinRing = electrode(box(30, 10, 4, 4), { holes: [box(30.02, 10.02, 3.96, 3.96)] });
		expect(codesOf(designWith([thinRing]))).toContain('rule.min-width');
	});

	it('reports a self-crossing outline where it crosses, without a crash or a wrong area', () => {
		const bowtie = electrode(points(10, 10, 12, 12, 12, 10, 10, 12), { id: 'bowtie' });
		const f = findingOf(designWith([bowtie]), 'rule.self-crossing');
		expect(f?.electrodes).toEqual(['bowtie']);
		expect(f?.message).toContain('(11.000, 11.000)');
		expect(f?.location?.x_mm).toBeCloseTo(10.5, 9);
		const simple = electrode(points(10, 10, 12, 10, 12, 12, 10, 12));
		expect(codesOf(designWith([simple]))).not.toContain('rule.self-crossing');
	});

	it('reports outlines that enclose no area', () => {
		const dot = electrode(points(10, 10, 10, 10, 10, 10), { id: 'dot' });
		const flat = electrode(points(20, 10, 21, 10, 22, 10), { id: 'flat' });
		const tiny = electrode(points(30, 10, 30.001, 10, 30, 10.001), { id: 'tiny' });
		const findings = checkDesignRules(designWith([dot, flat, tiny])).findings;
		const zero = findings.filter((f) => f.code === 'rule.zero-area').flatMap((f) => f.electrodes);
		expect(zero.sort()).toEqual(['dot', 'flat', 'tiny']);
		expect(codesOf(designWith([electrode(box(10, 10, 0.1, 0.1))]))).not.toContain('rule.zero-area');
	});

	it('places electrodes: off the glass, inside the margin, outside the viewing area', () => {
		const far = electrode(box(200, 10, 5, 5), { id: 'far' });
		const f = findingOf(designWith([far]), 'rule.outside-glass');
		expect(f?.severity).toBe('fail');
		expect(f?.message).toContain('139 mm beyond'); // 205 − 66
		const nearEdge = electrode(box(1, 10, 2, 2), { id: 'edge' });
		expect(findingOf(designWith([nearEdge]), 'rule.edge-margin')?.message).toContain(
			'1 mm from the glass edge'
		);
		const hidden = electrode(box(2, 10, 1.5, 2));
		const inMargin = designWith([hidden]);
		expect(codesOf(inMargin)).toContain('rule.outside-viewing-area');
		expect(codesOf(inMargin)).not.toContain('rule.edge-margin');
		expect(codesOf({ ...inMargin, rules: { ...inMargin.rules, edgeMargin_mm: 2.5 } })).toContain(
			'rule.edge-margin'
		);
		const inside = electrode(box(10, 10, 5, 5));
		const ok = codesOf(designWith([inside]));
		for (const code of ['rule.outside-glass', 'rule.edge-margin', 'rule.outside-viewing-area'])
			expect(ok).not.toContain(code);
	});

	it('warns about commons and lines no electrode uses', () => {
		const one = electrode(box(10, 10, 5, 5));
		const design = designWith([one]);
		expect(codesOf(design)).not.toContain('rule.unused-common');
		const extra = {
			...design,
			commons: [...design.commons, { id: 'com9', name: 'COM9' }],
			segmentLines: [...design.segmentLines, { id: 's99', name: 'S99' }]
		};
		const report = checkDesignRules(extra);
		expect(report.findings.find((f) => f.code === 'rule.unused-common')?.message).toContain('COM9');
		expect(report.findings.find((f) => f.code === 'rule.unused-line')?.message).toContain('S99');
	});

	it('judges character height against 16′ at the viewing distance (ISO 9241-3)', () => {
		// 16′ at 500 mm is 2.33 mm (physics-notes §8 table, from H = 2·D·tan(α/2)).
		const small = findingOf(
			digitDesign({ height_mm: 2.2, stroke_mm: 0.3, distance_mm: 500 }),
			'rule.character-small'
		);
		expect(small?.severity).toBe('fail');
		expect(small?.electrodes).toHaveLength(7);
		const big = checkDesignRules(digitDesign({ height_mm: 2.5, stroke_mm: 0.4, distance_mm: 500 }));
		expect(big.findings.map((f) => f.code)).toContain('rule.character-size-ok');
		expect(big.severity).toBe('pass');
	});

	it('warns about thin strokes, measuring the stroke as the bar width', () => {
		// 0.3 mm at 600 mm is 1.7′, under the 2.5′ default; 1.5 mm is 8.6′.
		const thin = findingOf(digitDesign({ height_mm: 12, stroke_mm: 0.3 }), 'rule.stroke-thin');
		expect(thin?.severity).toBe('warn');
		expect(thin?.message).toMatch(/stroke 0\.(29|3)\d* mm/);
		const ok = findingOf(digitDesign({ height_mm: 12, stroke_mm: 1.5 }), 'rule.character-size-ok');
		expect(ok?.message).toMatch(/stroke 1\.(49|5)\d* mm/);
	});

	it('never throws on degenerate input and reports every code it knows', () => {
		const odd = [
			electrode(points(0, 0, 0, 0, 0, 0)),
			electrode(points(1e3, 1e3, 1e3 + 1, 1e3, 1e3, 1e3 + 1)),
			electrode(points(-5, -5, 5, 5, 5, -5, -5, 5, 0, 0))
		];
		expect(() => checkDesignRules(designWith(odd))).not.toThrow();
		for (const f of checkDesignRules(designWith(odd)).findings) {
			expect(isKnownFindingCode(f.code), f.code).toBe(true);
			expect(f.fix === '' ? f.severity : 'has fix').not.toBe('fail');
		}
	});
});
