/**
 * A ghost made by hand on the demo's generated glass: the corner of SEG1's lead (a bar step's lead,
 * the generator's own drawing, computed here with the same deterministic core function) dragged
 * with the Points tool into the middle of the digits, where it crosses COM4's plate under them —
 * and (COM4, SEG1) drives a bar step, so the crossing lights.
 */
import { expect, type Page } from '@playwright/test';
import { demoFromFile, seg1Lead } from './demo-file';

/** The corner of SEG1's generated lead that the flows drag, in glass millimetres. */
export function seg1Corner(): { x: number; y: number } {
	return seg1Lead(demoFromFile(), 3).points[1];
}

/** Drags the lead corner at `corner` (mm) to (22, 17) mm with the Points tool, plates shown. */
export async function dragLeadIntoDigits(page: Page, corner: { x: number; y: number }) {
	await page.getByTestId('glass-show-plates').check();
	await page.getByTestId('tool-points').click();
	const stage = page.getByTestId('editor-stage');
	const [scale, offsetX, offsetY] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	const box = (await stage.boundingBox())!;
	const at = (x_mm: number, y_mm: number) => ({
		x: box.x + offsetX + x_mm * scale,
		y: box.y + offsetY + y_mm * scale
	});
	const from = at(corner.x, corner.y);
	const to = at(22, 17);
	await page.mouse.move(from.x, from.y);
	await page.mouse.down();
	for (let k = 1; k <= 8; k++)
		await page.mouse.move(from.x + ((to.x - from.x) * k) / 8, from.y + ((to.y - from.y) * k) / 8);
	await page.mouse.up();
	await expect(page.getByTestId('status')).toContainText('Undo: Move point');
}
