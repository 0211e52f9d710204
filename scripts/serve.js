// Starts the built app (adapter-node output) and prints its address.
// A file that disappears under the running server — the app rebuilt in another shell — is
// answered with 404, never an unhandled stream error that ends the process.
// SUNGLYPH_BUILD_DIR picks the build folder (default build/), so a test server can serve a
// folder of its own while the developer rebuilds build/.
import { existsSync } from 'node:fs';
import { createServer } from 'node:http';
import { resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { guardStaticRequest, guardStreamErrors } from './static-guard.js';

const root = fileURLToPath(new URL('..', import.meta.url));
const dir = resolve(root, process.env.SUNGLYPH_BUILD_DIR ?? 'build');
if (!existsSync(resolve(dir, 'handler.js'))) {
	console.error(
		`No build found in ${dir}: run "npm run build" first (npm start does this for you).`
	);
	process.exit(1);
}
const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';
const { handler } = await import(pathToFileURL(resolve(dir, 'handler.js')).href);
const clientDir = resolve(dir, 'client');

// One line per refused request, in the same form as the app's own (src/lib/server/request-log.ts).
const notFound = (req, res) => {
	// eslint-disable-next-line no-control-regex
	const path = (req.url ?? '/').split('?')[0].replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
	console.warn(`404 ${req.method} ${path.slice(0, 200)}: no such file`);
	if (res.headersSent) return void res.destroy();
	res.writeHead(404, { 'content-type': 'text/plain; charset=utf-8' }).end('Not found');
};

const server = createServer((req, res) => {
	guardStreamErrors(res, () => notFound(req, res));
	if (!guardStaticRequest(req, clientDir)) return notFound(req, res);
	try {
		handler(req, res, () => notFound(req, res));
	} catch (error) {
		console.error(error);
		if (!res.headersSent) res.writeHead(500).end('Internal error');
	}
});
server.listen(port, host, () => {
	const { port: actualPort } = server.address();
	const shown = host === '0.0.0.0' ? 'localhost' : host;
	console.log(
		`\nsunglyph is running at http://${shown}:${actualPort}/  (the demo design opens there)\n`
	);
});
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => process.exit(0));
