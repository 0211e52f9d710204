#!/usr/bin/env node
// Command-line entry. Runs the ahead-of-time bundle in dist/cli/ (made by `npm ci` or
// `npm run build`) when it is newer than every source file it was built from; otherwise runs the
// TypeScript sources through tsx, which is slower to start but always current. Anything that
// escapes main() is an internal error: exit 3, one line, never a design verdict.
import { readFileSync, statSync } from 'node:fs';

const root = new URL('../', import.meta.url);
const bundle = new URL('dist/cli/main.js', root);

function bundleIsCurrent() {
	try {
		const built_ms = statSync(bundle).mtimeMs;
		const inputs = JSON.parse(readFileSync(new URL('dist/cli/inputs.json', root), 'utf8'));
		return inputs.every((path) => statSync(new URL(path, root)).mtimeMs <= built_ms);
	} catch {
		return false;
	}
}

try {
	let main;
	if (bundleIsCurrent()) {
		({ main } = await import(bundle.href));
	} else {
		const { register } = await import('tsx/esm/api');
		register();
		({ main } = await import(new URL('src/cli/main.ts', root).href));
	}
	process.exitCode = await main(process.argv.slice(2));
} catch (error) {
	const what = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
	process.stderr.write(
		`sunglyph: internal error (${what.split('\n')[0]}); please report it to the sunglyph maintainers\n`
	);
	process.exitCode = 3;
}
