/**
 * No page code runs the glass check or the ghost check itself: the glass panel and the canvas
 * read the design-check worker's result. Only the worker's job (which the page also runs when
 * the worker cannot) calls them; type imports are fine.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const PAGE_FOLDERS = ['src/lib/ui', 'src/lib/editor', 'src/lib/state', 'src/routes'];
const CHECKS = /import\s+(?!type\b)[^;]*from\s+'[^']*core\/glass\/(check-glass|ghost-check)'/;

function sources(folder: string): string[] {
	return readdirSync(folder).flatMap((name) => {
		const path = join(folder, name);
		if (statSync(path).isDirectory()) return sources(path);
		return /\.(ts|svelte)$/.test(name) ? [path] : [];
	});
}

describe('glass check off the page', () => {
	it('no page module imports the glass or ghost check', () => {
		const files = PAGE_FOLDERS.flatMap(sources);
		expect(files.length).toBeGreaterThan(50);
		const offenders = files.filter((file) => CHECKS.test(readFileSync(file, 'utf8')));
		expect(offenders).toEqual([]);
	});
});
