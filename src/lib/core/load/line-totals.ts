/**
 * Totals of the electrode loads per segment line and per common: the capacitance a driver pin
 * sees (off and on), the electrode area and the share of power and current it delivers.
 */
import type { LineRef } from '../design/schema';
import type { ElectrodeDriveLoad } from './drive-load';

export interface PinTotal {
	id: string;
	name: string;
	electrodes: number;
	area_mm2: number;
	off_F: number;
	on_F: number;
	power_W: number;
	current_A: number;
}

export function pinTotals(options: {
	pins: readonly LineRef[];
	electrodes: readonly ElectrodeDriveLoad[];
	pinOf: (e: ElectrodeDriveLoad) => string | null;
	amplitude_V: number;
}): PinTotal[] {
	const totals = new Map<string, PinTotal>(
		options.pins.map((p) => [
			p.id,
			{
				id: p.id,
				name: p.name,
				electrodes: 0,
				area_mm2: 0,
				off_F: 0,
				on_F: 0,
				power_W: 0,
				current_A: 0
			}
		])
	);
	for (const e of options.electrodes) {
		const pin = options.pinOf(e);
		const total = pin === null ? undefined : totals.get(pin);
		if (!total || !e.driven) continue;
		total.electrodes++;
		total.area_mm2 += e.area_mm2;
		total.off_F += e.off_F;
		total.on_F += e.on_F;
		total.power_W += e.power_W;
		total.current_A += e.power_W / options.amplitude_V;
	}
	return [...totals.values()];
}
