/**
 * `npm run mutate`: applies each mutant of scripts/mutants.ts to a temporary copy of the project
 * (node_modules linked, never the working tree), runs the tests that guard the mutated code and
 * prints a table of killed and surviving mutants. Exit 1 when any survives, 2 when a mutant no
 * longer matches its file (the list needs updating).
 */
import { spawnSync } from 'node:child_process';
import {
	cpSync,
	existsSync,
	mkdtempSync,
	readFileSync,
	rmSync,
	symlinkSync,
	writeFileSync
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { MUTANTS, type Mutant } from './mutants';

const root = resolve(import.meta.dirname, '..');
const COPIED = [
	'src',
	'tests',
	'scripts',
	'package.json',
	'vite.config.ts',
	'tsconfig.json',
	'svelte.config.js',
	'.svelte-kit'
];

function makeCopy(): string {
	const dir = mkdtempSync(join(tmpdir(), 'sunglyph-mutate-'));
	for (const entry of COPIED) {
		if (existsSync(join(root, entry)))
			cpSync(join(root, entry), join(dir, entry), { recursive: true });
	}
	symlinkSync(join(root, 'node_modules'), join(dir, 'node_modules'), 'dir');
	return dir;
}

function applyEdits(text: string, mutant: Mutant): string {
	let out = text;
	for (const [from, to] of mutant.edits) {
		const count = out.split(from).length - 1;
		if (count !== 1)
			throw new Error(`${mutant.id}: "${from}" occurs ${count} times in ${mutant.file}`);
		out = out.replace(from, to);
	}
	return out;
}

function runTests(dir: string, tests: readonly string[]): boolean {
	const result = spawnSync('npx', ['vitest', 'run', '--reporter=dot', ...tests], {
		cwd: dir,
		encoding: 'utf8',
		env: { ...process.env, CI: 'true' },
		timeout: 600_000
	});
	return result.status === 0;
}

const only = process.argv.slice(2);
const chosen = only.length ? MUTANTS.filter((m) => only.some((o) => m.id.includes(o))) : MUTANTS;
const dir = makeCopy();
const rows: Array<{ id: string; verdict: string }> = [];
let stale = false;
try {
	for (const mutant of chosen) {
		const path = join(dir, mutant.file);
		const original = readFileSync(path, 'utf8');
		let mutated: string;
		try {
			mutated = applyEdits(original, mutant);
		} catch (error) {
			rows.push({ id: mutant.id, verdict: 'STALE' });
			console.error(String(error));
			stale = true;
			continue;
		}
		writeFileSync(path, mutated);
		try {
			const passed = runTests(dir, mutant.tests);
			rows.push({ id: mutant.id, verdict: passed ? 'SURVIVED' : 'killed' });
		} finally {
			writeFileSync(path, original);
		}
		process.stderr.write(`${rows.at(-1)!.verdict.padEnd(8)} ${mutant.id}\n`);
	}
} finally {
	rmSync(dir, { recursive: true, force: true });
}
const width = Math.max(...rows.map((r) => r.id.length), 6);
console.log(`${'mutant'.padEnd(width)}  verdict`);
for (const r of rows) console.log(`${r.id.padEnd(width)}  ${r.verdict}`);
const killed = rows.filter((r) => r.verdict === 'killed').length;
console.log(`\n${killed} of ${rows.length} mutants killed`);
process.exitCode = stale ? 2 : killed === rows.length ? 0 : 1;
