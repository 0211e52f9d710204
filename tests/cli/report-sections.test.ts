/**
 * The design report holds every section a design review needs and exactly the findings the
 * checks report: each finding code that `sunglyph check --json` prints (the glass check's among
 * them once the design has a glass drawing) appears in the report's HTML and in the text poppler's pdftotext reads back from its
 * PDF, for the demo and for a design that fails several checks.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import type { Design } from '../../src/lib/core/design/schema';
import { findChromium } from '../../src/cli/print-pdf';
import { DEFAULT_LOAD_SETTINGS } from '../../src/lib/core/load/load-settings';
import { runCli } from './run-cli';

const demo = demoDesign();
const failing: Design = {
	...demo,
	name: 'Failing review sample',
	cell: { ...demo.cell, material: { preset: 'cyanobiphenyl-single' } },
	drive: { ...demo.drive, amplitude_V: 3, frameRate_Hz: 10 },
	electrodes: demo.electrodes.map((e, i) => (i < 2 ? { ...e, common: null } : e)),
	// A glass drawing begun by hand (one lead), so the glass check joins the findings.
	glassArt: {
		...demo.glassArt,
		ledge: { ...demo.glassArt.ledge, depth_mm: 1.5 },
		traces: [
			{
				id: 'hand-lead',
				plate: 'segment',
				net: demo.segmentLines[0].id,
				width_mm: 0.05,
				points: [
					{ x: 10, y: 10 },
					{ x: 12, y: 10 }
				]
			}
		]
	},
	load: { ...DEFAULT_LOAD_SETTINGS, battery_mAh: 220, budget_uA: 1 }
};
/** A single-compound cyanobiphenyl clears near 35 °C: nematic nowhere in 36–60 °C. */
const clearsBelowRange: Design = {
	...failing,
	drive: { ...failing.drive, temperature: { min_C: 36, max_C: 60 } }
};

const HEADINGS = [
	'Drawing',
	'Pin map',
	'Drive',
	'Cell and optics',
	'Design rules',
	'Electrical load',
	'Legibility',
	'Glass',
	'Findings',
	'Model limits and cautions'
];

/** Every `code` of a finding-shaped object anywhere in the JSON. */
function codesIn(value: unknown, into = new Set<string>()): Set<string> {
	if (Array.isArray(value)) for (const v of value) codesIn(v, into);
	else if (value && typeof value === 'object') {
		const o = value as Record<string, unknown>;
		if (typeof o.code === 'string' && typeof o.severity === 'string' && 'message' in o)
			into.add(o.code);
		for (const v of Object.values(o)) codesIn(v, into);
	}
	return into;
}

async function checkCodes(design: Design): Promise<string[]> {
	const result = await runCli(['check', 'd.json', '--json'], { 'd.json': serializeDesign(design) });
	expect(result.code, result.stderr).toBeLessThan(2);
	return [...codesIn(JSON.parse(result.stdout))].sort();
}

async function writeReport(design: Design, pdf = false): Promise<string> {
	const out = join(mkdtempSync(join(tmpdir(), 'report-sections-')), pdf ? 'r.pdf' : 'r.html');
	const args = ['report', 'd.json', '--out', out, ...(pdf ? ['--pdf'] : [])];
	const result = await runCli(args, { 'd.json': serializeDesign(design) });
	expect(result.code, result.stderr).toBe(0);
	return out;
}

describe('the design report sections', () => {
	for (const [label, design] of [
		['the demo', demo],
		['a failing design', failing]
	] as const) {
		it(`lists every finding code check --json prints for ${label}, under every heading`, async () => {
			const codes = await checkCodes(design);
			expect(codes.length).toBeGreaterThan(5);
			const html = readFileSync(await writeReport(design), 'utf8');
			for (const code of codes) expect(html, code).toContain(`<code>${code}</code>`);
			for (const h of HEADINGS) expect(html, h).toContain(`<h2>${h}</h2>`);
		});
	}

	it('shows the failing design’s fluid, wiring, drive, glass and load failures', async () => {
		const codes = await checkCodes(failing);
		for (const code of [
			'optics.fluid-clears',
			'wiring.unassigned',
			'drive.frame-rate-low',
			'glass.ledge-short',
			'load.current-over-budget'
		])
			expect(codes).toContain(code);
	});

	it('has the load table per line and common, the total current and the battery life', async () => {
		const html = readFileSync(await writeReport(failing), 'utf8');
		const load = html.slice(
			html.indexOf('<h2>Electrical load</h2>'),
			html.indexOf('<h2>Legibility</h2>')
		);
		for (const l of failing.segmentLines) expect(load).toContain(`<td>${l.name}</td>`);
		for (const c of failing.commons) expect(load).toContain(`<td>${c.name}</td>`);
		expect(load).toContain('Total current');
		expect(load).toContain('Battery life');
		expect(load).toContain('220 mAh');
		const glass = html.slice(html.indexOf('<h2>Glass</h2>'), html.indexOf('<h2>Findings</h2>'));
		for (const word of ['Outline', 'Seal', 'Ledge', 'Pads', 'Back plates', 'Ghosts'])
			expect(glass).toContain(word);
		// One back plate per electrode on a common; the two unassigned electrodes have none.
		const onCommons = failing.electrodes.filter((e) => e.common !== null).length;
		expect(onCommons).toBe(failing.electrodes.length - 2);
		expect(glass).toContain(`${onCommons} on ${failing.commons.length} commons`);
	});

	it('keeps every section when no optics can be computed, saying why', async () => {
		const html = readFileSync(await writeReport(clearsBelowRange), 'utf8');
		for (const h of HEADINGS) expect(html, h).toContain(`<h2>${h}</h2>`);
		expect(html).toContain('<code>optics.fluid-clears</code>');
		expect(html).toContain('Not evaluated: the cell model gave no optics.');
	});

	const hasPoppler = existsSync('/usr/bin/pdftotext');
	const inCi = process.env.CI === 'true' || process.env.CI === '1';
	it.skipIf(!inCi && !(hasPoppler && findChromium()))(
		'prints every heading and every code into the PDF text, for the demo and a failing design',
		{ timeout: 240_000 },
		async () => {
			for (const design of [demo, failing]) {
				const codes = await checkCodes(design);
				const pdf = await writeReport(design, true);
				const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
				expect(text).toContain(design.name);
				for (const code of codes) expect(text, code).toContain(code);
				const lines = text.split('\n').map((l) => l.trim());
				for (const h of HEADINGS) expect(lines, h).toContain(h);
			}
		}
	);
});
