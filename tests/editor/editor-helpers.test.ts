import { describe, expect, it, vi } from 'vitest';
import { createDebouncedSaver } from '$lib/state/autosave-debounce';
import { ClickCounter, toPointerInput } from '$lib/editor/pointer-input';
import { grabAnchor } from '$lib/editor/tools/grab-anchor';
import { commonPlates } from '$lib/editor/common-plates';
import { electrodeLook } from '$lib/editor/electrode-look';
import {
	nodeKey,
	nodeTargetAt,
	nodesWithVisibleHandles,
	parseNodeKey
} from '$lib/editor/node-refs';
import { deleteNodes, moveNodes } from '$lib/editor/node-edits';
import { sizeHandleAt, oppositeHandle } from '$lib/editor/handles';
import { demoDesign } from '$lib/core/design/demo';
import { square, testDesign } from './fixtures';

describe('debounced autosave', () => {
	it('saves the latest snapshot once after a pause, and at least every maxWait', async () => {
		vi.useFakeTimers();
		let now = 0;
		const saved: number[] = [];
		const saver = createDebouncedSaver<number>({
			save: async (n) => void saved.push(n),
			delay_ms: 100,
			maxWait_ms: 250,
			now: () => now
		});
		for (let i = 1; i <= 3; i++) {
			saver.schedule(i);
			now += 50;
			await vi.advanceTimersByTimeAsync(50);
		}
		expect(saved).toEqual([]);
		now += 100;
		await vi.advanceTimersByTimeAsync(100);
		expect(saved).toEqual([3]);
		for (let i = 4; i <= 12; i++) {
			saver.schedule(i);
			now += 40;
			await vi.advanceTimersByTimeAsync(40);
		}
		expect(saved.length).toBeGreaterThanOrEqual(2);
		saver.schedule(99);
		await saver.flush();
		expect(saved.at(-1)).toBe(99);
		expect(saver.pending).toBe(false);
		vi.useRealTimers();
	});

	it('with leading saving, a single edit after a quiet spell is saved at once', async () => {
		vi.useFakeTimers();
		let now = 1000;
		const saved: number[] = [];
		const saver = createDebouncedSaver<number>({
			save: async (n) => void saved.push(n),
			delay_ms: 100,
			maxWait_ms: 250,
			leading: true,
			now: () => now
		});
		saver.schedule(1);
		await vi.advanceTimersByTimeAsync(0);
		expect(saved).toEqual([1]);
		// Edits right after it wait for the pause, and only the latest is written.
		saver.schedule(2);
		now += 30;
		saver.schedule(3);
		await vi.advanceTimersByTimeAsync(0);
		expect(saved).toEqual([1]);
		now += 100;
		await vi.advanceTimersByTimeAsync(100);
		expect(saved).toEqual([1, 3]);
		// After a quiet spell the next single edit is again written at once.
		now += 500;
		saver.schedule(4);
		await vi.advanceTimersByTimeAsync(0);
		expect(saved).toEqual([1, 3, 4]);
		vi.useRealTimers();
	});

	it('reports a failed save instead of throwing', async () => {
		const onError = vi.fn();
		const saver = createDebouncedSaver<number>({
			save: () => Promise.reject(new Error('quota')),
			delay_ms: 10,
			onError
		});
		saver.schedule(1);
		await saver.flush();
		expect(onError).toHaveBeenCalledOnce();
	});
});

describe('pointer input', () => {
	it('maps client coordinates into document millimetres', () => {
		const input = toPointerInput(
			'down',
			{
				clientX: 150,
				clientY: 80,
				button: 0,
				shiftKey: true,
				altKey: false,
				ctrlKey: false,
				metaKey: true,
				detail: 0
			},
			{ left: 50, top: 20, view: { scale_px_per_mm: 10, offsetX_px: 0, offsetY_px: 0 } }
		);
		expect(input).toEqual({
			type: 'down',
			point: { x: 10, y: 6 },
			button: 0,
			shift: true,
			alt: false,
			mod: true,
			clicks: 1
		});
	});

	it('counts double clicks by time and distance', () => {
		const c = new ClickCounter(400, 5);
		expect(c.press(0, 10, 10)).toBe(1);
		expect(c.press(200, 12, 11)).toBe(2);
		expect(c.press(300, 12, 11)).toBe(3);
		expect(c.press(1000, 12, 11)).toBe(1);
		expect(c.press(1100, 40, 11)).toBe(1);
	});
});

