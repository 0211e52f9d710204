import { expect, test } from '@playwright/test';
import { openApp } from './ready';

test('the load tab shows current, battery life, per-pin tables and plots; a budget fails', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('view-load').click();
	await expect(page.getByTestId('load-current')).toContainText('µA');
	await expect(page.getByTestId('load-lines').locator('tbody tr')).toHaveCount(14);
	await expect(page.getByTestId('load-commons').locator('tbody tr')).toHaveCount(4);
	await expect(page.getByTestId('load-plot-temperature').locator('svg')).toBeVisible();
	await expect(page.getByTestId('load-plot-frame-rate').locator('svg')).toBeVisible();
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
