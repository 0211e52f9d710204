/**
 * Everything the editor can do from a button or a key, in one catalogue: an id, a plain label,
 * a group for the help overlay, its chords and what it runs. Edits go through core commands and
 * the edit session; the catalogue itself holds no state.
 */
import type { Design } from '$lib/core/design/schema';
import type { Patch } from '$lib/core/commands/patch';
import { deleteElectrodes } from '$lib/core/commands/delete-electrodes';
import { duplicateElectrodes } from '$lib/core/commands/duplicate-electrodes';
import { mirrorElectrodes } from '$lib/core/commands/mirror-electrodes';
import { moveElectrodes } from '$lib/core/commands/move-electrodes';
import { alignElectrodes, type AlignEdge } from '$lib/core/commands/align-electrodes';
import { distributeElectrodes } from '$lib/core/commands/distribute-electrodes';
import { booleanElectrodes, type BooleanOperation } from '$lib/core/commands/boolean-electrodes';
import { groupElectrodes, ungroupElectrodes } from '$lib/core/commands/group-electrodes';
import { reorderElectrodes, type ReorderTarget } from '$lib/core/commands/reorder-electrodes';
import { insertedIds } from '$lib/core/commands/patch-algebra';
import { TOOLS, type ToolId } from './tools/tool-ids';
import { chainPatches } from './chain-patches';

export type ActionGroup = 'Tools' | 'Edit' | 'Arrange' | 'Shape' | 'View' | 'Add';

export interface ActionEnv {
	readonly design: Design;
	selection: ReadonlySet<string>;
	tool: ToolId;
	run(label: string, command: (design: Design) => Patch): Patch | null;
	undo(): void;
	redo(): void;
	readonly canUndo: boolean;
	readonly canRedo: boolean;
	copy(): void;
	cut(): void;
	paste(): void;
	zoomBy(factor: number): void;
	trueSize(): void;
	fitAll(): void;
	fitSelection(): void;
	toggleViewMode(): void;
	toggleGrid(): void;
	openDialog(which: 'digits' | 'bars' | 'icons' | 'array' | 'help'): void;
	readonly nudge_mm: number;
}

export interface Action {
	id: string;
	label: string;
	group: ActionGroup;
	chords: readonly string[];
	/** Needs a selection of at least this many electrodes. */
	needs?: number;
	run(env: ActionEnv): void;
}

const ids = (env: ActionEnv) => [...env.selection];

function edit(
	label: string,
	command: (design: Design, ids: string[]) => Patch,
	select?: 'inserted' | 'none'
): (env: ActionEnv) => void {
	return (env) => {
		const patch = env.run(label, (d) => command(d, ids(env)));
		if (patch && select === 'inserted') env.selection = new Set(insertedIds(patch));
		if (patch && select === 'none') env.selection = new Set();
	};
}

const align = (edge: AlignEdge, label: string, chord: string): Action => ({
	id: `align-${edge}`,
	label,
	group: 'Arrange',
	chords: [chord],
	needs: 2,
	run: edit(label, (d, i) => alignElectrodes(d, { ids: i, edge }))
});

const boolean = (operation: BooleanOperation, label: string, chord: string): Action => ({
	id: operation,
	label,
	group: 'Shape',
	chords: [chord],
	needs: 2,
	run: (env) => {
		const patch = env.run(label, (d) => booleanElectrodes(d, { ids: ids(env), operation }));
		if (patch)
			env.selection = new Set(
				[...env.selection]
					.filter((id) => env.design.electrodes.some((e) => e.id === id))
					.concat(insertedIds(patch))
			);
	}
});

const reorder = (to: ReorderTarget, label: string, chord: string): Action => ({
	id: `order-${to}`,
	label,
	group: 'Arrange',
	chords: [chord],
	needs: 1,
	run: edit(label, (d, i) => reorderElectrodes(d, { ids: i, to }))
});

