import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { afterAutosave } from './ready';

/** Screen position of a document point (mm), from the view the canvas reports. */
async function screenOf(page: Page, x_mm: number, y_mm: number) {
	const stage = page.getByTestId('editor-stage');
	const box = (await stage.boundingBox())!;
	const [scale, ox, oy] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	return { x: box.x + ox + x_mm * scale, y: box.y + oy + y_mm * scale };
}

async function drag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }) {
	await page.mouse.move(from.x, from.y);
	await page.mouse.down();
	await page.mouse.move(to.x, to.y, { steps: 8 });
	await page.mouse.up();
}

const electrodes = (page: Page) => page.locator('[data-electrode]');
/**
 * The drawing is served with the page; the editor is live once its canvas is set up and any
 * saved work has been looked for.
 */
async function waitForEditor(page: Page) {
	await expect(page.locator('[data-testid="editor-canvas"][data-ready="true"]')).toHaveCount(1);
	await expect(page.locator('[data-autosave="on"]')).toHaveCount(1);
}
const numberIn = async (page: Page, testid: string) =>
	Number(await page.getByTestId(testid).inputValue());

test.beforeEach(async ({ page }) => {
	const errors: string[] = [];
	page.on('pageerror', (e) => errors.push(e.message));
	page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
	await page.goto('/');
	await expect(electrodes(page)).toHaveCount(53);
	await waitForEditor(page);
	(page as unknown as { errors: string[] }).errors = errors;
});

test.afterEach(async ({ page }) => {
	expect((page as unknown as { errors: string[] }).errors).toEqual([]);
});

test('draws a rectangle snapped to the grid, and undo takes it away', async ({ page }) => {
	await page.getByTestId('tool-box').click();
	await drag(page, await screenOf(page, 40.1, 36.2), await screenOf(page, 49.9, 39.1));
	await expect(electrodes(page)).toHaveCount(54);
	await expect(page.getByTestId('prop-w')).toHaveValue('10');
	await expect(page.getByTestId('prop-h')).toHaveValue('3');
	await expect(page.getByTestId('prop-common')).toHaveValue('');
	await page.keyboard.press('Control+z');
	await expect(electrodes(page)).toHaveCount(53);
	await page.keyboard.press('Control+Shift+z');
	await expect(electrodes(page)).toHaveCount(54);
});

test('places "12.34", moves it, undoes and redoes the move, assigns a common', async ({ page }) => {
	await page.keyboard.press('d');
	await page.getByTestId('param-text').fill('12.34');
	await page.getByTestId('param-x_mm').fill('30');
	await page.getByTestId('param-y_mm').fill('28');
	await expect(page.getByTestId('generator-status')).toContainText('29 electrodes');
	await page.getByTestId('generator-apply').click();
	await expect(electrodes(page)).toHaveCount(53 + 29);
	await expect(page.getByTestId('properties')).toContainText('29 electrodes');
	const x0 = await numberIn(page, 'prop-x');
	const y0 = await numberIn(page, 'prop-y');

	// Drag the group by one of its segments: 5 mm right, 2 mm down.
	const first = (await page.locator('[data-electrode^="text"]').first().boundingBox())!;
	const scale = Number(
		(await page.getByTestId('editor-stage').getAttribute('data-view'))!.split(' ')[0]
	);
	const from = { x: first.x + first.width / 2, y: first.y + first.height / 2 };
	await drag(page, from, { x: from.x + 5 * scale, y: from.y + 2 * scale });
	// The grabbed corner snaps to the 0.5 mm grid, so the move is within half a pitch of the drag.
	const near = (v: number, to: number) => Math.abs(v - to) <= 0.5 + 1e-9;
	await expect.poll(async () => near(await numberIn(page, 'prop-x'), x0 + 5)).toBe(true);
	await expect.poll(async () => near(await numberIn(page, 'prop-y'), y0 + 2)).toBe(true);
	const x1 = await numberIn(page, 'prop-x');

	await page.getByTestId('action-undo').click();
	await expect.poll(() => numberIn(page, 'prop-x')).toBeCloseTo(x0, 6);
	await page.getByTestId('action-redo').click();
	await expect.poll(() => numberIn(page, 'prop-x')).toBeCloseTo(x1, 6);

	await page.getByTestId('prop-common').selectOption({ label: 'COM2' });
	await page.getByTestId('prop-line').selectOption({ label: 'SEG3' });
	const segment = page.locator('[data-electrode^="text"]').nth(3);
	const box = (await segment.boundingBox())!;
	await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
	await expect(page.getByTestId('electrode-tip')).toContainText('COM2');
	await expect(page.getByTestId('electrode-tip')).toContainText('SEG3');
	// One undo step per assignment.
	await page.keyboard.press('Control+z');
	await expect(page.getByTestId('prop-line')).toHaveValue('');
	await expect(page.getByTestId('prop-common')).toHaveValue('com2');
});

