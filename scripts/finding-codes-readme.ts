// Rewrites the README's table of finding codes from the registry (src/lib/core/findings/codes.ts).
import { readFileSync, writeFileSync } from 'node:fs';
import { withFindingCodes } from '../src/lib/core/findings/codes-markdown';

const path = new URL('../README.md', import.meta.url);
const next = withFindingCodes(readFileSync(path, 'utf8'));
if (next === null) {
	console.error('README.md lacks the finding-codes markers');
	process.exit(2);
}
writeFileSync(path, next);
console.log('README.md: finding codes table updated');
