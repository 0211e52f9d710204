/**
 * Fuzz suite: generated hostile design files go through the command line's `check` (the same
 * reader the app uses); each must end with exit 0, 1 or 2 as documented — never 3, never a stack
 * trace. CI runs a bounded number; `npm run fuzz` runs 10,000 and also holds each case to one
 * second of CPU time.
 */
import { describe, expect, it } from 'vitest';
import { fuzzCase } from './fuzz-cases';
import { runCliBytes } from './run-cli-bytes';
import { readDesignBytes } from '../../src/lib/core/design/read-design-bytes';

const COUNT = Number(process.env.FUZZ_COUNT ?? 200);
const TIME_LIMIT_ms = process.env.FUZZ_TIME_LIMIT_MS
	? Number(process.env.FUZZ_TIME_LIMIT_MS)
	: null;

describe('fuzzed design files', () => {
	it(
		`end with a documented exit code and no stack trace (${COUNT} cases)`,
		async () => {
			const codes = [0, 0, 0, 0];
			let slowest = { label: '', ms: 0 };
			for (let i = 0; i < COUNT; i++) {
				const { label, bytes } = fuzzCase(i);
				// CPU time, not wall time: the limit is about our work, not about a busy machine.
				const start = process.cpuUsage();
				const r = await runCliBytes(['check', 'fuzz.json', '--json'], { 'fuzz.json': bytes });
				const used = process.cpuUsage(start);
				const ms = (used.user + used.system) / 1000;
				if (ms > slowest.ms) slowest = { label, ms };
				expect([0, 1, 2], `${label}: ${r.stderr}`).toContain(r.code);
				codes[r.code]++;
				expect(r.stderr, label).not.toMatch(/\n\s+at |internal error/);
				if (r.code === 2) expect(r.stderr, label).toMatch(/: /);
				else expect(() => JSON.parse(r.stdout), label).not.toThrow();
				// The app reads the same bytes with the same reader: same verdict on validity.
				expect(readDesignBytes(bytes).ok, label).toBe(r.code !== 2);
				if (TIME_LIMIT_ms !== null) expect(ms, label).toBeLessThan(TIME_LIMIT_ms);
			}
			console.log(
				`[fuzz] ${COUNT} files: exit 0 ×${codes[0]}, 1 ×${codes[1]}, 2 ×${codes[2]}; ` +
					`slowest ${slowest.ms.toFixed(0)} ms CPU (${slowest.label})`
			);
		},
		COUNT * 2000 + 10_000
	);
});
