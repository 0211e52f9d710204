import { describe, expect, it } from 'vitest';
import { DesignState } from '$lib/state/design-state.svelte';
import { EditSession } from '$lib/state/edit-session.svelte';
import { moveElectrodes } from '$lib/core/commands/move-electrodes';
import { deleteElectrodes } from '$lib/core/commands/delete-electrodes';
import { testDesign } from './fixtures';

function setup() {
	const doc = new DesignState(testDesign());
	const session = new EditSession(doc);
	return { doc, session };
}

describe('edit session', () => {
	it('records a command as one undo step and publishes it', () => {
		const { doc, session } = setup();
		const before = doc.design;
		const outcome = session.run('Move', (d) =>
			moveElectrodes(d, { ids: ['a'], dx_mm: 1, dy_mm: 0 })
		);
		expect(outcome.ok).toBe(true);
		expect(session.canUndo).toBe(true);
		expect(session.undoLabel).toBe('Move');
		expect(doc.design.electrodes[0].outline[0].x).toBe(11);
		session.undo();
		expect(doc.design.electrodes).toEqual(before.electrodes);
		expect(session.canRedo).toBe(true);
		session.redo();
		expect(doc.design.electrodes[0].outline[0].x).toBe(11);
	});

	it('refuses a bad command with a notice and changes nothing', () => {
		const { doc, session } = setup();
		const before = doc.design;
		const outcome = session.run('Delete', (d) => deleteElectrodes(d, { ids: ['nope'] }));
		expect(outcome.ok).toBe(false);
		expect(session.notice).toMatch(/^Delete: unknown electrode "nope"/);
		expect(doc.design).toBe(before);
		expect(session.canUndo).toBe(false);
	});

	it('publishes a gesture only when it ends, as one step; cancel restores', () => {
		const { doc, session } = setup();
		const before = doc.design;
		session.beginGesture('Move');
		for (const dx of [1, 2, 3])
			session.previewGesture((start) => moveElectrodes(start, { ids: ['a'], dx_mm: dx, dy_mm: 0 }));
		expect(session.design.electrodes[0].outline[0].x).toBe(13);
		expect(doc.design).toBe(before);
		session.commitGesture();
		expect(doc.design.electrodes[0].outline[0].x).toBe(13);
		session.undo();
		expect(doc.design.electrodes[0].outline[0].x).toBe(10);
		expect(session.canUndo).toBe(false);
		session.beginGesture('Move');
		session.previewGesture((start) => moveElectrodes(start, { ids: ['a'], dx_mm: 5, dy_mm: 0 }));
		session.cancelGesture();
		expect(doc.design.electrodes[0]).toBe(before.electrodes[0]);
		expect(session.canUndo).toBe(false);
	});

	it('takes drive changes made elsewhere as undo steps', () => {
		const { doc, session } = setup();
		doc.replace({ ...doc.design, drive: { ...doc.design.drive, amplitude_V: 3.9 } });
		session.sync(doc.design, doc.documentSerial);
		expect(session.canUndo).toBe(true);
		session.undo();
		expect(doc.design.drive.amplitude_V).not.toBe(3.9);
	});

	it('keeps the undo history when the cell is changed elsewhere, and can undo that too', () => {
		const { doc, session } = setup();
		session.run('Move', (d) => moveElectrodes(d, { ids: ['a'], dx_mm: 1, dy_mm: 0 }));
		const gap = doc.design.cell.gap_um;
		doc.replace({ ...doc.design, cell: { ...doc.design.cell, gap_um: gap + 1 } });
		session.sync(doc.design, doc.documentSerial);
		expect(session.undoLabel).toBe('Settings');
		session.run('Move', (d) => moveElectrodes(d, { ids: ['b'], dx_mm: 1, dy_mm: 0 }));
		expect(doc.design.cell.gap_um).toBe(gap + 1);
		session.undo();
		expect(doc.design.cell.gap_um).toBe(gap + 1);
		session.undo();
		expect(doc.design.cell.gap_um).toBe(gap);
		expect(doc.design.electrodes[0].outline[0].x).toBe(11);
		session.undo();
		expect(doc.design.electrodes[0].outline[0].x).toBe(10);
	});

	it('ignores an outside change that changes nothing', () => {
		const { doc, session } = setup();
		doc.replace({ ...doc.design, cell: { ...doc.design.cell } });
		session.sync(doc.design, doc.documentSerial);
		expect(session.canUndo).toBe(false);
	});

	it('starts a fresh history for another document', () => {
		const { doc, session } = setup();
		session.run('Move', (d) => moveElectrodes(d, { ids: ['a'], dx_mm: 1, dy_mm: 0 }));
		doc.replaceDocument(testDesign(), 'other.json');
		session.sync(doc.design, doc.documentSerial);
		expect(session.canUndo).toBe(false);
		expect(session.design).toBe(doc.design);
	});
});
