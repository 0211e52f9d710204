/**
 * The glass check: everything that only shows on real glass, as findings — back-plate margins and
 * touching commons, opens and shorts on each plate, leads too close, ghosts (visible, behind the
 * bezel, under the seal), bad outlines, bad leads (off the glass, degenerate, on no net), and the
 * ledge against its connector (common practice: elastomeric ledge ≥ 3 mm and pitch ≥ 0.5 mm;
 * metal pins at 1.5, 1.8, 2.0 or 2.54 mm).
 */
import {
	ELASTOMERIC_MIN_LEDGE_mm,
	ELASTOMERIC_MIN_PITCH_mm,
	METAL_PIN_PITCHES_mm
} from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { buildArtwork, type Conductor, type GlassArtwork, type Net } from './artwork';
import { leadElectrodes } from './lead-reach';
import { plateConnectivity } from './connectivity';
import { ghostCheck, type Ghost } from './ghost-check';
import { ghostFindings } from './ghost-findings';
import { outlineFaults } from './outline-faults';
import { traceFindings } from './trace-findings';
import { transferFindings } from './transfer-findings';

export interface GlassReport {
	artwork: GlassArtwork;
	ghosts: Ghost[];
	findings: Finding[];
}

function ledgeFindings(design: Design, art: GlassArtwork): Finding[] {
	const out: Finding[] = [];
	const { connector, depth_mm } = design.glassArt.ledge;
	const pitch = design.pinout.pitch_mm;
	if (connector === 'elastomeric' && depth_mm < ELASTOMERIC_MIN_LEDGE_mm)
		out.push(
			finding({
				code: 'glass.ledge-short',
				severity: 'warn',
				message: `The ledge is ${depth_mm} mm deep; an elastomeric connector needs at least ${ELASTOMERIC_MIN_LEDGE_mm} mm.`,
				fix: `Make the ledge at least ${ELASTOMERIC_MIN_LEDGE_mm} mm deep.`
			})
		);
	if (connector === 'elastomeric' && pitch < ELASTOMERIC_MIN_PITCH_mm)
		out.push(
			finding({
				code: 'glass.pitch-connector',
				severity: 'fail',
				message: `Pitch ${pitch} mm is finer than an elastomeric connector allows (${ELASTOMERIC_MIN_PITCH_mm} mm).`,
				fix: `Use a pitch of at least ${ELASTOMERIC_MIN_PITCH_mm} mm, or a heat-seal or flex connector.`
			})
		);
	if (connector === 'metal-pin' && !METAL_PIN_PITCHES_mm.some((p) => Math.abs(p - pitch) < 1e-6))
		out.push(
			finding({
				code: 'glass.pitch-connector',
				severity: 'fail',
				message: `Pitch ${pitch} mm is not a metal-pin pitch (${METAL_PIN_PITCHES_mm.join(', ')} mm).`,
				fix: 'Pick one of the metal-pin pitches.'
			})
		);
	const pads = art.layout.pads;
	if (pads.length > 0) {
		const first = pads[0].rect,
			last = pads[pads.length - 1].rect;
		const g = art.layout.glass;
		if (
			first.x_mm < 0 ||
			first.y_mm < 0 ||
			last.x_mm + last.width_mm > g.width_mm ||
			last.y_mm + last.height_mm > g.height_mm
		)
			out.push(
				finding({
					code: 'glass.pins-off-ledge',
					severity: 'fail',
					message: `${pads.length} pins at ${pitch} mm do not fit along the ${design.pinout.edge} edge.`,
					fix: 'Use a finer pitch, fewer pins or a longer edge.'
				})
			);
	}
	return out;
}

