import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { DESIGN_MIGRATIONS } from '../../src/lib/core/design/migrations';
import { DESIGN_VERSION } from '../../src/lib/core/design/schema';
import { parseDesignValue, serializeDesign } from '../../src/lib/core/design/parse-design';
import {
	DEFAULT_ORIENTATION,
	REAR_GLASS_CHOICES_mm
} from '../../src/lib/core/design/orientation-schema';

/** The demo as a version-4 file: everything but the orientation section. */
function asVersion4(): Record<string, unknown> {
	const doc = JSON.parse(serializeDesign(demoDesign()));
	doc.version = 4;
	delete doc.orientation;
	delete doc.glassArt;
	return doc;
}

describe('design document version 5: cell orientation', () => {
	it('lifts a version-4 file with the default orientation and changes nothing else', () => {
		const v4 = asVersion4();
		const step = DESIGN_MIGRATIONS[4](structuredClone(v4));
		expect(step.orientation).toEqual(DEFAULT_ORIENTATION);
		const { orientation: _added, ...rest } = step;
		expect(rest).toEqual(v4);
		const result = parseDesignValue(v4);
		expect(result.ok).toBe(true);
		if (result.ok) {
			expect(result.design.version).toBe(DESIGN_VERSION);
			const { orientation, version: _v, glassArt: _g, ...others } = result.design;
			expect(orientation).toEqual(DEFAULT_ORIENTATION);
			const { orientation: _o, version: _w, glassArt: _h, ...demoOthers } = demoDesign();
			expect(others).toEqual(demoOthers);
		}
	});

	it('keeps an orientation already present', () => {
		const v4 = asVersion4();
		const own = { ...DEFAULT_ORIENTATION, rearGlass_mm: 0.4, twistSense: 'left-handed' };
		expect(DESIGN_MIGRATIONS[4]({ ...v4, orientation: own }).orientation).toEqual(own);
	});

	it('lifts a version-3 file through the step reserved for version 4', () => {
		const v3 = asVersion4();
		v3.version = 3;
		const result = parseDesignValue(v3);
		expect(result.ok).toBe(true);
		if (result.ok) expect(result.design.orientation).toEqual(DEFAULT_ORIENTATION);
	});

	it('names the field of a bad orientation', () => {
		const doc = JSON.parse(serializeDesign(demoDesign()));
		doc.orientation.rearGlass_mm = 9;
		doc.orientation.frontRubbing_deg = 360;
		const result = parseDesignValue(doc);
		expect(result.ok ? [] : result.issues.map((i) => i.path).sort()).toEqual([
			'orientation.frontRubbing_deg',
			'orientation.rearGlass_mm'
		]);
	});

	it('offers the usual rear-glass thicknesses, all valid', () => {
		// 0.4–1.1 mm soda-lime rear glass [common practice]
		expect(REAR_GLASS_CHOICES_mm[0]).toBe(0.4);
		expect(REAR_GLASS_CHOICES_mm[REAR_GLASS_CHOICES_mm.length - 1]).toBe(1.1);
		for (const rearGlass_mm of REAR_GLASS_CHOICES_mm) {
			const doc = JSON.parse(serializeDesign(demoDesign()));
			doc.orientation.rearGlass_mm = rearGlass_mm;
			expect(parseDesignValue(doc).ok).toBe(true);
		}
	});
});
