/**
 * A lead drawn by hand across another common's back plate is a ghost; clicking its finding picks
 * exactly that lead. Geometry by hand: SEG1's lead runs along y = 11 mm from A (10–12 mm) to
 * x = 30 mm, straight through B (20–22 mm), which sits on COM2's plate — so (COM2, SEG1) lights
 * there, inside the viewing area (C gives that pair an electrode, so the crossing is driven).
 */
import { describe, expect, it } from 'vitest';
import { checkGlass } from '$lib/core/glass/check-glass';
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { Design } from '$lib/core/design/schema';
import { ghostLeads } from '$lib/editor/ghost-leads';
import { electrode, square, testDesign } from '../commands/fixtures';

const across: Trace = {
	id: 'hand-seg1',
	plate: 'segment',
	net: 'seg1',
	width_mm: 0.1,
	points: [
		{ x: 11, y: 11 },
		{ x: 30, y: 11 }
	]
};
const aside: Trace = {
	...across,
	id: 'hand-seg2',
	net: 'seg2',
	points: [
		{ x: 21, y: 30 },
		{ x: 30, y: 30 }
	]
};

function design(): Design {
	const d = testDesign();
	return {
		...d,
		electrodes: [
			electrode('a', square(10, 10), { common: 'com1', line: 'seg1' }),
			electrode('b', square(20, 10), { common: 'com2', line: 'seg2' }),
			electrode('c', square(40, 30), { common: 'com2', line: 'seg1' })
		],
		groups: [],
		glassArt: { ...d.glassArt, traces: [across, aside] }
	};
}

describe('ghost findings pick their leads', () => {
	it('names the hand-drawn lead over the foreign plate, and only it', () => {
		const report = checkGlass(design());
		const ghost = report.findings.find(
			(f) => f.code === 'glass.ghost-visible' && f.message.includes('(COM2, SEG1)')
		);
		expect(ghost).toBeDefined();
		const leads = ghostLeads({
			finding: ghost!,
			ghosts: report.ghosts,
			traces: design().glassArt.traces
		});
		expect(leads.map((t) => t.id)).toEqual(['hand-seg1']);
	});

	it('picks nothing for findings that are not ghosts', () => {
		const report = checkGlass(design());
		for (const f of report.findings.filter((x) => !x.code.startsWith('glass.ghost')))
			expect(
				ghostLeads({ finding: f, ghosts: report.ghosts, traces: design().glassArt.traces })
			).toEqual([]);
	});
});
