// Every drop-down shows its whole chosen text and no label is cut, on every checks tab, at the two
// window sizes people use most; the electro-optic plot keeps its V_off/V_on labels off the curves.
import { expect, test, type Page } from '@playwright/test';
import { openApp } from './ready';

const SIZES = [
	{ width: 1024, height: 768 },
	{ width: 1440, height: 900 }
];
const TABS = [
	'findings',
	'drive',
	'cell',
	'wiring',
	'rules',
	'load',
	'legibility',
	'angle',
	'glass'
];

interface Cut {
	what: string;
	text: string;
	need: number;
	have: number;
}

/**
 * Visible selects whose chosen text does not fit: a copy of the select holding only the chosen
 * option, with the same font, padding and border but free to size itself, shows the width the
 * text needs; the select on the page must be at least that wide.
 */
function cutSelects(page: Page): Promise<Cut[]> {
	return page.evaluate(() => {
		const out: Cut[] = [];
		for (const select of document.querySelectorAll('select')) {
			const box = select.getBoundingClientRect();
			if (box.width === 0 || select.closest('[hidden]')) continue;
			const chosen = select.selectedOptions[0];
			if (!chosen) continue;
			const style = getComputedStyle(select);
			const probe = document.createElement('select');
			probe.append(new Option(chosen.text));
			for (const p of [
				'font',
				'letter-spacing',
				'padding',
				'border',
				'box-sizing',
				'appearance',
				'text-transform'
			])
				probe.style.setProperty(p, style.getPropertyValue(p));
			Object.assign(probe.style, {
				position: 'absolute',
				left: '-9999px',
				width: 'auto',
				minWidth: '0',
				maxWidth: 'none'
			});
			document.body.append(probe);
			const need = probe.getBoundingClientRect().width;
			probe.remove();
			if (box.width + 0.5 < need)
				out.push({
					what: select.dataset.testid ?? select.getAttribute('aria-label') ?? '',
					text: chosen.text,
					need,
					have: box.width
				});
		}
		return out;
	});
}

/** Visible labels (and label texts) whose content is wider than their box. */
function cutLabels(page: Page): Promise<Cut[]> {
	return page.evaluate(() => {
		const out: Cut[] = [];
		for (const el of document.querySelectorAll<HTMLElement>('label, label > span, legend')) {
			if (el.clientWidth === 0 || getComputedStyle(el).display === 'inline') continue;
			if (el.scrollWidth > el.clientWidth + 1)
				out.push({
					what: el.tagName.toLowerCase(),
					text: (el.textContent ?? '').trim().slice(0, 40),
					need: el.scrollWidth,
					have: el.clientWidth
				});
		}
		return out;
	});
}

for (const size of SIZES) {
	test.describe(`at ${size.width}×${size.height}`, () => {
		test.use({ viewport: size });

		test('every drop-down shows its whole choice and no label is cut, on every tab', async ({
			page
		}) => {
			await openApp(page);
			await expect(page.getByTestId('overall')).toHaveAttribute('data-current', 'true', {
				timeout: 30_000
			});
			// Long choices on purpose: the longest illuminant name and the line-inversion choice.
			await page.getByTestId('view-cell').click();
			await page.getByTestId('illuminant-select').selectOption('F11');
			for (const tab of TABS) {
				await page.getByTestId(`view-${tab}`).click();
				await page.waitForTimeout(300);
				expect(await cutSelects(page), `drop-downs on ${tab}`).toEqual([]);
				expect(await cutLabels(page), `labels on ${tab}`).toEqual([]);
			}
			// The properties of a selected electrode and the digits dialog, with their drop-downs.
			await expect(page.locator('[data-testid="editor-canvas"][data-ready="true"]')).toHaveCount(1);
			await page.locator('[data-electrode]').first().click({ force: true });
			// Narrow windows fold the side panels; unfold them to see the properties.
			if (await page.getByTestId('side-unfold').isVisible())
				await page.getByTestId('side-unfold').click();
			await expect(page.getByTestId('prop-common')).toBeVisible();
			await page.keyboard.press('d');
			await expect(page.getByTestId('generator-dialog')).toBeVisible();
			await page.getByTestId('param-mode').selectOption('legend');
			expect(await cutSelects(page), 'drop-downs of the editor').toEqual([]);
			expect(await cutLabels(page), 'labels of the editor').toEqual([]);
		});

		test('the electro-optic plot labels V_off and V_on clear of its curves', async ({ page }) => {
			await openApp(page);
			await page.getByTestId('view-cell').click();
			const plot = page.getByTestId('eo-plot');
			await expect(plot.locator('svg[viewBox]')).toBeVisible({ timeout: 30_000 });
			const clash = await plot.evaluate((host) => {
				const svg = host.querySelector('svg[viewBox]')!;
				const labels = [...svg.querySelectorAll('text')].filter((t) =>
					/^V_(off|on)$/.test(t.textContent ?? '')
				);
				const curves = [...svg.querySelectorAll('g[aria-label="line"] path')];
				// Other words on the plot (axis labels, ticks) must not sit under the labels either.
				const words = [...svg.querySelectorAll('text')].filter(
					(t) => !labels.includes(t) && (t.textContent ?? '').trim() !== ''
				);
				const hits: string[] = [];
				const meet = (a: DOMRect, b: DOMRect) =>
					a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
				for (const label of labels) {
					const a = label.getBoundingClientRect();
					for (const curve of curves)
						if (meet(a, curve.getBoundingClientRect())) hits.push(`${label.textContent} × curve`);
					for (const word of words)
						if (meet(a, word.getBoundingClientRect()))
							hits.push(`${label.textContent} × "${word.textContent}"`);
				}
				return { labels: labels.length, curves: curves.length, hits };
			});
			expect(clash.labels).toBe(2);
			expect(clash.curves).toBeGreaterThan(0);
			expect(clash.hits).toEqual([]);
		});
	});
}
