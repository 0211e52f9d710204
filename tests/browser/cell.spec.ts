import { expect, test } from '@playwright/test';
import { openApp } from './ready';
import { readPlot } from './plot-reading';
import { analyzeCell } from '../../src/lib/core/cell/analyze-cell';
import { demoFromFile } from './demo-file';

test('the cell panel draws the predicted curves where the cell model puts them', async ({
	page
}) => {
	// The UI must show what the core cell model computes for the demo (the model itself is checked
	// against published values in tests/lc and tests/optics); here the check is that each plot
	// draws those numbers in the right place.
	const demo = demoFromFile();
	const expected = analyzeCell(demo);
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });

	const spectra = await readPlot(page.getByTestId('spectra-plot'));
	// Background, off and on states, each over the whole visible grid.
	expect(spectra.lines).toHaveLength(3);
	for (const line of spectra.lines) expect(line.vertices).toBeGreaterThan(30);
	expect(spectra.xTicks).toEqual(expect.arrayContaining([400, 500, 600, 700]));

	const eo = await readPlot(page.getByTestId('eo-plot'));
	expect(eo.lines).toHaveLength(expected.curves.length);
	// V10 and V90 at each temperature are drawn as dots at the model's voltages (±0.03 V, about
	// three pixels at this size).
	// Each dot also sits at 10 % / 90 % of the way from the curve's zero-volt level to saturation.
	const model = expected.curves.flatMap((c) => [
		{ v: c.v10_V, Y: c.Y0 - 0.1 * (c.Y0 - c.Ysat) },
		{ v: c.v90_V, Y: c.Y0 - 0.9 * (c.Y0 - c.Ysat) }
	]);
	expect(eo.dots).toHaveLength(model.length);
	for (const dot of eo.dots) {
		const v = eo.xValue(dot.cx);
		const Y = eo.yValue(dot.cy);
		const nearest = model.reduce((a, b) => (Math.abs(b.v - v) < Math.abs(a.v - v) ? b : a));
		expect(Math.abs(v - nearest.v), `dot at ${v.toFixed(3)} V`).toBeLessThan(0.03);
		expect(Math.abs(Y - nearest.Y), `dot at ${v.toFixed(3)} V`).toBeLessThan(0.3);
	}

	const response = page.getByTestId('response-plot');
	await expect(response.locator('g[aria-label="line"] path').first()).toBeVisible();

	// A thicker gap moves the cell off its first transmission minimum (Gooch & Tarry, J. Phys. D
	// 8, 1575, 1975): more leakage in the bright state, so the contrast falls — to the value the
	// model gives for 7 µm.
	const before = Number.parseFloat((await page.getByTestId('contrast-ratio').textContent())!);
	expect(before).toBeCloseTo(expected.contrastRatio, 2);
	const thicker = analyzeCell({ ...demo, cell: { ...demo.cell, gap_um: 7 } });
	expect(thicker.contrastRatio).toBeLessThan(expected.contrastRatio);
	await page.getByTestId('gap-input').fill('7');
	await page.getByTestId('gap-input').press('Enter');
	await expect(page.getByTestId('contrast-ratio')).toHaveText(
		`${thicker.contrastRatio.toFixed(2)} : 1`,
		{ timeout: 20_000 }
	);
	await expect(page.locator('body')).not.toContainText('NaN');
});

test('a bad cell value is refused with a reason and nothing breaks', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await page.getByTestId('gap-input').fill('-2');
	await page.getByTestId('gap-input').press('Enter');
	await expect(page.getByText('at least 0.5')).toBeVisible();
	await page.getByTestId('gap-input').fill('abc');
	await page.getByTestId('gap-input').press('Enter');
	await expect(page.getByText('"abc" is not a number')).toBeVisible();
	await expect(page.getByTestId('cell-results')).toBeVisible();
	await expect(page.locator('body')).not.toContainText('NaN');
});

test('the drive check follows the cell model over temperature', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await page.getByTestId('view-drive').click();
	await expect(page.getByTestId('drive-verdict')).toContainText(
		'switches cleanly from 0 °C to 40 °C'
	);
	await page.getByTestId('tmin-input').fill('-30');
	await page.getByTestId('tmin-input').press('Enter');
	// The cell model's V90 rises in the cold, eating into the on-segment margin.
	await expect(page.getByTestId('drive-verdict')).toContainText('from -30 °C to 40 °C', {
		timeout: 20_000
	});
	await expect(page.getByTestId('drive-verdict')).toContainText('little room');
});

test('a fluid that clears inside the operating range fails clearly, and undo restores it', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await page.getByTestId('fluid-select').selectOption('cyanobiphenyl-single');
	await expect(page.getByTestId('cell-verdict')).toContainText(
		'below the hottest operating temperature 40 °C',
		{ timeout: 20_000 }
	);
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');
	await page.keyboard.press('Control+z');
	await expect(page.getByTestId('fluid-select')).toHaveValue('generic-reflective-tn');
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await expect(page.getByTestId('overall')).not.toHaveText('Fails checks');
});
