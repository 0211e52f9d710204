/**
 * Probes the editor bench installs in the page: animation-frame time stamps and, per drag move,
 * the time from dispatching the pointermove event to the editor's `editor:drawn` mark (the work
 * of one frame: tool, command, history, canvas sync and draw) (recorded while a
 * measurement runs) and, per click, the pointerdown event's time stamp and the time of the
 * editor's `editor:selection-drawn` mark (selection applied and the canvas redrawn). The scripts
 * are strings so the bench's own compiler helpers never leak into the page.
 */
import type { Page } from '@playwright/test';

const INSTALL = `(() => {
	window.__frames = [];
	window.__recording = false;
	window.__clicks = [];
	window.__down = null;
	window.__move = null;
	window.__moves = [];
	addEventListener('pointerdown', (e) => { window.__down = e.timeStamp; }, { capture: true });
	addEventListener('pointermove', (e) => { if (e.buttons && window.__recording) window.__move = performance.now(); }, { capture: true });
	new PerformanceObserver((list) => {
		for (const entry of list.getEntries()) {
			if (entry.name === 'editor:drawn' && window.__move !== null) {
				window.__moves.push(entry.startTime - window.__move);
				window.__move = null;
			}
			if (entry.name !== 'editor:selection-drawn' || window.__down === null) continue;
			window.__clicks.push({ down: window.__down, drawn: entry.startTime });
			window.__down = null;
		}
	}).observe({ entryTypes: ['mark'] });
})()`;

const START_FRAMES = `(() => {
	window.__frames = [];
	window.__moves = [];
	window.__recording = true;
	const tick = (t) => {
		window.__frames.push(t);
		if (window.__recording) requestAnimationFrame(tick);
	};
	requestAnimationFrame(tick);
})()`;

export interface ClickTimes {
	/** pointerdown → selection applied and canvas drawn, ms */
	drawn_ms: number;
	/** pointerdown → start of the first frame after the draw (the frame that shows it), ms */
	frame_ms: number;
}

export async function installProbes(page: Page): Promise<void> {
	await page.evaluate(INSTALL);
}

export async function startFrames(page: Page): Promise<void> {
	await page.evaluate(START_FRAMES);
}

export async function stopFrames(page: Page): Promise<void> {
	await page.evaluate('window.__recording = false');
}

/** Per pointermove during a recorded drag: dispatch of the event → canvas drawn, ms. */
export const readMoves = (page: Page): Promise<number[]> =>
	page.evaluate('window.__moves.slice()') as Promise<number[]>;

export const readFrames = (page: Page): Promise<number[]> =>
	page.evaluate('window.__frames.slice()') as Promise<number[]>;

export async function readClicks(page: Page): Promise<ClickTimes[]> {
	const clicks = (await page.evaluate('window.__clicks.slice()')) as {
		down: number;
		drawn: number;
	}[];
	const frames = await readFrames(page);
	return clicks.map(({ down, drawn }) => {
		const next = frames.find((t) => t >= drawn);
		return { drawn_ms: drawn - down, frame_ms: next === undefined ? NaN : next - down };
	});
}
