// Bundles the command line ahead of time into dist/cli/ (ES modules, one chunk per command, so
// each command loads only what it needs) and records the source files it was built from; the
// launcher bin/sunglyph.js runs the bundle while it is newer than all of them. Run by
// `npm ci`/`npm install` (prepare) and by `npm run build`; the output is not committed.
import { build } from 'esbuild';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
// SUNGLYPH_CLI_OUT: another output folder (tests build there).
const outdir = process.env.SUNGLYPH_CLI_OUT ?? `${root}dist/cli`;
rmSync(outdir, { recursive: true, force: true });
mkdirSync(outdir, { recursive: true });
const result = await build({
	absWorkingDir: root,
	entryPoints: { main: 'src/cli/main.ts' },
	bundle: true,
	splitting: true,
	format: 'esm',
	platform: 'node',
	target: 'node20',
	// Smaller text to parse at each start; names kept so an internal error's trace stays readable.
	minify: true,
	keepNames: true,
	outdir,
	metafile: true,
	// paper.js tries optional DOM packages in Node inside try/catch; they are never bundled.
	external: ['jsdom', 'jsdom/*', 'canvas'],
	// CommonJS dependencies (paper.js) call require() for Node built-ins: give each chunk one.
	banner: {
		js: "import { createRequire as createRequireForChunk } from 'node:module'; const require = createRequireForChunk(import.meta.url);"
	},
	logLevel: 'warning'
});
const inputs = Object.keys(result.metafile.inputs).filter((p) => !p.startsWith('node_modules/'));
writeFileSync(`${outdir}/inputs.json`, JSON.stringify(inputs));
console.log(`CLI bundled into ${outdir} from ${inputs.length} source files`);