export function checkGlass(design: Design): GlassReport {
	const art = buildArtwork(design);
	const findings: Finding[] = [
		...ledgeFindings(design, art),
		...traceFindings(design, art.layout),
		...transferFindings(design, art.layout)
	];
	for (const f of outlineFaults(design, art.layout.sealInner)) {
		const name = f.electrode.name || f.electrode.id;
		findings.push(
			f.fault === 'off-glass'
				? finding({
						code: 'glass.off-glass',
						severity: 'fail',
						message: `${name} reaches past the seal's inner edge.`,
						fix: 'Move it inside the seal, or shrink the seal inset or width.',
						electrodes: [f.electrode.id]
					})
				: finding({
						code: 'glass.bad-outline',
						severity: 'fail',
						message: `${name}'s outline ${f.fault === 'no-area' ? 'has no area' : 'crosses itself'}; its back plate would be wrong.`,
						fix: 'Redraw the outline as one simple closed contour.',
						electrodes: [f.electrode.id]
					})
		);
	}
	const touching = art.conflicts.filter((c) => c.touching);
	const reduced = art.conflicts.filter((c) => !c.touching);
	for (const c of touching)
		findings.push(
			finding({
				code: 'glass.commons-touch',
				severity: 'fail',
				message: `${c.electrodes.join(' and ')} are ${c.distance_mm.toFixed(3)} mm apart on different commons: their back plates cannot keep the minimum gap of ${design.rules.minGap_mm} mm.`,
				fix: 'Move the electrodes apart, or put them on the same common.',
				electrodes: c.electrodes
			})
		);
	if (reduced.length > 0) {
		const ids = [...new Set(reduced.flatMap((c) => c.electrodes))];
		const tightest = Math.min(...reduced.map((c) => c.distance_mm));
		findings.push(
			finding({
				code: 'glass.margin-reduced',
				severity: 'warn',
				message: `${ids.length} electrodes sit closer than two margins plus the gap to another common (tightest ${tightest.toFixed(3)} mm): their back-plate margin is cut below ${design.glassArt.overlapMargin_mm} mm.`,
				fix: 'Widen the gaps between electrodes of different commons, or accept a smaller registration allowance.',
				electrodes: ids
			})
		);
	}
	const gap = design.rules.minGap_mm;
	// The electrodes a conductor concerns: its own; for a lead, those it serves; for a lead that
	// serves none, a pad or a transfer point, every electrode on its common or line.
	const served = leadElectrodes([...art.segment, ...art.common]);
	const concerns = (conductor: Conductor, net: Net): string[] => {
		if (conductor.electrodes.length > 0) return [...conductor.electrodes];
		const reached = served.get(conductor) ?? [];
		if (reached.length > 0) return reached;
		return design.electrodes
			.filter((e) => (net.kind === 'common' ? e.common === net.id : e.line === net.id))
			.map((e) => e.id);
	};
	for (const [plate, nets, root] of [
		['segment', art.segment, 'pad'],
		['common', art.common, 'transfer']
	] as const) {
		const { opens, contacts } = plateConnectivity({ nets, minGap_mm: gap, root });
		for (const o of opens)
			findings.push(
				finding({
					code: 'glass.open',
					severity: 'fail',
					message: `${o.conductor.name} (${plate} plate, ${o.net.name}) has no path to its ${root === 'pad' ? 'pad' : 'transfer point'}.`,
					fix: 'Generate the traces again, or draw a trace to it.',
					electrodes: concerns(o.conductor, o.net)
				})
			);
		for (const c of contacts)
			findings.push(
				finding({
					code: c.gap_mm <= 1e-6 ? 'glass.short' : 'glass.gap-too-small',
					severity: 'fail',
					message:
						c.gap_mm <= 1e-6
							? `${c.a.conductor.name} (${c.a.net.name}) touches ${c.b.conductor.name} (${c.b.net.name}) on the ${plate} plate.`
							: `${c.a.conductor.name} (${c.a.net.name}) is ${(c.gap_mm * 1000).toFixed(0)} µm from ${c.b.conductor.name} (${c.b.net.name}) on the ${plate} plate, below the ${gap} mm minimum.`,
					fix: 'Move or reroute the trace.',
					electrodes: [
						...new Set([...concerns(c.a.conductor, c.a.net), ...concerns(c.b.conductor, c.b.net)])
					]
				})
			);
	}
	const ghosts = ghostCheck(design, art, served);
	findings.push(...ghostFindings(ghosts));
	if (!findings.some((f) => f.severity !== 'pass'))
		findings.push(
			finding({
				code: 'glass.ok',
				severity: 'pass',
				message: 'Both plates are connected, kept apart and free of ghosts in the viewing area.'
			})
		);
	return { artwork: art, ghosts, findings };
}
