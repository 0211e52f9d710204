/**
 * Pin layout and the pin CSV on a crafted design whose wiring and positions are worked out by hand
 * below: 2 commons and 3 segment lines on a 60 mm wide glass, pitch 1 mm, so 5 pads take 5 mm and
 * the row, centred, starts half a pitch after (60 − 5)/2 = 27.5 mm, at 28 mm.
 */
import { describe, expect, it } from 'vitest';
import type { Design } from '../../src/lib/core/design/schema';
import { pinLayout } from '../../src/lib/core/wiring/pin-layout';
import { pinCsv } from '../../src/lib/core/wiring/pin-csv';
import { pinMap } from '../../src/lib/core/drive/pin-map';
import { analyzeWiring } from '../../src/lib/core/drive/analyze-drive';
import { electrode, emptyDesign, square } from '../commands/fixtures';
import { parseCsv } from './csv-parse';

function crafted(order: Design['pinout']['order'] = 'commons-first'): Design {
	return {
		...emptyDesign(),
		commons: [
			{ id: 'c1', name: 'COM1' },
			{ id: 'c2', name: 'COM2' }
		],
		segmentLines: [
			{ id: 's1', name: 'SEG1' },
			{ id: 's2', name: 'SEG2' },
			{ id: 's3', name: 'SEG3' }
		],
		electrodes: [
			electrode('p', square(0, 0), { name: 'Top, left', common: 'c1', line: 's1' }),
			electrode('q', square(4, 0), { name: 'Q "mid"', common: 'c2', line: 's1' }),
			electrode('r', square(8, 0), { name: 'R', common: 'c1', line: 's3' }),
			electrode('s', square(12, 0), { name: 'S', common: 'c1', line: 's3' })
		],
		pinout: { edge: 'bottom', order, pitch_mm: 1 }
	};
}

describe('pin layout', () => {
	it('numbers pins along the edge in the chosen order', () => {
		const labels = (order: Design['pinout']['order']) =>
			pinLayout(crafted(order)).pins.map((p) => p.label);
		expect(labels('commons-first')).toEqual(['COM1', 'COM2', 'SEG1', 'SEG2', 'SEG3']);
		expect(labels('commons-last')).toEqual(['SEG1', 'SEG2', 'SEG3', 'COM1', 'COM2']);
		expect(labels('commons-split')).toEqual(['COM1', 'SEG1', 'SEG2', 'SEG3', 'COM2']);
	});

	it('centres the row on the edge at the pitch', () => {
		const layout = pinLayout(crafted());
		expect(layout.pins.map((p) => p.x_mm)).toEqual([28, 29, 30, 31, 32]);
		expect(layout.pins.every((p) => p.y_mm === 40)).toBe(true);
		const left = pinLayout({
			...crafted(),
			pinout: { edge: 'left', order: 'commons-first', pitch_mm: 2 }
		});
		// 40 mm edge, 5 pads × 2 mm = 10 mm: first centre at 15 + 1 = 16 mm.
		expect(left.pins.map((p) => p.y_mm)).toEqual([16, 18, 20, 22, 24]);
		expect(left.pins.every((p) => p.x_mm === 0)).toBe(true);
	});

	it('reports pins that do not fit the edge as a failing finding', () => {
		const tight: Design = {
			...crafted(),
			pinout: { edge: 'left', order: 'commons-first', pitch_mm: 8.5 }
		};
		// 5 × 8.5 mm = 42.5 mm > 40 mm.
		expect(pinLayout(tight).fits).toBe(false);
		const codes = analyzeWiring(tight).findings.map((f) => [f.code, f.severity]);
		expect(codes).toContainEqual(['wiring.pins-do-not-fit', 'fail']);
		const fits: Design = { ...tight, pinout: { ...tight.pinout, pitch_mm: 8 } };
		expect(analyzeWiring(fits).findings.map((f) => f.code)).not.toContain('wiring.pins-do-not-fit');
	});
});

describe('pin CSV', () => {
	it('parses back to one row per pin with the electrode at each common', () => {
		const rows = parseCsv(pinCsv(crafted()));
		expect(rows[0]).toEqual(['pin', 'function', 'name', 'position_mm', 'at COM1', 'at COM2']);
		expect(rows.slice(1)).toEqual([
			['1', 'COM1', 'COM1', '28.000', '', ''],
			['2', 'COM2', 'COM2', '29.000', '', ''],
			['3', 'SEG1', 'SEG1', '30.000', 'Top, left', 'Q "mid"'],
			['4', 'SEG2', 'SEG2', '31.000', '', ''],
			['5', 'SEG3', 'SEG3', '32.000', 'R + S', '']
		]);
	});
});

describe('pin map conflicts (kept working)', () => {
	it('names the doubled crossing by names and ids', () => {
		const map = pinMap(crafted());
		expect(map.conflicts).toEqual([
			{ common: 'COM1', line: 'SEG3', electrodes: ['R', 'S'], electrodeIds: ['r', 's'] }
		]);
		const shared = analyzeWiring(crafted()).findings.find(
			(f) => f.code === 'wiring.shared-crossing'
		);
		expect(shared?.electrodes).toEqual(['r', 's']);
	});
});
