/**
 * Bad leads as findings (`trace-faults.ts`): each names the trace by its place in the file and its
 * id, and concerns the electrodes of the trace's net (the segment line, or the common).
 */
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import type { GlassLayout } from './layout';
import { traceBox, traceFaults, type TraceFault } from './trace-faults';

function message(f: TraceFault, design: Design): { code: string; message: string; fix: string } {
	const what = `The ${f.trace.plate}-plate trace "${f.trace.id}" (glassArt.traces[${f.index}])`;
	const glass =
		f.trace.plate === 'segment' ? 'the glass' : 'the back glass (the glass less the ledge)';
	switch (f.fault) {
		case 'not-a-number':
			return {
				code: 'glass.trace-degenerate',
				message: `${what} has a point or width that is not a finite number; it is left out of both plates.`,
				fix: 'Delete the trace and draw it again, or generate the traces.'
			};
		case 'too-few-points':
			return {
				code: 'glass.trace-degenerate',
				message: `${what} has ${f.trace.points.length} point${f.trace.points.length === 1 ? '' : 's'}; a lead needs at least 2.`,
				fix: 'Delete the trace, or add a point where it should go.'
			};
		case 'no-length':
			return {
				code: 'glass.trace-degenerate',
				message: `${what} has no length: all its points coincide, leaving a stray square of ITO.`,
				fix: 'Delete the trace, or drag its end to where it should go.'
			};
		case 'no-net':
			return {
				code: 'glass.trace-no-net',
				message: `${what} belongs to "${f.trace.net}", which is not a ${f.trace.plate === 'segment' ? 'common or segment line' : 'common'} of the design; it is left out of the plates.`,
				fix: 'Delete the trace, or generate the traces again.'
			};
		case 'off-glass':
			return {
				code: 'glass.trace-off-glass',
				message: f.entirely
					? `${what} lies entirely off ${glass}: nothing is under it${f.undrawn ? ', and it is too far out to draw' : ''}.`
					: `${what} runs past the edge of ${glass}${f.undrawn ? ' so far that it is left out of the plates' : ''}.`,
				fix: `Move its points onto ${glass} (${design.glass.width_mm} × ${design.glass.height_mm} mm), or delete it.`
			};
	}
}

export function traceFindings(design: Design, layout: GlassLayout): Finding[] {
	return traceFaults(design, layout).map((f) => {
		const electrodes = design.electrodes
			.filter((e) => e.line === f.trace.net || e.common === f.trace.net)
			.map((e) => e.id);
		const drawn = f.fault !== 'not-a-number' && f.fault !== 'too-few-points' && !f.undrawn;
		return finding({
			...message(f, design),
			severity: 'fail',
			electrodes,
			location: drawn ? traceBox(f.trace) : undefined
		});
	});
}
