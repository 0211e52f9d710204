// Guards for serving files that may vanish: a rebuild replaces the build folder while the
// server runs, so a hashed asset or its precompressed twin can be gone between the server's
// start-up listing and the request.
import { existsSync } from 'node:fs';
import { resolve, sep } from 'node:path';

const ASSET_PREFIX = '/_app/';

/** The file a request for a built asset names, or null when the request is not for one. */
export function assetFileOf(url, clientDir) {
	const pathname = (url ?? '/').split('?')[0];
	if (!pathname.startsWith(ASSET_PREFIX)) return null;
	let decoded;
	try {
		decoded = decodeURIComponent(pathname);
	} catch {
		return null;
	}
	const file = resolve(clientDir, '.' + decoded);
	return file.startsWith(clientDir + sep) ? file : null;
}

/**
 * False when the request names a built asset that no longer exists (answer 404). Drops an
 * encoding from Accept-Encoding when its precompressed file is gone, so the plain file is sent.
 */
export function guardStaticRequest(req, clientDir) {
	const file = assetFileOf(req.url, clientDir);
	if (file === null) return true;
	if (!existsSync(file)) return false;
	const accepted = req.headers['accept-encoding'];
	if (typeof accepted === 'string') {
		const kept = accepted
			.split(',')
			.map((part) => part.trim())
			.filter((part) => {
				const name = part.split(';')[0];
				if (name === 'br') return existsSync(file + '.br');
				if (name === 'gzip') return existsSync(file + '.gz');
				return true;
			});
		req.headers['accept-encoding'] = kept.join(', ');
	}
	return true;
}

/** Any file stream piped into the response that fails ends this response, not the process. */
export function guardStreamErrors(res, onError) {
	res.on('pipe', (source) => source.on('error', () => onError(res)));
}
