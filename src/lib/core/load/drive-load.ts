/**
 * The drive load of a whole design at one temperature and frame rate: per electrode capacitance
 * and energy per cycle, summed per segment line and per common, power and average current.
 *
 * Power P = E_cycle / T_cycle with T_cycle two frames (the waveform's DC-balanced period). The
 * average current is the current from the LCD supply that delivers that power, I = P / V with V
 * the drive amplitude; for a square wave 0…V into C this is exactly C·V·f. Electrodes without a
 * common or a line, or on a common the drive does not scan, carry no load (the wiring check names
 * them).
 */
import type { Design } from '../design/schema';
import { electrodeArea_mm2, electrodeLoads, type ElectrodeLoad } from './electrode-capacitance';
import type { PixelPermittivity } from './fluid-permittivity';
import { cycleDuration_s, cycleEnergyCoefficients, type PixelSite } from './waveform-energy';

export interface ElectrodeDriveLoad extends ElectrodeLoad {
	/** Expected energy per cycle in the shown pattern, J. */
	cycleEnergy_J: number;
	power_W: number;
	/** False when the electrode is unassigned or on a common outside the drive. */
	driven: boolean;
}

export interface DriveLoad {
	electrodes: ElectrodeDriveLoad[];
	power_W: number;
	current_A: number;
}

/**
 * Prepares the waveform's part of the load once (it does not depend on the fluid's permittivity
 * or the frame rate); `at` then gives the load for any permittivity and frame rate.
 */
export function prepareDriveLoad(options: {
	design: Design;
	onProbability: number;
	areas_mm2?: readonly number[];
}): {
	at: (o: { permittivity: PixelPermittivity; frameRate_Hz?: number }) => DriveLoad;
} {
	const { design } = options;
	const drive = design.drive;
	const areas_mm2 = options.areas_mm2 ?? design.electrodes.map(electrodeArea_mm2);
	const commonIndex = new Map(design.commons.map((c, i) => [c.id, i]));
	const lineIndex = new Map(design.segmentLines.map((l, i) => [l.id, i]));
	const sites: PixelSite[] = [];
	const siteOf: number[] = [];
	for (const e of design.electrodes) {
		const c = e.common === null ? undefined : commonIndex.get(e.common);
		const l = e.line === null ? undefined : lineIndex.get(e.line);
		if (c === undefined || l === undefined || c >= drive.commons) {
			siteOf.push(-1);
			continue;
		}
		siteOf.push(sites.length);
		sites.push({
			commonIndex: c,
			lineIndex: l,
			onProbability: options.onProbability,
			off_F: 0,
			on_F: 0
		});
	}
	const k = cycleEnergyCoefficients({ drive, sites });
	return {
		at: ({ permittivity, frameRate_Hz = drive.frameRate_Hz }) => {
			const loads = electrodeLoads({ design, permittivity, areas_mm2 });
			const cycle_s = cycleDuration_s(frameRate_Hz);
			let power_W = 0;
			const electrodes = loads.map((load, i) => {
				const site = siteOf[i];
				const cycleEnergy_J = site < 0 ? 0 : load.off_F * k[2 * site] + load.on_F * k[2 * site + 1];
				power_W += cycleEnergy_J / cycle_s;
				return { ...load, cycleEnergy_J, power_W: cycleEnergy_J / cycle_s, driven: site >= 0 };
			});
			return { electrodes, power_W, current_A: power_W / drive.amplitude_V };
		}
	};
}

export function driveLoad(options: {
	design: Design;
	permittivity: PixelPermittivity;
	onProbability: number;
	frameRate_Hz?: number;
	areas_mm2?: readonly number[];
}): DriveLoad {
	return prepareDriveLoad(options).at(options);
}
