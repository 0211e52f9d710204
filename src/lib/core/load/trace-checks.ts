/**
 * Settling of every ITO trace the design knows: R = R_s·L/W, τ = R·C with the pixel's largest
 * (on, coldest) capacitance, against the settling window of the waveform (trace-rc.ts).
 */
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import type { LoadSettings } from './load-settings';
import { RC_FAIL_RATIO, RC_WARN_RATIO, traceResistance_ohm } from './trace-rc';

export interface TraceCheck {
	electrode: string;
	length_mm: number;
	width_mm: number;
	resistance_ohm: number;
	tau_us: number;
	/** τ over the settling window. */
	ratio: number;
	findings: Finding[];
}

export function traceChecks(options: {
	design: Design;
	settings: LoadSettings;
	maxOn_F: ReadonlyMap<string, number>;
	window_s: number;
}): TraceCheck[] {
	const { design, settings, window_s } = options;
	const known = new Set(design.electrodes.map((e) => e.id));
	return settings.traces.map((trace, index) => {
		const resistance_ohm = traceResistance_ohm({
			sheetResistance_ohm_per_sq: settings.sheetResistance_ohm_per_sq,
			length_mm: trace.length_mm,
			width_mm: trace.width_mm
		});
		const tau_s = resistance_ohm * (options.maxOn_F.get(trace.electrode) ?? 0);
		const ratio = tau_s / window_s;
		const findings: Finding[] = [];
		const where = `${trace.length_mm} mm × ${trace.width_mm} mm at ${settings.sheetResistance_ohm_per_sq} Ω/□`;
		if (!known.has(trace.electrode)) {
			findings.push(
				finding({
					code: 'load.trace-unknown-electrode',
					severity: 'warn',
					message: `load.traces[${index}].electrode: no electrode "${trace.electrode}" in the design.`,
					fix: 'Point the trace at an existing electrode or remove it.'
				})
			);
		} else if (ratio > RC_WARN_RATIO) {
			const fail = ratio > RC_FAIL_RATIO;
			findings.push(
				finding({
					code: fail ? 'load.rc-too-slow' : 'load.rc-marginal',
					severity: fail ? 'fail' : 'warn',
					message:
						`The trace to ${trace.electrode} (${where}, ${resistance_ohm.toPrecision(3)} Ω) gives τ = ` +
						`${(tau_s * 1e6).toPrecision(3)} µs, ${(ratio * 100).toFixed(0)} % of the ${(window_s * 1e6).toPrecision(3)} µs settling window.`,
					fix: 'Widen or shorten the trace, use lower-resistance ITO, or lower the frame rate or the number of commons.',
					electrodes: [trace.electrode]
				})
			);
		}
		return { ...trace, resistance_ohm, tau_us: tau_s * 1e6, ratio, findings };
	});
}