const nudge = (dx: number, dy: number, chord: string, big: boolean): Action => ({
	id: `nudge-${dx}-${dy}${big ? '-far' : ''}`,
	label: `Nudge ${dx < 0 ? 'left' : dx > 0 ? 'right' : dy < 0 ? 'up' : 'down'}${big ? ' ×10' : ''}`,
	group: 'Arrange',
	chords: [chord],
	needs: 1,
	run: (env) => {
		const step = env.nudge_mm * (big ? 10 : 1);
		env.run('Nudge', (d) =>
			moveElectrodes(d, { ids: ids(env), dx_mm: dx * step, dy_mm: dy * step })
		);
	}
});

export const ACTIONS: readonly Action[] = [
	...TOOLS.map((t): Action => ({
		id: `tool-${t.id}`,
		label: t.name,
		group: 'Tools',
		chords: t.key ? [t.key.toLowerCase()] : [],
		run: (env) => (env.tool = t.id)
	})),
	{ id: 'undo', label: 'Undo', group: 'Edit', chords: ['mod+z'], run: (env) => env.undo() },
	{
		id: 'redo',
		label: 'Redo',
		group: 'Edit',
		chords: ['mod+shift+z', 'mod+y'],
		run: (env) => env.redo()
	},
	{
		id: 'copy',
		label: 'Copy',
		group: 'Edit',
		chords: ['mod+c'],
		needs: 1,
		run: (env) => env.copy()
	},
	{ id: 'cut', label: 'Cut', group: 'Edit', chords: ['mod+x'], needs: 1, run: (env) => env.cut() },
	{ id: 'paste', label: 'Paste', group: 'Edit', chords: ['mod+v'], run: (env) => env.paste() },
	{
		id: 'duplicate',
		label: 'Duplicate',
		group: 'Edit',
		chords: ['mod+d'],
		needs: 1,
		run: edit('Duplicate', (d, i) => duplicateElectrodes(d, { ids: i }), 'inserted')
	},
	{
		id: 'delete',
		label: 'Delete',
		group: 'Edit',
		chords: ['delete', 'backspace'],
		needs: 1,
		run: edit('Delete', (d, i) => deleteElectrodes(d, { ids: i }), 'none')
	},
	{
		id: 'select-all',
		label: 'Select all',
		group: 'Edit',
		chords: ['mod+a'],
		run: (env) => (env.selection = new Set(env.design.electrodes.map((e) => e.id)))
	},
	{
		id: 'array',
		label: 'Array…',
		group: 'Edit',
		chords: ['mod+shift+d'],
		needs: 1,
		run: (env) => env.openDialog('array')
	},
	{
		id: 'group',
		label: 'Group',
		group: 'Arrange',
		chords: ['mod+g'],
		needs: 2,
		run: edit('Group', (d, i) => groupElectrodes(d, { ids: i }))
	},
	{
		id: 'ungroup',
		label: 'Ungroup',
		group: 'Arrange',
		chords: ['mod+shift+g'],
		needs: 1,
		run: (env) => {
			const chosen = env.selection;
			const groups = env.design.groups.filter((g) => g.members.some((m) => chosen.has(m)));
			if (groups.length === 0) return;
			env.run('Ungroup', (d) =>
				chainPatches(
					d,
					groups.map((g) => (x: Design) => ungroupElectrodes(x, { groupId: g.id }))
				)
			);
		}
	},
	{
		id: 'mirror-h',
		label: 'Mirror left–right',
		group: 'Arrange',
		chords: ['m'],
		needs: 1,
		run: edit('Mirror', (d, i) => mirrorElectrodes(d, { ids: i, direction: 'horizontal' }))
	},
	{
		id: 'mirror-v',
		label: 'Mirror top–bottom',
		group: 'Arrange',
		chords: ['shift+m'],
		needs: 1,
		run: edit('Mirror', (d, i) => mirrorElectrodes(d, { ids: i, direction: 'vertical' }))
	},
	align('left', 'Align left edges', 'alt+arrowleft'),
	align('right', 'Align right edges', 'alt+arrowright'),
	align('top', 'Align top edges', 'alt+arrowup'),
	align('bottom', 'Align bottom edges', 'alt+arrowdown'),
	align('centre', 'Align centres across', 'alt+c'),
	align('middle', 'Align middles down', 'alt+m'),
	{
		id: 'distribute-h',
		label: 'Space evenly across',
		group: 'Arrange',
		chords: ['alt+s'],
		needs: 3,
		run: edit('Distribute', (d, i) => distributeElectrodes(d, { ids: i, axis: 'horizontal' }))
	},
	{
		id: 'distribute-v',
		label: 'Space evenly down',
		group: 'Arrange',
		chords: ['alt+shift+s'],
		needs: 3,
		run: edit('Distribute', (d, i) => distributeElectrodes(d, { ids: i, axis: 'vertical' }))
	},
	reorder('front', 'To front', '}'),
	reorder('forward', 'Forward one', ']'),
	reorder('backward', 'Back one', '['),
	reorder('back', 'To back', '{'),
	nudge(-1, 0, 'arrowleft', false),
	nudge(1, 0, 'arrowright', false),
	nudge(0, -1, 'arrowup', false),
	nudge(0, 1, 'arrowdown', false),
	nudge(-1, 0, 'shift+arrowleft', true),
	nudge(1, 0, 'shift+arrowright', true),
	nudge(0, -1, 'shift+arrowup', true),
	nudge(0, 1, 'shift+arrowdown', true),
	boolean('unite', 'Unite', 'alt+u'),
	boolean('subtract', 'Subtract', 'alt+t'),
	boolean('intersect', 'Intersect', 'alt+i'),
	{
		id: 'digits',
		label: 'Digits…',
		group: 'Add',
		chords: ['d'],
		run: (env) => env.openDialog('digits')
	},
	{
		id: 'bars',
		label: 'Bars…',
		group: 'Add',
		chords: ['b'],
		run: (env) => env.openDialog('bars')
	},
	{
		id: 'icons',
		label: 'Icons…',
		group: 'Add',
		chords: ['i'],
		run: (env) => env.openDialog('icons')
	},
	{
		id: 'zoom-in',
		label: 'Zoom in',
		group: 'View',
		chords: ['plus', '='],
		run: (env) => env.zoomBy(1.25)
	},
	{
		id: 'zoom-out',
		label: 'Zoom out',
		group: 'View',
		chords: ['-'],
		run: (env) => env.zoomBy(0.8)
	},
	{ id: 'fit-all', label: 'Fit all', group: 'View', chords: ['home'], run: (env) => env.fitAll() },
	{
		id: 'fit-selection',
		label: 'Fit selection',
		group: 'View',
		chords: ['end'],
		needs: 1,
		run: (env) => env.fitSelection()
	},
	{
		id: 'true-size',
		label: 'True size (100 %)',
		group: 'View',
		chords: ['shift+home'],
		run: (env) => env.trueSize()
	},
	{
		id: 'view-mode',
		label: 'Wiring / appearance',
		group: 'View',
		chords: ['w'],
		run: (env) => env.toggleViewMode()
	},
	{ id: 'grid', label: 'Show grid', group: 'View', chords: ['g'], run: (env) => env.toggleGrid() },
	{
		id: 'help',
		label: 'Keyboard shortcuts',
		group: 'View',
		chords: ['?'],
		run: (env) => env.openDialog('help')
	}
];

const BY_CHORD = new Map<string, Action>();
for (const a of ACTIONS) for (const c of a.chords) BY_CHORD.set(c, a);

export const actionForChord = (chord: string): Action | undefined => BY_CHORD.get(chord);
export const actionById = (id: string): Action | undefined => ACTIONS.find((a) => a.id === id);

export function isEnabled(
	action: Action,
	env: Pick<ActionEnv, 'selection' | 'canUndo' | 'canRedo'>
): boolean {
	if (action.id === 'undo') return env.canUndo;
	if (action.id === 'redo') return env.canRedo;
	return env.selection.size >= (action.needs ?? 0);
}
