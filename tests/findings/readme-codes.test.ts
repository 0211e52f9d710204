import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FINDING_CODES } from '../../src/lib/core/findings/codes';
import { findingCodesMarkdown, withFindingCodes } from '../../src/lib/core/findings/codes-markdown';

const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');

describe('README finding codes', () => {
	it('lists every registered code with its meaning', () => {
		for (const c of FINDING_CODES)
			expect(readme, c.code).toContain(`| \`${c.code}\` | ${c.meaning}`);
	});

	it('is the table generated from the registry (run scripts/finding-codes-readme.ts)', () => {
		expect(withFindingCodes(readme)).toBe(readme);
		expect(findingCodesMarkdown().split('\n')).toHaveLength(FINDING_CODES.length + 2);
	});
});
