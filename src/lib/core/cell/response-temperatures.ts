/**
 * The temperatures the response-time table is computed at: both ends of the operating range and
 * every multiple of 10 °C between them. Wide ranges widen the step (20, 30… K) so the list never
 * holds more than MAX_RESPONSE_POINTS entries, whatever the input.
 */
/** At most this many response temperatures, whatever the range (the step widens beyond 10 K). */
const MAX_RESPONSE_POINTS = 40;

export function responseTemperatures(min_C: number, max_C: number): number[] {
	const span = max_C - min_C;
	if (!(span > 0) || !Number.isFinite(span)) return [min_C];
	const step = Math.max(10, Math.ceil(span / (MAX_RESPONSE_POINTS - 2) / 10) * 10);
	const list = [min_C];
	const first = Math.ceil(min_C / step) * step;
	for (let k = 0; k < MAX_RESPONSE_POINTS - 2; k++) {
		const t = first + k * step;
		if (t >= max_C) break;
		if (t > min_C) list.push(t);
	}
	list.push(max_C);
	return list;
}
