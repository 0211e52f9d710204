/** Computes viewing-angle maps off the main thread, keeping the last few per cell in a cache. */
import { viewAngleReport, type ViewAngleReport } from '$lib/core/viewangle/view-angle-report';
import { orientationFindings } from '$lib/core/viewangle/orientation-findings';
import { viewAngleKey, type ViewAngleRequest, type ViewAngleResponse } from './view-angle-protocol';

const CACHE_SIZE = 8;
const cache = new Map<string, ViewAngleReport>();
const post = (message: ViewAngleResponse) => (self as unknown as Worker).postMessage(message);

self.onmessage = (event: MessageEvent<ViewAngleRequest>) => {
	const { id, design, polarStep_deg, azimuthStep_deg } = event.data;
	const start = performance.now();
	try {
		const key = viewAngleKey(event.data);
		const hit = cache.get(key);
		if (hit) {
			// the electrodes may have changed: the parallax check is cheap, redo it
			const findings = [
				...orientationFindings(design),
				...hit.findings.filter(
					(f) =>
						!f.code.startsWith('viewangle.parallax') &&
						f.code !== 'viewangle.rubbing-twist-mismatch'
				)
			];
			post({
				id,
				kind: 'result',
				report: { ...hit, findings },
				elapsed_ms: performance.now() - start,
				cached: true
			});
			return;
		}
		const report = viewAngleReport({
			design,
			polarStep_deg,
			azimuthStep_deg,
			onProgress: (done, total) => post({ id, kind: 'progress', done, total })
		});
		cache.set(key, report);
		if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
		post({ id, kind: 'result', report, elapsed_ms: performance.now() - start, cached: false });
	} catch (error) {
		post({ id, kind: 'error', message: error instanceof Error ? error.message : String(error) });
	}
};
