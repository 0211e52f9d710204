/**
 * The pins of the glass along its contact edge, from `design.pinout`: the chosen edge, commons
 * first, last or split to both ends (the first ⌈n/2⌉ commons before the lines, the rest after),
 * and the pitch. Pins are centred on the edge; pin 1 is at the left end of a top or bottom edge and
 * at the top end of a left or right edge, seen from the viewer.
 *
 * A row of n pins needs n × pitch of edge (each pad takes one pitch); a longer row does not fit.
 * Units: millimetres, glass coordinates (origin top-left, y downwards).
 */
import type { Design, LineRef } from '../design/schema';

export interface Pin {
	/** 1-based pin number. */
	number: number;
	role: 'common' | 'line';
	/** `COMk` or `SEGk`, k the 1-based place in the design's list of commons or lines. */
	label: string;
	ref: LineRef;
	/** Centre of the pad along the edge, from the edge's pin-1 end. */
	along_mm: number;
	x_mm: number;
	y_mm: number;
}

export interface PinLayout {
	pins: Pin[];
	edgeLength_mm: number;
	/** Length the row of pads takes: count × pitch. */
	rowLength_mm: number;
	fits: boolean;
}

interface Entry {
	role: Pin['role'];
	label: string;
	ref: LineRef;
}

function pinOrder(design: Design): Entry[] {
	const commons: Entry[] = design.commons.map((ref, i) => ({
		role: 'common',
		label: `COM${i + 1}`,
		ref
	}));
	const lines: Entry[] = design.segmentLines.map((ref, i) => ({
		role: 'line',
		label: `SEG${i + 1}`,
		ref
	}));
	switch (design.pinout.order) {
		case 'commons-first':
			return [...commons, ...lines];
		case 'commons-last':
			return [...lines, ...commons];
		case 'commons-split': {
			const head = Math.ceil(commons.length / 2);
			return [...commons.slice(0, head), ...lines, ...commons.slice(head)];
		}
	}
}

export function pinLayout(design: Design): PinLayout {
	const { edge, pitch_mm } = design.pinout;
	const { width_mm, height_mm } = design.glass;
	const horizontal = edge === 'top' || edge === 'bottom';
	const edgeLength_mm = horizontal ? width_mm : height_mm;
	const order = pinOrder(design);
	const rowLength_mm = order.length * pitch_mm;
	const start_mm = (edgeLength_mm - rowLength_mm) / 2 + pitch_mm / 2;
	const fixed_mm = { top: 0, bottom: height_mm, left: 0, right: width_mm }[edge];
	const pins = order.map((entry, i): Pin => {
		const along_mm = start_mm + i * pitch_mm;
		return {
			number: i + 1,
			...entry,
			along_mm,
			x_mm: horizontal ? along_mm : fixed_mm,
			y_mm: horizontal ? fixed_mm : along_mm
		};
	});
	return { pins, edgeLength_mm, rowLength_mm, fits: rowLength_mm <= edgeLength_mm + 1e-9 };
}
