/**
 * Plain-language verdicts on a drive's operating window: what fails, where, and what to change.
 */
import type { OperatingWindow } from './operating-window';
import { finding, type Finding } from '../findings/finding';

const volts = (v: number) => `${v.toFixed(2)} V`;
const celsius = (t: number) => `${Number(t.toFixed(1))} °C`;

function worst<T>(items: readonly T[], score: (item: T) => number): T {
	return items.reduce((a, b) => (score(b) < score(a) ? b : a));
}

export function windowFindings(options: {
	result: OperatingWindow;
	amplitude_V: number;
	selectionRatio: number;
}): Finding[] {
	const { result, amplitude_V, selectionRatio } = options;
	const checks = result.perTemperature;
	if (checks.length === 0)
		return [
			finding({
				code: 'drive.no-temperatures',
				severity: 'fail',
				message: 'No temperatures to check.',
				fix: 'Enter an operating temperature range.'
			})
		];
	const findings: Finding[] = [];
	const hopeless = checks.filter((c) => c.window === null);
	for (const check of hopeless) {
		findings.push(
			finding({
				code: 'drive.ratio-too-low',
				severity: 'fail',
				message:
					`No amplitude works at ${celsius(check.temperature_C)}: the cell needs V90/V10 = ` +
					`${(check.v90_V / check.v10_V).toFixed(3)} but the drive's selection ratio is ` +
					`${selectionRatio.toFixed(3)}, so off segments ghost whenever on segments reach full ` +
					`contrast.`,
				fix: 'Use fewer commons, a bias nearer the optimum, or a steeper fluid.'
			})
		);
	}
	if (hopeless.length === 0 && result.window === null) {
		const cold = worst(checks, (c) => -c.v90_V);
		const hot = worst(checks, (c) => c.v10_V);
		findings.push(
			finding({
				code: 'drive.no-common-amplitude',
				severity: 'fail',
				message:
					`No single amplitude covers ${celsius(cold.temperature_C)} to ${celsius(hot.temperature_C)}: ` +
					`on segments need ${volts(cold.window!.min_V)} at ${celsius(cold.temperature_C)}, but off ` +
					`segments ghost above ${volts(hot.window!.max_V)} at ${celsius(hot.temperature_C)}.`,
				fix: 'Add temperature compensation of the drive voltage or narrow the range.'
			})
		);
	}
	if (result.window !== null && !result.ok) {
		const best = result.best_V ?? amplitude_V;
		const range = Number.isFinite(result.window.max_V)
			? `window ${volts(result.window.min_V)}–${volts(result.window.max_V)}`
			: `at least ${volts(result.window.min_V)}`;
		const weakOn = checks.filter((c) => c.onMargin_V < 0);
		const ghosting = checks.filter((c) => c.offMargin_V < 0);
		if (weakOn.length > 0) {
			const c = worst(weakOn, (x) => x.onMargin_V);
			findings.push(
				finding({
					code: 'drive.amplitude-too-low',
					severity: 'fail',
					message:
						`${volts(amplitude_V)} is too low: on segments reach ${volts(c.on_V)}, below V90 = ` +
						`${volts(c.v90_V)} at ${celsius(c.temperature_C)}.`,
					fix: `Set ${volts(best)} (${range}).`
				})
			);
		}
		if (ghosting.length > 0) {
			const c = worst(ghosting, (x) => x.offMargin_V);
			findings.push(
				finding({
					code: 'drive.amplitude-too-high',
					severity: 'fail',
					message:
						`${volts(amplitude_V)} is too high: off segments get ${volts(c.off_V)}, above V10 = ` +
						`${volts(c.v10_V)} at ${celsius(c.temperature_C)}, and ghost.`,
					fix: `Set ${volts(best)} (${range}).`
				})
			);
		}
	}
	if (result.ok) {
		const tight = result.margin_percent < 5;
		const span = checks.map((c) => c.temperature_C);
		findings.push(
			finding({
				code: tight ? 'drive.margin-small' : 'drive.window-ok',
				severity: tight ? 'warn' : 'pass',
				message:
					`Every segment switches cleanly from ${celsius(Math.min(...span))} to ` +
					`${celsius(Math.max(...span))} at ${volts(amplitude_V)}; smallest margin ` +
					`${volts(result.margin_V)} (${result.margin_percent.toFixed(1)} % of ` +
					`${result.tightest?.limit === 'off' ? 'V10' : 'V90'}, ${result.tightest?.limit ?? 'on'} segments at ` +
					`${celsius(result.tightest?.temperature_C ?? Math.min(...span))})` +
					(tight ? ', which leaves little room for cell-gap and supply tolerances.' : '.'),
				fix: tight
					? 'Use fewer commons, a steeper fluid, or temperature compensation of the drive voltage.'
					: ''
			})
		);
	}
	return findings;
}
