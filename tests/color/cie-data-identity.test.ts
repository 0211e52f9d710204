/*
 * The embedded CIE tables (src/lib/core/color/data) equal Debian's colord-data copy exactly,
 * value for value, where that package is installed. The files are parsed here independently
 * of scripts/import-cie-tables.ts, so a parser fault in the importer shows up.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CIE1931_2DEG_CMF } from '../../src/lib/core/color/data/cie1931-2deg';
import { CIE1964_10DEG_CMF } from '../../src/lib/core/color/data/cie1964-10deg';
import { DAYLIGHT_BASIS } from '../../src/lib/core/color/data/daylight-basis';
import { CIE_F11, CIE_F2 } from '../../src/lib/core/color/data/fluorescent-f2-f11';
import {
	CIE_A_TABLE,
	CIE_D50_TABLE,
	CIE_D65_TABLE,
	CIE_E_TABLE
} from '../../src/lib/core/color/data/standard-illuminant-tables';
import type { TableSource } from '../../src/lib/core/color/data/table-types';

const COLORD_DIR = process.env.COLORD_DATA_DIR ?? '/usr/share/colord';
const hasColord = existsSync(COLORD_DIR);
/** In CI the reference data must be there: a missing copy fails instead of skipping. */
const mustCompare = process.env.CI === 'true' || process.env.CI === '1';
const skipNote = hasColord ? '' : ` [SKIPPED: ${COLORD_DIR} not found; install Debian colord-data]`;
/**
 * Values in the embedded tables, counted from their published grids: two observers at 360–830 nm
 * in 5 nm steps, 3 functions each (2 × 95 × 3 = 570); the daylight basis S0, S1, S2 at 300–830 nm
 * (3 × 107 = 321); A at 300–830 nm in 1 nm steps (531); D65 at 300–830 nm (107); F2, F11 and D50
 * at 380–780 nm (3 × 81 = 243); E at 380–830 nm (91). Total 1863.
 */
const EXPECTED_VALUE_COUNT = 1863;
let totalCompared = 0;

interface EmbeddedTable {
	readonly name: string;
	readonly source: TableSource;
	readonly start_nm: number;
	readonly step_nm: number;
	readonly rows: readonly (readonly number[])[];
}

const cmf = (name: string, t: typeof CIE1931_2DEG_CMF): EmbeddedTable => ({
	name,
	...t,
	rows: [t.xBar, t.yBar, t.zBar]
});
const spd = (name: string, t: typeof CIE_F2): EmbeddedTable => ({ name, ...t, rows: [t.values] });

const TABLES: EmbeddedTable[] = [
	cmf('CIE 1931 2°', CIE1931_2DEG_CMF),
	cmf('CIE 1964 10°', CIE1964_10DEG_CMF),
	{
		name: 'daylight basis',
		...DAYLIGHT_BASIS,
		rows: [DAYLIGHT_BASIS.s0, DAYLIGHT_BASIS.s1, DAYLIGHT_BASIS.s2]
	},
	spd('F2', CIE_F2),
	spd('F11', CIE_F11),
	spd('A', CIE_A_TABLE),
	spd('D50', CIE_D50_TABLE),
	spd('D65', CIE_D65_TABLE),
	spd('E', CIE_E_TABLE)
];

/** Minimal reading of a colord spectral file: grid header and the rows between BEGIN_DATA/END_DATA. */
function readColordFile(file: string) {
	const text = readFileSync(join(COLORD_DIR, file), 'utf8');
	const header = (key: string) => Number(new RegExp(`^${key}\\s+(\\S+)`, 'm').exec(text)?.[1]);
	const start_nm = header('SPECTRAL_START_NM');
	const bands = header('SPECTRAL_BANDS');
	const step_nm = (header('SPECTRAL_END_NM') - start_nm) / (bands - 1);
	const data = /^BEGIN_DATA$([\s\S]*?)^END_DATA$/m.exec(text)?.[1] ?? '';
	const rows = data
		.trim()
		.split('\n')
		.map((line) => line.trim().split(/\s+/).map(Number));
	return { start_nm, step_nm, bands, rows };
}

describe('embedded CIE tables equal Debian colord-data', () => {
	for (const table of TABLES) {
		it.skipIf(!hasColord && !mustCompare)(`${table.name} (${table.source.file})${skipNote}`, () => {
			expect(hasColord, `${COLORD_DIR} is missing: install Debian colord-data`).toBe(true);
			const debian = readColordFile(table.source.file);
			expect(table.start_nm).toBe(debian.start_nm);
			expect(table.step_nm).toBe(debian.step_nm);
			expect(table.rows.length).toBe(debian.rows.length);
			let compared = 0;
			table.rows.forEach((row, r) => {
				expect(row.length, `row ${r} length`).toBe(debian.bands);
				row.forEach((value, i) => {
					// Exact identity is the point of this test: the tables are copies.
					if (value !== debian.rows[r][i])
						expect.fail(
							`${table.name} row ${r} at ${table.start_nm + i * table.step_nm} nm: ` +
								`embedded ${value}, Debian ${debian.rows[r][i]}`
						);
					compared++;
				});
			});
			totalCompared += compared;
			console.log(
				`${table.name}: ${compared} values identical to ${join(COLORD_DIR, table.source.file)}`
			);
		});
	}
	it.skipIf(!hasColord && !mustCompare)('compares every embedded value', () => {
		expect(totalCompared).toBe(EXPECTED_VALUE_COUNT);
	});
});

describe('embedded CIE tables cover their published grids', () => {
	const grid = (t: EmbeddedTable) => [
		t.start_nm,
		t.start_nm + (t.rows[0].length - 1) * t.step_nm,
		t.step_nm
	];
	it('observers: 360–830 nm at 5 nm; daylight basis 300–830 nm at 5 nm (CIE 15:2004)', () => {
		expect(grid(TABLES[0])).toEqual([360, 830, 5]);
		expect(grid(TABLES[1])).toEqual([360, 830, 5]);
		expect(grid(TABLES[2])).toEqual([300, 830, 5]);
	});
	it('A at 1 nm and D65 at 5 nm over 300–830 nm; F2, F11, D50 over 380–780 nm', () => {
		expect(grid(spd('A', CIE_A_TABLE))).toEqual([300, 830, 1]);
		expect(grid(spd('D65', CIE_D65_TABLE))).toEqual([300, 830, 5]);
		for (const t of [CIE_F2, CIE_F11, CIE_D50_TABLE])
			expect(grid(spd('', t))).toEqual([380, 780, 5]);
	});
	it('every row of a table has the same length', () => {
		for (const t of TABLES) for (const row of t.rows) expect(row.length).toBe(t.rows[0].length);
	});
});
