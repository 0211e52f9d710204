/**
 * A small design and a tool harness for editor tests: the real core History and commands, the
 * real EditorContext (hit-testing, snapping), a plain-object editor state and a fake pointer.
 */
import { demoDesign } from '$lib/core/design/demo';
import type { Design, Electrode } from '$lib/core/design/schema';
import { History } from '$lib/core/commands/history';
import { Gesture } from '$lib/core/commands/gesture';
import type { Patch } from '$lib/core/commands/patch';
import { EditorContext, type EditorPort, type SessionPort } from '$lib/editor/editor-context';
import { EMPTY_OVERLAY, type Overlay } from '$lib/editor/overlay';
import type { PointerInput, Tool } from '$lib/editor/tools/tool';
import type { ToolId } from '$lib/editor/tools/tool-ids';

export function square(id: string, x: number, y: number, size = 2): Electrode {
	return {
		id,
		name: id.toUpperCase(),
		kind: 'segment',
		outline: [
			{ x, y },
			{ x: x + size, y },
			{ x: x + size, y: y + size },
			{ x, y: y + size }
		],
		holes: [],
		common: null,
		line: null,
		locked: false
	};
}

/** The demo's document settings with three 2 mm squares at (10,10), (20,10) and (10,20). */
export function testDesign(): Design {
	return {
		...demoDesign(),
		name: 'test',
		electrodes: [square('a', 10, 10), square('b', 20, 10), square('c', 10, 20)],
		groups: []
	};
}

export class FakeSession implements SessionPort {
	history: History;
	gesture: Gesture | null = null;
	refusals: string[] = [];
	constructor(design: Design) {
		this.history = new History(design);
	}
	get design() {
		return this.history.design;
	}
	get gestureStart() {
		return this.gesture?.start ?? null;
	}
	run(label: string, command: (d: Design) => Patch) {
		try {
			const patch = command(this.design);
			this.history.apply(patch, label);
			return { ok: true as const, patch };
		} catch (e) {
			this.refusals.push(String(e));
			return { ok: false as const, message: String(e) };
		}
	}
	beginGesture(label: string) {
		this.gesture = new Gesture(this.history, label);
		return this.gesture.start;
	}
	previewGesture(command: (start: Design) => Patch) {
		this.gesture!.replace(command(this.gesture!.start));
		return { ok: true };
	}
	commitGesture() {
		this.gesture?.commit();
		this.gesture = null;
	}
	cancelGesture() {
		this.gesture?.cancel();
		this.gesture = null;
	}
}

export function makeEditor(overrides: Partial<EditorPort> = {}) {
	const state = {
		selection: new Set<string>() as ReadonlySet<string>,
		nodeSelection: new Set<string>() as ReadonlySet<string>,
		tool: 'pick' as ToolId,
		view: { scale_px_per_mm: 10, offsetX_px: 0, offsetY_px: 0 },
		gridPitch_mm: 0.5,
		snapToGrid: true,
		snapToShapes: true,
		cornerRadius_mm: 0.5,
		polygonSides: 6,
		layers: { electrodes: true },
		overlay: EMPTY_OVERLAY as Overlay,
		setOverlay(patch: Partial<Overlay>) {
			state.overlay = { ...state.overlay, ...patch };
		},
		clearOverlay() {
			state.overlay = EMPTY_OVERLAY;
		},
		...overrides
	};
	return state;
}

export function harness(design: Design = testDesign(), overrides: Partial<EditorPort> = {}) {
	const session = new FakeSession(design);
	const editor = makeEditor(overrides);
	const ctx = new EditorContext({ session, editor });
	const pointer = (tool: Tool) => {
		const send = (
			type: PointerInput['type'],
			x: number,
			y: number,
			mods: Partial<PointerInput> = {}
		) =>
			tool.pointer(ctx, {
				type,
				point: { x, y },
				button: 0,
				shift: false,
				alt: false,
				mod: false,
				clicks: 1,
				...mods
			});
		return {
			down: (x: number, y: number, mods?: Partial<PointerInput>) => send('down', x, y, mods),
			move: (x: number, y: number, mods?: Partial<PointerInput>) => send('move', x, y, mods),
			up: (x: number, y: number, mods?: Partial<PointerInput>) => send('up', x, y, mods),
			click(x: number, y: number, mods?: Partial<PointerInput>) {
				send('down', x, y, mods);
				send('up', x, y, mods);
			},
			/** Press, move in `steps` stages, release. */
			drag(
				from: [number, number],
				to: [number, number],
				mods: Partial<PointerInput> = {},
				steps = 5
			) {
				send('down', from[0], from[1], mods);
				for (let i = 1; i <= steps; i++)
					send(
						'move',
						from[0] + ((to[0] - from[0]) * i) / steps,
						from[1] + ((to[1] - from[1]) * i) / steps,
						mods
					);
				send('up', to[0], to[1], mods);
			}
		};
	};
	return { session, editor, ctx, pointer };
}

export const electrode = (design: Design, id: string) =>
	design.electrodes.find((e) => e.id === id)!;
