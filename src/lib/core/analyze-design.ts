/**
 * Design in, full report out: the one entry the web app, the command line and the tests share.
 */
import type { Design } from './design/schema';
import { analyzeDrive, analyzeWiring, type DriveReport, type WiringReport } from './drive/analyze-drive';
import { overallSeverity, type Severity } from './drive/drive-verdict';

export interface DesignReport {
	design: { name: string; electrodes: number; commons: number; segmentLines: number };
	wiring: WiringReport;
	drive: DriveReport;
	severity: Severity;
}

export function analyzeDesign(design: Design): DesignReport {
	const wiring = analyzeWiring(design);
	const drive = analyzeDrive({ drive: design.drive, thresholds: design.thresholds });
	return {
		design: {
			name: design.name,
			electrodes: design.electrodes.length,
			commons: design.commons.length,
			segmentLines: design.segmentLines.length
		},
		wiring,
		drive,
		severity: overallSeverity([...wiring.findings, ...drive.findings])
	};
}
