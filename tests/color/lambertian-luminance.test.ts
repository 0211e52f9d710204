/* Luminance of a Lambertian reflector, L = ρ·E/π. */
import { describe, expect, it } from 'vitest';
import { lambertianLuminance_cdm2 } from '../../src/lib/core/color/lambertian-luminance';
import { expectWithinReference } from './reference-check';

const L = (reflectance: number, illuminance_lx: number) =>
	lambertianLuminance_cdm2({ reflectance, illuminance_lx });

describe('lambertianLuminance_cdm2', () => {
	it('a perfect diffuser under 1 lx has 1/π cd/m², the apostilb (CIE S 017 ILV)', () => {
		// The apostilb, an old unit of luminance, is defined as the luminance of a perfect
		// diffuser illuminated with 1 lx: 1 asb = 1/π cd/m² = 0.318310 cd/m² (CIE S 017:2011, ILV).
		expectWithinReference({
			quantity: 'luminance of a perfect diffuser under 1 lx',
			unit: 'cd/m²',
			tolerance: 1e-6,
			source: 'CIE S 017:2011 (ILV), apostilb',
			rows: [{ label: '1 lx, ρ = 1', computed: L(1, 1), published: 0.31831 }]
		});
	});

	it('equals ρ·E/π evaluated by hand (consistency check, half a unit in the last kept digit)', () => {
		const source = 'L = ρE/π evaluated by hand (consistency check)';
		expectWithinReference({
			quantity: 'luminance, office to indoor',
			unit: 'cd/m²',
			tolerance: 5e-3,
			source,
			rows: [
				{ label: '500 lx, ρ = 0.25', computed: L(0.25, 500), published: 39.79 },
				{ label: '500 lx, ρ = 1', computed: L(1, 500), published: 159.15 }
			]
		});
		expectWithinReference({
			quantity: 'luminance, daylight to sun',
			unit: 'cd/m²',
			tolerance: 5e-2,
			source,
			rows: [
				{ label: '10 000 lx, ρ = 0.25', computed: L(0.25, 10000), published: 795.8 },
				{ label: '10 000 lx, ρ = 1', computed: L(1, 10000), published: 3183.1 },
				{ label: '100 000 lx, ρ = 0.25', computed: L(0.25, 100000), published: 7957.7 }
			]
		});
		expectWithinReference({
			quantity: 'luminance, direct sun',
			unit: 'cd/m²',
			tolerance: 0.5,
			source,
			rows: [{ label: '100 000 lx, ρ = 1', computed: L(1, 100000), published: 31831 }]
		});
	});

	it('refuses negative or non-numeric inputs', () => {
		expect(() => L(-0.1, 500)).toThrow(/Reflectance/);
		expect(() => L(0.5, -1)).toThrow(/Illuminance/);
		expect(() => L(NaN, 500)).toThrow(/Reflectance/);
	});
});
