// Starts the built app (adapter-node output in build/) and prints its address.
import { existsSync } from 'node:fs';

if (!existsSync(new URL('../build/index.js', import.meta.url))) {
	console.error('No build found: run "npm run build" first (npm start does this for you).');
	process.exit(1);
}
process.env.PORT ??= '3000';
process.env.HOST ??= '127.0.0.1';
await import('../build/index.js');
const host = process.env.HOST === '0.0.0.0' ? 'localhost' : process.env.HOST;
console.log(
	`\nsunglyph is running at http://${host}:${process.env.PORT}/  (the demo design opens there)\n`
);
