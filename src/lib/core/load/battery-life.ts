/**
 * Battery life of the display drive: capacity over the average current drawn, the display's own
 * plus the driver's quiescent current. Capacity in mAh, currents in µA, life in hours. Derating
 * for temperature, self-discharge and end-of-life voltage is the battery data sheet's business
 * and not modelled: the figure is an upper bound for the display alone.
 */
export const UA_PER_MA = 1000;
export const HOURS_PER_YEAR = 24 * 365.25;

export function batteryLife_h(options: { capacity_mAh: number; current_uA: number }): number {
	const { capacity_mAh, current_uA } = options;
	if (!(current_uA > 0)) return Infinity;
	return (capacity_mAh * UA_PER_MA) / current_uA;
}

/** Hours as the unit a designer reads best: hours, days or years. */
export function formatDuration(hours: number): string {
	if (!Number.isFinite(hours)) return 'unlimited';
	if (hours < 48) return `${hours.toPrecision(3)} h`;
	if (hours < 24 * 365) return `${(hours / 24).toPrecision(3)} days`;
	return `${(hours / HOURS_PER_YEAR).toPrecision(3)} years`;
}
