import { describe, expect, it } from 'vitest';
import {
	copySelection,
	parseClipboard,
	serializeClipboard
} from '../../src/lib/core/commands/clipboard';
import { insertedIds } from '../../src/lib/core/commands/patch-algebra';
import { pasteClipboard } from '../../src/lib/core/commands/paste-clipboard';
import { byId, emptyDesign, ids, run, testDesign } from './fixtures';

describe('clipboard', () => {
	it('copies the selection and groups wholly inside it, as validated JSON', () => {
		const d = testDesign();
		const payload = copySelection(d, { ids: ['e1', 'e2', 'e3'] });
		expect(payload.format).toBe('sunglyph-clipboard');
		expect(payload.groups.map((g) => g.id)).toEqual(['g1']);
		expect(copySelection(d, { ids: ['e1'] }).groups).toEqual([]);
		const parsed = parseClipboard(serializeClipboard(payload));
		expect(parsed).toEqual({ ok: true, payload });
	});

	it('pastes into the same design with new ids and an offset', () => {
		const d = testDesign();
		const payload = copySelection(d, { ids: ['e1', 'e2'] });
		const patch = pasteClipboard(d, { payload, dx_mm: 2, dy_mm: 2 });
		const next = run(d, patch);
		expect(insertedIds(patch)).toEqual(['e1-2', 'e2-2']);
		expect(byId(next, 'e1-2')).toMatchObject({
			common: 'com1',
			line: 'seg1',
			outline: [
				{ x: 2, y: 2 },
				{ x: 4, y: 2 },
				{ x: 4, y: 4 },
				{ x: 2, y: 4 }
			]
		});
		expect(next.groups.at(-1)).toEqual({ id: 'g1-2', name: 'Pair', members: ['e1-2', 'e2-2'] });
	});

	it('pastes into another design, dropping wiring it does not have', () => {
		const payload = copySelection(testDesign(), { ids: ['e1'] });
		const target = emptyDesign();
		const next = run(target, pasteClipboard(target, { payload }));
		expect(ids(next)).toEqual(['e1']);
		expect(byId(next, 'e1')).toMatchObject({ common: null, line: null });
	});

	it('rejects foreign or broken payloads with path-named issues', () => {
		expect(parseClipboard('hello')).toMatchObject({ ok: false, issues: [{ path: '(root)' }] });
		const bad = parseClipboard(
			JSON.stringify({ format: 'sunglyph-clipboard', version: 1, electrodes: [{ id: 'x' }] })
		);
		expect(bad.ok).toBe(false);
		if (!bad.ok) expect(bad.issues[0].path).toMatch(/^electrodes\[0\]/);
		const payload = copySelection(testDesign(), { ids: ['e1', 'e2'] });
		const dangling = parseClipboard(
			JSON.stringify({ ...payload, electrodes: payload.electrodes.slice(0, 1) })
		);
		expect(dangling).toMatchObject({ ok: false, issues: [{ path: 'groups[0].members[1]' }] });
		const dup = parseClipboard(
			JSON.stringify({
				...payload,
				groups: [],
				electrodes: [payload.electrodes[0], payload.electrodes[0]]
			})
		);
		expect(dup).toMatchObject({ ok: false, issues: [{ message: 'duplicate id "e1"' }] });
	});
});
