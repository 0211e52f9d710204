/**
 * The finding reported when the optical model is stopped at its time limit: the design may still
 * pass its wiring and drive checks, but its optics are unknown, so the verdict cannot be a pass.
 */
import { finding, type Finding } from '../findings/finding';

/** How long the app lets the optical model run for one design before stopping it. */
export const OPTICS_TIME_LIMIT_s = 30;

export function opticsTimeoutFinding(limit_s: number): Finding {
	return finding({
		code: 'optics.model-timeout',
		severity: 'fail',
		message: `The optical model did not finish within ${limit_s} s and was stopped; no optics results.`,
		fix: 'Narrow the temperature range, use a preset fluid, or check the cell figures for extreme values.'
	});
}
