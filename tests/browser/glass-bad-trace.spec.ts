/**
 * A design file whose glass drawing holds a lead far off the glass (a point at 1e300 mm) and one
 * that runs past the glass's edge opens without breaking the page: the glass panel names both
 * leads, and the canvas draws the plates and leads with the page still working. Likewise a
 * transfer point far off the glass: named, and drawn around.
 */
import { expect, test } from '@playwright/test';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import { planGlass } from '../../src/lib/core/glass/plan-glass';
import { demoFromFile } from './demo-file';

function badTraceDesign(): string {
	const demo = demoFromFile();
	const glassArt = planGlass(demo).glassArt;
	const line = demo.segmentLines[0].id;
	const { width_mm: W, height_mm: H } = demo.glass;
	const lead = (id: string, points: { x: number; y: number }[]) => ({
		id,
		plate: 'segment' as const,
		net: line,
		width_mm: 0.1,
		points
	});
	return serializeDesign({
		...demo,
		glassArt: {
			...glassArt,
			traces: [
				...glassArt.traces,
				lead('far', [
					{ x: W / 2, y: H / 2 },
					{ x: 1e300, y: H / 2 }
				]),
				lead('past', [
					{ x: W / 2, y: H / 2 },
					{ x: W / 2, y: H + 5 }
				])
			]
		}
	});
}

test('a lead far off the glass opens without breaking the page and is named', async ({ page }) => {
	const errors: string[] = [];
	page.on('pageerror', (e) => errors.push(e.message));
	await page.goto('/');
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
	await page.getByTestId('file-input').setInputFiles({
		name: 'bad-trace.json',
		mimeType: 'application/json',
		buffer: Buffer.from(badTraceDesign())
	});
	await page.getByTestId('view-glass').click();
	const panel = page.getByTestId('glass-panel');
	await expect(panel).toBeVisible();
	const offGlass = panel.locator('[data-code="glass.trace-off-glass"]');
	await expect(offGlass).toHaveCount(2, { timeout: 30_000 });
	await expect(offGlass.filter({ hasText: '"far"' })).toContainText('left out of the plates');
	await expect(offGlass.filter({ hasText: '"past"' })).toContainText('runs past the edge');
	// Drawing the plates and leads on the canvas copes with the far lead too.
	await page.getByTestId('glass-show-plates').check();
	await expect(page.getByTestId('glass-show-plates')).toBeChecked();
	for (const size of [
		{ width: 1024, height: 768 },
		{ width: 1440, height: 900 }
	]) {
		await page.setViewportSize(size);
		await page.screenshot({ path: `test-results/glass-bad-trace-${size.width}.png` });
	}
	expect(errors).toEqual([]);
});

test('a transfer point far off the glass opens without breaking the page and is named', async ({
	page
}) => {
	const errors: string[] = [];
	page.on('pageerror', (e) => errors.push(e.message));
	const demo = demoFromFile();
	const glassArt = planGlass(demo).glassArt;
	const far = serializeDesign({
		...demo,
		glassArt: {
			...glassArt,
			transfers: glassArt.transfers.map((t, i) => (i === 0 ? { ...t, x_mm: 1e300 } : t))
		}
	});
	await page.goto('/');
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
	await page.getByTestId('file-input').setInputFiles({
		name: 'far-transfer.json',
		mimeType: 'application/json',
		buffer: Buffer.from(far)
	});
	await page.getByTestId('view-glass').click();
	const panel = page.getByTestId('glass-panel');
	const named = panel.locator('[data-code="glass.transfer-off-seal"]');
	await expect(named).toHaveCount(1, { timeout: 30_000 });
	await expect(named).toContainText('lies off the back glass');
	await page.getByTestId('glass-show-plates').check();
	await expect(page.getByTestId('glass-show-plates')).toBeChecked();
	await page.screenshot({ path: 'test-results/glass-far-transfer.png' });
	expect(errors).toEqual([]);
});