test('Escape cancels a drag in progress', async ({ page }) => {
	const target = (await page.locator('[data-electrode="d1a"]').boundingBox())!;
	const from = { x: target.x + target.width / 2, y: target.y + target.height / 2 };
	await page.mouse.move(from.x, from.y);
	await page.mouse.down();
	await page.mouse.move(from.x + 80, from.y + 40, { steps: 6 });
	// The press picked the segment up (it is selected), so a release here would move it.
	await expect(page.getByTestId('prop-name')).toHaveValue('1A');
	await page.keyboard.press('Escape');
	await page.mouse.up();
	// Back where it started, in both directions and size (within half a pixel), once the view
	// has settled; and nothing entered the undo history.
	await expect
		.poll(async () => {
			const after = (await page.locator('[data-electrode="d1a"]').boundingBox())!;
			return Math.max(
				Math.abs(after.x - target.x),
				Math.abs(after.y - target.y),
				Math.abs(after.width - target.width),
				Math.abs(after.height - target.height)
			);
		})
		.toBeLessThan(0.5);
	await expect(page.getByTestId('action-undo')).toBeDisabled();
});

test('recovers unsaved work in a fresh tab, and setting it aside returns to the demo', async ({
	page
}) => {
	await page.reload();
	await waitForEditor(page);
	await expect(electrodes(page)).toHaveCount(53);
	await expect(page.getByTestId('recovered-notice')).toHaveCount(0);

	await page.getByTestId('tool-oval').click();
	await afterAutosave(page, async () => {
		await drag(page, await screenOf(page, 45, 36), await screenOf(page, 48, 39));
		await expect(electrodes(page)).toHaveCount(54);
	});
	// The same tab reloads its own design silently; a fresh tab is offered it as recovered work.
	await page.reload();
	await waitForEditor(page);
	await expect(electrodes(page)).toHaveCount(54);
	const fresh = await page.context().newPage();
	await page.close();
	await fresh.goto('/');
	await waitForEditor(fresh);
	await expect(fresh.getByTestId('recovered-notice')).toContainText('Recovered unsaved work from');
	await expect(electrodes(fresh)).toHaveCount(54);
	await fresh.getByTestId('recovered-discard').click();
	await expect(electrodes(fresh)).toHaveCount(53);
	await expect(fresh.getByTestId('recovered-notice')).toHaveCount(0);
});

test('saves the edited design to a file and opens it again', async ({ page }) => {
	await page.keyboard.press('d');
	await page.getByTestId('param-text').fill('12.34');
	await page.getByTestId('generator-apply').click();
	await expect(electrodes(page)).toHaveCount(82);
	const download = page.waitForEvent('download');
	await page.getByTestId('save-file').click();
	const file = await (await download).path();
	const saved = JSON.parse(readFileSync(file, 'utf8'));
	expect(saved.electrodes).toHaveLength(82);
	expect(
		saved.groups.some((g: { generator?: { kind: string } }) => g.generator?.kind === 'text')
	).toBe(true);

	// The same tab has nothing recovered to offer; one undo takes the generated text back.
	await expect(page.getByTestId('recovered-notice')).toHaveCount(0);
	await page.getByTestId('action-undo').click();
	await expect(electrodes(page)).toHaveCount(53);
	await page.getByTestId('file-input').setInputFiles(file);
	await expect(electrodes(page)).toHaveCount(82);
	await expect(page.getByTestId('action-undo')).toBeDisabled();
});

