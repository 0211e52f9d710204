#!/usr/bin/env node
// Command-line entry: runs the TypeScript CLI through tsx's loader, so no build step is needed.
// Anything that escapes main() is an internal error: exit 3, one line, never a design verdict.
import { register } from 'tsx/esm/api';

try {
	register();
	const { main } = await import('../src/cli/main.ts');
	process.exitCode = await main(process.argv.slice(2));
} catch (error) {
	const what = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
	process.stderr.write(
		`sunglyph: internal error (${what.split('\n')[0]}); please report it to the sunglyph maintainers\n`
	);
	process.exitCode = 3;
}
