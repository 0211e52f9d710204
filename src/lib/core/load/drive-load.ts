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
import { electrodeLoads, type ElectrodeLoad } from './electrode-capacitance';
import type { PixelPermittivity } from './fluid-permittivity';
import { cycleDuration_s, cycleEnergies_J, type PixelSite } from './waveform-energy';

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

export function driveLoad(options: {
	design: Design;
	permittivity: PixelPermittivity;
	onProbability: number;
	frameRate_Hz?: number;
	areas_mm2?: readonly number[];
}): DriveLoad {
	const { design } = options;
	const drive = design.drive;
	const frameRate_Hz = options.frameRate_Hz ?? drive.frameRate_Hz;
	const loads = electrodeLoads(options);
	const commonIndex = new Map(design.commons.map((c, i) => [c.id, i]));
	const lineIndex = new Map(design.segmentLines.map((l, i) => [l.id, i]));
	const sites: PixelSite[] = [];
	const siteOf: number[] = [];
	loads.forEach((load) => {
		const c = load.common === null ? undefined : commonIndex.get(load.common);
		const l = load.line === null ? undefined : lineIndex.get(load.line);
		if (c === undefined || l === undefined || c >= drive.commons) return siteOf.push(-1);
		siteOf.push(sites.length);
		sites.push({
			commonIndex: c,
			lineIndex: l,
			onProbability: options.onProbability,
			off_F: load.off_F,
			on_F: load.on_F
		});
	});
	const energies = cycleEnergies_J({ drive, sites });
	const cycle_s = cycleDuration_s(frameRate_Hz);
	const electrodes = loads.map((load, i) => {
		const site = siteOf[i];
		const cycleEnergy_J = site < 0 ? 0 : energies[site];
		return { ...load, cycleEnergy_J, power_W: cycleEnergy_J / cycle_s, driven: site >= 0 };
	});
	const power_W = electrodes.reduce((sum, e) => sum + e.power_W, 0);
	return { electrodes, power_W, current_A: power_W / drive.amplitude_V };
}
