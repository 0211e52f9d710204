import { expect, test } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import { openApp } from './ready';

test('saves the design report with the design name, its findings and the cautions', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('report-paper').selectOption('letter');
	const [download] = await Promise.all([
		page.waitForEvent('download'),
		page.getByTestId('report-save').click()
	]);
	expect(download.suggestedFilename()).toMatch(/garden-water timer.*report\.html$/);
	const html = await readFile((await download.path())!, 'utf8');
	expect(html).toContain('Brookfern garden-water timer');
	expect(html).toContain('@page { size: letter');
	expect(html).toContain('wiring.ok');
	expect(html).toContain('confirm legibility and switching with measured samples');
	// The drawing prints at true size: the glass is 66 mm wide.
	expect(html).toContain('width="66mm"');
});
