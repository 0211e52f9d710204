/**
 * Start-up figures of the command line, measured side by side in one run: a bare `node -e 0`
 * and `sunglyph drive … --json` alternate, so load on a shared machine hits both alike. Targets:
 * drive within 2× a bare Node start; `check` of the demo design within 1 s. Medians, never a test.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function timed(args: string[]): number {
	const start = performance.now();
	const r = spawnSync(process.execPath, args, { cwd: root, encoding: 'utf8' });
	const elapsed = performance.now() - start;
	if (r.status !== 0 && r.status !== 1) throw new Error(`${args.join(' ')} failed: ${r.stderr}`);
	return elapsed;
}

execFileSync(process.execPath, ['scripts/build-cli.js'], { cwd: root, stdio: 'ignore' });
const dir = mkdtempSync(join(tmpdir(), 'sunglyph-bench-'));
const demoPath = join(dir, 'demo.json');
writeFileSync(demoPath, execFileSync(process.execPath, ['bin/sunglyph.js', 'demo'], { cwd: root }));

const drive = [
	'bin/sunglyph.js',
	'drive',
	'--commons',
	'4',
	'--bias',
	'1/3',
	'--volts',
	'3',
	'--json'
];
const bare: number[] = [];
const cli: number[] = [];
const check: number[] = [];
timed(['-e', '0']);
timed(drive); // warm the file cache
for (let i = 0; i < 15; i++) {
	bare.push(timed(['-e', '0']));
	cli.push(timed(drive));
}
for (let i = 0; i < 5; i++) check.push(timed(['bin/sunglyph.js', 'check', demoPath, '--json']));
rmSync(dir, { recursive: true, force: true });

const ratio = median(cli) / median(bare);
const row = (label: string, ms: number, note: string) =>
	console.log(`${label.padEnd(34)}${ms.toFixed(0).padStart(7)} ms  ${note}`);
console.log('\nCommand line (medians, side by side)');
row('node -e 0', median(bare), `${bare.length} runs`);
row(
	'sunglyph drive --json',
	median(cli),
	`${cli.length} runs; ${ratio.toFixed(2)}× bare Node (target ≤ 2×)`
);
row('sunglyph check demo --json', median(check), `${check.length} runs (target ≤ 1000 ms)`);
