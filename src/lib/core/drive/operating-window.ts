/**
 * The range of drive amplitudes for which every on pixel reaches V90 and every off pixel stays at
 * or below V10, at every temperature checked (the rule of LCD-driver data sheets: V_on ≥ V_th(on),
 * V_off ≤ V_th(off) over the whole operating range).
 *
 * V_on and V_off are both proportional to the amplitude V, V_on = k_on·V and V_off = k_off·V, so
 * each temperature allows V in [V90(T)/k_on, V10(T)/k_off] and the design's window is the
 * intersection. The best amplitude balances the relative margins of the two limits, which puts it
 * at the geometric mean of the window's ends.
 */
import { rmsVoltages, isStaticDrive } from './rms-drive';
import type { ThresholdPoint } from './threshold-at-temperature';

/**
 * Static drive has no ghosting limit, so its best amplitude is the lowest that switches at every
 * temperature plus this headroom (a default of this tool, not a published figure).
 */
export const STATIC_HEADROOM = 0.2;

export interface TemperatureCheck extends ThresholdPoint {
	on_V: number;
	off_V: number;
	/** V_on − V90: negative when on pixels do not reach full contrast. */
	onMargin_V: number;
	/** V10 − V_off: negative when off pixels ghost. */
	offMargin_V: number;
	/** Amplitudes this temperature alone allows; null when none does. */
	window: { min_V: number; max_V: number } | null;
}

export interface OperatingWindow {
	/** Amplitudes that work at every checked temperature; null when there are none. */
	window: { min_V: number; max_V: number } | null;
	best_V: number | null;
	/**
	 * The tightest margin at the set amplitude — the smallest relative margin over both limits and
	 * every temperature — in volts and in percent of its threshold, both of the same limit.
	 */
	margin_V: number;
	margin_percent: number;
	/** Where the tightest margin lies; null when no temperature was checked. */
	tightest: { temperature_C: number; limit: 'on' | 'off' } | null;
	perTemperature: TemperatureCheck[];
	ok: boolean;
}

export function operatingWindow(options: {
	commons: number;
	biasDivisor: number;
	amplitude_V: number;
	thresholds: readonly ThresholdPoint[];
}): OperatingWindow {
	const { commons, biasDivisor, amplitude_V, thresholds } = options;
	const unit = rmsVoltages({ commons, biasDivisor, amplitude_V: 1 });
	const atSet = rmsVoltages({ commons, biasDivisor, amplitude_V });
	let low_V = 0;
	let high_V = Infinity;
	let margin_V = Infinity;
	let margin_percent = Infinity;
	let lowest_V = Infinity;
	let tightest: OperatingWindow['tightest'] = null;
	const consider = (
		limit: 'on' | 'off',
		temperature_C: number,
		m_V: number,
		threshold_V: number
	) => {
		const percent = threshold_V > 0 ? (100 * m_V) / threshold_V : m_V < 0 ? -Infinity : Infinity;
		if (percent < margin_percent || tightest === null) {
			margin_V = m_V;
			margin_percent = percent;
			tightest = { temperature_C, limit };
		}
	};
	const perTemperature = thresholds.map((point): TemperatureCheck => {
		const min_V = point.v90_V / unit.on_V;
		const max_V = isStaticDrive(commons) ? Infinity : point.v10_V / unit.off_V;
		low_V = Math.max(low_V, min_V);
		high_V = Math.min(high_V, max_V);
		const onMargin_V = atSet.on_V - point.v90_V;
		const offMargin_V = point.v10_V - atSet.off_V;
		consider('on', point.temperature_C, onMargin_V, point.v90_V);
		consider('off', point.temperature_C, offMargin_V, point.v10_V);
		lowest_V = Math.min(lowest_V, onMargin_V, offMargin_V);
		return {
			...point,
			on_V: atSet.on_V,
			off_V: atSet.off_V,
			onMargin_V,
			offMargin_V,
			window: min_V <= max_V ? { min_V, max_V } : null
		};
	});
	const window = thresholds.length > 0 && low_V <= high_V ? { min_V: low_V, max_V: high_V } : null;
	let best_V: number | null = null;
	if (window) {
		best_V = Number.isFinite(window.max_V)
			? Math.sqrt(window.min_V * window.max_V)
			: window.min_V * (1 + STATIC_HEADROOM);
	}
	return {
		window,
		best_V,
		margin_V,
		margin_percent,
		tightest,
		perTemperature,
		ok: lowest_V >= 0 && thresholds.length > 0
	};
}