test('copies and pastes electrodes, and the shortcut help lists the tools', async ({ page }) => {
	const d1a = (await page.locator('[data-electrode="d1a"]').boundingBox())!;
	await page.mouse.click(d1a.x + d1a.width / 2, d1a.y + d1a.height / 2);
	await expect(page.getByTestId('prop-name')).toHaveValue('1A');
	await page.keyboard.press('Control+c');
	await page.keyboard.press('Control+v');
	await expect(electrodes(page)).toHaveCount(54);
	await expect(page.getByTestId('prop-name')).toHaveValue('1A');
	await page.keyboard.press('Delete');
	await expect(electrodes(page)).toHaveCount(53);
	await page.keyboard.press('?');
	const help = page.getByTestId('shortcut-help');
	for (const name of ['Pick', 'Points', 'Box', 'Oval', 'Curve', 'Digits…', 'Icons…', 'Undo'])
		await expect(help).toContainText(name);
	await page.keyboard.press('Escape');
	await expect(help).toHaveCount(0);
});

test('numeric entry applies valid sizes and explains invalid ones', async ({ page }) => {
	const d1a = (await page.locator('[data-electrode="d1a"]').boundingBox())!;
	await page.mouse.click(d1a.x + d1a.width / 2, d1a.y + d1a.height / 2);
	const w = page.getByTestId('prop-w');
	await w.fill('abc');
	await w.press('Enter');
	await expect(page.getByRole('alert').filter({ hasText: 'is not a number' })).toBeVisible();
	await expect(page.getByTestId('action-undo')).toBeDisabled();
	await w.fill('-2');
	await w.press('Enter');
	await expect(page.getByRole('alert').filter({ hasText: 'must be above 0' })).toBeVisible();
	await w.fill('6');
	await w.press('Enter');
	await expect(w).toHaveValue('6');
	await expect(page.getByTestId('action-undo')).toBeEnabled();
});

test('unites two overlapping boxes, makes a row of copies and aligns them', async ({ page }) => {
	await page.keyboard.press('5');
	await drag(page, await screenOf(page, 40, 36), await screenOf(page, 44, 39));
	await drag(page, await screenOf(page, 42, 37), await screenOf(page, 47, 40));
	await expect(electrodes(page)).toHaveCount(55);
	await page.keyboard.press('1');
	const first = await screenOf(page, 40.5, 36.5);
	const second = await screenOf(page, 46.5, 39.5);
	await page.mouse.click(first.x, first.y);
	await page.keyboard.down('Shift');
	await page.mouse.click(second.x, second.y);
	await page.keyboard.up('Shift');
	await expect(page.getByTestId('properties')).toContainText('2 electrodes');
	await page.getByTestId('menu-combine').click();
	await page.getByTestId('action-unite').click();
	await expect(electrodes(page)).toHaveCount(54);
	await expect(page.getByTestId('prop-w')).toHaveValue('7');
	await expect(page.getByTestId('prop-h')).toHaveValue('4');

	await page.getByTestId('action-array').click();
	await page.getByTestId('array-count').fill('3');
	await page.getByTestId('array-dx').fill('8');
	await page.getByTestId('array-apply').click();
	await expect(electrodes(page)).toHaveCount(56);
	await expect(page.getByTestId('prop-w')).toHaveValue('23');
	await page.getByTestId('menu-arrange').click();
	await page.getByTestId('action-align-top').click();
	await expect(page.getByTestId('prop-h')).toHaveValue('4');
});

test('edits a generated digit’s parameters and regenerates it in place', async ({ page }) => {
	const before = (await page.locator('[data-electrode="d1a"]').boundingBox())!;
	await page.mouse.click(before.x + before.width / 2, before.y + before.height / 2);
	await expect(page.getByTestId('group-info')).toContainText('Digit 1');
	await page.getByTestId('edit-group').click();
	await page.getByTestId('param-height_mm').fill('abc');
	await expect(page.getByTestId('generator-apply')).toBeDisabled();
	await page.getByTestId('param-height_mm').fill('10');
	await page.getByTestId('generator-apply').click();
	await expect(electrodes(page)).toHaveCount(53);
	await expect(page.getByTestId('properties')).toContainText('8 electrodes');
	await expect(page.getByTestId('prop-h')).toHaveValue('10');
	await page.keyboard.press('Control+z');
	await expect(page.getByTestId('prop-h')).toHaveValue('12');
});
