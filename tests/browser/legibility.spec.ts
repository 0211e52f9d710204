import { expect, test } from '@playwright/test';
import { openApp } from './ready';
import { readPlot } from './plot-reading';

test('type a reading, switch scenarios: the preview and the verdict follow', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-legibility').click();
	const preview = page.getByTestId('reading-preview');
	await expect(preview).toBeVisible({ timeout: 30_000 });

	// "12:34" with six bars and five icons lit
	const litBefore = Number(await preview.getAttribute('data-lit'));
	await page.getByTestId('reading-text').fill('88:88');
	await expect(preview).not.toHaveAttribute('data-lit', String(litBefore));
	// 4 × 7 segments + 2 colon dots + 6 bars + 5 icons
	await expect(preview).toHaveAttribute('data-lit', String(28 + 2 + 6 + 5));

	// from the dim room to direct sun: other colours, another verdict line
	const verdict = page.getByTestId('picked-verdict');
	await expect(verdict).toContainText('Dim room');
	const dimOn = await preview.getAttribute('data-on');
	await page.getByTestId('scenario-row').filter({ hasText: 'Direct sun' }).click();
	await expect(verdict).toContainText('Direct sun');
	await expect(verdict).toContainText('glare');
	await expect(preview).not.toHaveAttribute('data-on', dimOn!);

	// reading from 5 m: the digits become too small for the distance
	await page.getByTestId('scenario-distance').fill('5000');
	await page.getByTestId('scenario-distance').press('Enter');
	await expect(verdict).toContainText('not readable');
	await expect(verdict).toContainText('too small for the distance');
	await expect(page.getByTestId('legibility-verdict')).toContainText('legibility.too-small');
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');
	// The map marks the picked scenario (red) at its light and its new 5 m distance, and the map
	// cell under it is faded (not readable), agreeing with the verdict.
	const map = await readPlot(page.getByTestId('legibility-map'), { xLog: true, yLog: true });
	const pickedDot = map.dots.find((d) => d.fill === '#d33')!;
	expect(pickedDot).toBeDefined();
	expect(map.dots.length).toBeGreaterThanOrEqual(3);
	const sunLux = Number(await page.getByTestId('scenario-illuminance').inputValue());
	expect(map.xValue(pickedDot.cx) / sunLux).toBeCloseTo(1, 1);
	expect(map.yValue(pickedDot.cy) / 5000).toBeCloseTo(1, 1);
	const under = map.rects.find(
		(r) =>
			pickedDot.cx >= r.x &&
			pickedDot.cx <= r.x + r.width &&
			pickedDot.cy >= r.y &&
			pickedDot.cy <= r.y + r.height
	)!;
	expect(under.opacity).toBeLessThan(1);
	await expect(page.locator('body')).not.toContainText('NaN');
});

test('a safety-relevant readout carries the caution', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-legibility').click();
	await expect(page.getByTestId('reading-preview')).toBeVisible({ timeout: 30_000 });
	await page.getByTestId('safety-relevant').check();
	await expect(page.getByTestId('safety-caution')).toContainText('measured samples');
	await expect(page.getByTestId('legibility-verdict')).toContainText('legibility.safety-caution');
});
