// The ahead-of-time CLI bundle: it runs on its own, and a command loads only the modules it needs
// (drive never pulls in the schema library or the colour library that check needs).
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

let out = '';
beforeAll(() => {
	out = mkdtempSync(join(tmpdir(), 'sunglyph-cli-'));
	execFileSync(process.execPath, ['scripts/build-cli.js'], {
		env: { ...process.env, SUNGLYPH_CLI_OUT: out },
		stdio: 'ignore'
	});
}, 60_000);
afterAll(() => rmSync(out, { recursive: true, force: true }));

/** The text of a chunk and of every chunk it imports statically. */
function closure(file: string, seen = new Set<string>()): string {
	if (seen.has(file)) return '';
	seen.add(file);
	const text = readFileSync(join(out, file), 'utf8');
	const imports = [...text.matchAll(/(?:from|import)\s*"\.\/([^"]+\.js)"/g)].map((m) => m[1]);
	return text + imports.map((f) => closure(f, seen)).join('');
}

const chunkOf = (command: string) => readdirSync(out).find((f) => f.startsWith(`${command}-`))!;

describe('CLI bundle', () => {
	it('answers a drive question from the bundle alone', () => {
		const text = execFileSync(
			process.execPath,
			[
				'--input-type=module',
				'-e',
				`const { main } = await import(${JSON.stringify(join(out, 'main.js'))});` +
					`process.exitCode = await main(process.argv.slice(1));`,
				'drive',
				'--commons',
				'4',
				'--bias',
				'1/3',
				'--volts',
				'3',
				'--json'
			],
			{ encoding: 'utf8', cwd: tmpdir() }
		);
		// 1/4 duty, 1/3 bias: V_on/V_off = √3 (Alt & Pleshko 1974).
		expect(JSON.parse(text).selectionRatio).toBeCloseTo(Math.sqrt(3), 9);
	});

	it('loads the schema and colour libraries only for commands that need them', () => {
		const drive = closure(chunkOf('drive'));
		const check = closure(chunkOf('check'));
		expect(check).toContain('ZodError');
		expect(check).toContain('differenceCiede2000');
		expect(drive).not.toContain('ZodError');
		expect(drive).not.toContain('differenceCiede2000');
		expect(drive).not.toContain('solveDirector');
		expect(closure('main.js')).not.toContain('ZodError');
	});
});