describe('editor helpers', () => {
	it('grabs the nearest selected vertex, else the nearest corner of the bounds', () => {
		const d = testDesign();
		expect(grabAnchor(d, ['a'], { x: 12.1, y: 10.1 }, 0.5)).toEqual({ x: 12, y: 10 });
		expect(grabAnchor(d, ['a', 'b'], { x: 21, y: 13 }, 0.5)).toEqual({ x: 22, y: 12 });
	});

	it('finds each common’s extent', () => {
		const plates = commonPlates(demoDesign(), () => '#000');
		expect(plates).toHaveLength(4);
		for (const p of plates) expect(p.bounds.maxX).toBeGreaterThan(p.bounds.minX);
	});

	it('paints by common, marks unassigned electrodes, and follows the predicted look', () => {
		const inputs = {
			commonIndex: new Map([['com1', 0]]),
			colourOfCommon: (i: number) => (i < 0 ? 'red' : 'blue'),
			selection: new Set<string>(),
			hoverId: null,
			appearance: null
		};
		const wired = { ...square('a', 0, 0), common: 'com1', line: 'seg1' };
		expect(electrodeLook(wired, inputs)).toMatchObject({ fill: 'blue', stroke: null });
		const loose = square('b', 0, 0);
		expect(electrodeLook(loose, inputs)).toMatchObject({ fill: 'red', dash: [4, 3] });
		expect(electrodeLook(loose, { ...inputs, selection: new Set(['b']) })).toMatchObject({
			strokeWidth_px: 2,
			dash: null
		});
		const look = {
			...inputs,
			appearance: { background: '#888', segmentOn: '#111', litIds: new Set(['a']) }
		};
		expect(electrodeLook(wired, look).fill).toBe('#111');
		expect(electrodeLook(loose, look).fill).toBe('#888');
	});

	it('addresses nodes and hits handles before points', () => {
		const e = {
			...square('a', 0, 0),
			outline: [
				{ x: 0, y: 0, out: [1, 0] as [number, number] },
				{ x: 2, y: 0 },
				{ x: 2, y: 2 },
				{ x: 0, y: 2 }
			]
		};
		const key = nodeKey({ electrodeId: 'a', contour: 0, index: 0 });
		expect(parseNodeKey(key)).toEqual({ electrodeId: 'a', contour: 0, index: 0 });
		expect(parseNodeKey('bad')).toBeNull();
		const withHandles = nodesWithVisibleHandles([e], new Set([key]));
		expect(withHandles.has(nodeKey({ electrodeId: 'a', contour: 0, index: 3 }))).toBe(true);
		expect(
			nodeTargetAt({
				electrodes: [e],
				at: { x: 1, y: 0.05 },
				reach_mm: 0.2,
				showHandlesOf: withHandles
			})?.part
		).toBe('out');
		expect(
			nodeTargetAt({
				electrodes: [e],
				at: { x: 2.1, y: 2 },
				reach_mm: 0.2,
				showHandlesOf: withHandles
			})
		).toMatchObject({ index: 2, part: 'point' });
		expect(
			nodeTargetAt({
				electrodes: [e],
				at: { x: 5, y: 5 },
				reach_mm: 0.2,
				showHandlesOf: withHandles
			})
		).toBeNull();
	});

	it('moves and deletes several points as one patch', () => {
		const d = testDesign();
		const refs = [0, 1].map((index) => ({ electrodeId: 'a', contour: 0, index }));
		const moved = moveNodes(d, { refs, dx_mm: 0, dy_mm: -1 });
		expect(moved.electrodes?.size).toBe(1);
		const deleted = deleteNodes(d, { refs: [{ electrodeId: 'a', contour: 0, index: 0 }] });
		expect([...deleted.electrodes!.values()][0][1]!.record.outline).toHaveLength(3);
		expect(() =>
			deleteNodes(d, { refs: [0, 1].map((index) => ({ electrodeId: 'a', contour: 0, index })) })
		).toThrow(/at least 3 points/);
	});

	it('finds size handles within reach and pairs opposite ones', () => {
		const b = { minX: 0, minY: 0, maxX: 10, maxY: 5 };
		expect(sizeHandleAt(b, { x: 10.2, y: 5.1 }, 10)).toBe('se');
		expect(sizeHandleAt(b, { x: 5, y: 2.5 }, 10)).toBeNull();
		expect(oppositeHandle('nw')).toBe('se');
		expect(oppositeHandle('e')).toBe('w');
	});
});
