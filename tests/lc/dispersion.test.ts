import { describe, it } from 'vitest';
import { cauchyIndex } from '../../src/lib/core/lc/dispersion';
import {
	CYANOBIPHENYL_EUTECTIC_HIGH_DN,
	CYANOBIPHENYL_SINGLE,
	CYCLOHEXYL_LOW_DN
} from '../../src/lib/core/lc/presets';
import { indicesAt } from '../../src/lib/core/lc/temperature';
import { expectReference, type ReferenceRow } from './reference';

// Consistency check: the extended Cauchy coefficients published by Li, Wen, Gauza, Lu & Wu,
// J. Display Technol. 1:51 (2005), evaluated by hand at 25 °C and rounded to 1e-4. It checks our
// transcription of the published coefficients and their evaluation, not the fit to measurement.
const TABLE: [string, typeof CYANOBIPHENYL_SINGLE, number, number, number, number][] = [
	['E7', CYANOBIPHENYL_EUTECTIC_HIGH_DN, 450, 1.8001, 1.5419, 0.2582],
	['E7', CYANOBIPHENYL_EUTECTIC_HIGH_DN, 550, 1.7497, 1.5261, 0.2236],
	['E7', CYANOBIPHENYL_EUTECTIC_HIGH_DN, 589.3, 1.739, 1.5222, 0.2168],
	['E7', CYANOBIPHENYL_EUTECTIC_HIGH_DN, 632.8, 1.7302, 1.5189, 0.2114],
	['5CB', CYANOBIPHENYL_SINGLE, 550, 1.7238, 1.5398, 0.184],
	['5CB', CYANOBIPHENYL_SINGLE, 589.3, 1.714, 1.5355, 0.1785],
	['5PCH', CYCLOHEXYL_LOW_DN, 589.3, 1.6036, 1.4876, 0.116]
];

describe('extended Cauchy dispersion', () => {
	it('evaluates the Li et al. (2005) coefficients as by hand, to 1e-4 (index units)', () => {
		const rows: ReferenceRow[] = [];
		for (const [name, material, wavelength_nm, ne, no, dn] of TABLE) {
			const at = `${name} ${wavelength_nm} nm`;
			const computed = indicesAt({ material, temperature_C: 25, wavelength_nm });
			rows.push({ name: `n_e ${at}`, actual: computed.ne, expected: ne });
			rows.push({ name: `n_o ${at}`, actual: computed.no, expected: no });
			rows.push({ name: `Δn ${at}`, actual: computed.ne - computed.no, expected: dn });
			rows.push({
				name: `raw n_e ${at}`,
				actual: cauchyIndex(material.extraordinary, wavelength_nm),
				expected: ne
			});
		}
		expectReference({
			label: 'Cauchy indices',
			source:
				'Cauchy coefficients of Li, Wen, Gauza, Lu & Wu, J. Display Technol. 1:51 (2005), by hand',
			unit: '(index)',
			tolerance: 1e-4,
			rows
		});
	});
});
