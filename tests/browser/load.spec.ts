import { expect, test } from '@playwright/test';
import { openApp } from './ready';
import { readPlot } from './plot-reading';

test('the load tab shows current, battery life, per-pin tables and plots; a budget fails', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('view-load').click();
	await expect(page.getByTestId('load-current')).toContainText('µA');
	// 29 segment lines: 8 for the digits, one each for the 21 icons, bar steps and dots.
	await expect(page.getByTestId('load-lines').locator('tbody tr')).toHaveCount(29);
	await expect(page.getByTestId('load-commons').locator('tbody tr')).toHaveCount(4);
	// One line per pattern (all on, a typical reading, all off). The reading's line passes
	// through the figure shown above the plots: the current at the checked temperature and at
	// the design's 64 Hz frame rate (to 0.05 µA of the axis reading).
	const shown_uA = Number.parseFloat((await page.getByTestId('load-current').textContent())!);
	expect(shown_uA).toBeGreaterThan(0);
	const READING = '#2f6f9f';
	const ALL_ON = '#1d1f1a';
	const ALL_OFF = '#8a4fa0';
	for (const [testid, at] of [
		['load-plot-temperature', 25],
		['load-plot-frame-rate', 64]
	] as const) {
		const plot = await readPlot(page.getByTestId(testid));
		const line = (stroke: string) => plot.lines.find((l) => l.stroke === stroke)!;
		expect(plot.lines.map((l) => l.stroke).sort()).toEqual([ALL_ON, ALL_OFF, READING].sort());
		const reading_uA = plot.lineValueAt(line(READING), at);
		expect(Math.abs(reading_uA - shown_uA), testid).toBeLessThan(0.05);
		// More segments switching means more charge moved each frame (½·C·ΔV² per step).
		expect(plot.lineValueAt(line(ALL_ON), at)).toBeGreaterThan(reading_uA);
		expect(plot.lineValueAt(line(ALL_OFF), at)).toBeLessThan(reading_uA);
	}
	// Dynamic current grows with frame rate (I ∝ C·V·f): the reading's line rises to the right.
	const byRate = await readPlot(page.getByTestId('load-plot-frame-rate'));
	const rates = byRate.lines
		.find((l) => l.stroke === READING)!
		.points.map(([px, py]) => [byRate.xValue(px), byRate.yValue(py)])
		.sort((a, b) => a[0] - b[0]);
	expect(rates[rates.length - 1][1]).toBeGreaterThan(rates[0][1]);
	await expect(page.getByTestId('battery-life')).toHaveText('—');
	await page.getByTestId('battery-input').fill('220');
	await page.getByTestId('battery-input').press('Enter');
	await expect(page.getByTestId('battery-life')).toContainText('years');
	// Load settings are part of the design: undo takes the edit back.
	await page.getByRole('button', { name: 'Undo' }).click();
	await expect(page.getByTestId('battery-life')).not.toContainText('years');
	await page.getByTestId('battery-input').fill('220');
	await page.getByTestId('battery-input').press('Enter');
	await expect(page.getByTestId('battery-life')).toContainText('years');
	await page.getByTestId('budget-input').fill('1');
	await page.getByTestId('budget-input').press('Enter');
	await expect(page.getByTestId('load-verdict')).toContainText('over the 1 µA budget');
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');
	await page.getByTestId('load-pattern').selectOption('all-off');
	await expect(page.getByTestId('load-verdict').locator('[data-code]').first()).toHaveAttribute(
		'data-code',
		'load.current-over-budget'
	);
	await page.getByTestId('budget-input').fill('0');
	await page.getByTestId('budget-input').press('Enter');
	await expect(page.getByTestId('load-verdict')).toContainText('The display draws');
	// A long hair-thin ITO trace: 100 Ω/□ × 1000 mm / 0.001 mm = 100 MΩ cannot settle in its slot.
	await page.getByTestId('add-trace').click();
	await expect(page.getByTestId('trace-result-0')).toContainText('10000 Ω');
	await page.getByTestId('trace-length-0').fill('1000');
	await page.getByTestId('trace-length-0').press('Enter');
	await page.getByTestId('trace-width-0').fill('0.001');
	await page.getByTestId('trace-width-0').press('Enter');
	await expect(page.getByTestId('trace-result-0')).toContainText('100000000 Ω');
	await expect(
		page.getByTestId('load-verdict').locator('[data-code="load.rc-too-slow"]')
	).toBeVisible();
});
