import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { DESIGN_MIGRATIONS } from '../../src/lib/core/design/migrations';
import { DEFAULT_GLASS_ART } from '../../src/lib/core/design/glass-art-schema';
import { parseDesignValue, serializeDesign } from '../../src/lib/core/design/parse-design';
import { DESIGN_VERSION } from '../../src/lib/core/design/schema';

/** A version-3 document: everything of today's design except the glass drawing. */
function asVersion3(): Record<string, unknown> {
	const doc = JSON.parse(serializeDesign(demoDesign()));
	doc.version = 3;
	delete doc.glassArt;
	return doc;
}

describe('design document version 6 (glass drawing)', () => {
	it('lifts a version-3 file with the default glass drawing and changes nothing else', () => {
		const v3 = asVersion3();
		const result = parseDesignValue(v3);
		expect(result.ok).toBe(true);
		if (!result.ok) return;
		expect(result.design.version).toBe(DESIGN_VERSION);
		expect(result.design.glassArt).toEqual(DEFAULT_GLASS_ART);
		const { glassArt: _added, version: _v, ...rest } = result.design;
		const { version: _v3, ...before } = v3;
		expect(rest).toEqual(before);
	});

	it('the step keeps a glass drawing already present and gives each document its own copy', () => {
		const a = DESIGN_MIGRATIONS[5]({ format: 'sunglyph-design', version: 5 });
		const b = DESIGN_MIGRATIONS[5]({ format: 'sunglyph-design', version: 5 });
		expect(a.glassArt).toEqual(DEFAULT_GLASS_ART);
		expect(a.glassArt).not.toBe(b.glassArt);
		const own = { ...DEFAULT_GLASS_ART, traceWidth_mm: 0.2 };
		expect(DESIGN_MIGRATIONS[5]({ glassArt: own }).glassArt).toBe(own);
	});

	it('names the path of a bad glass field', () => {
		const doc = JSON.parse(serializeDesign(demoDesign()));
		doc.glassArt.seal.width_mm = -1;
		doc.glassArt.traces = [{ id: 't', plate: 'segment', net: 'seg1', width_mm: 0.1, points: [] }];
		const result = parseDesignValue(doc);
		expect(result.ok ? [] : result.issues.map((i) => i.path).sort()).toEqual([
			'glassArt.seal.width_mm',
			'glassArt.traces[0].points'
		]);
	});
});
