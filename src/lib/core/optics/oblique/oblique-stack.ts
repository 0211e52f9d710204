/**
 * Reflectance of the reflective TN stack seen from any direction: front surface, front polarizer,
 * front glass, liquid crystal, rear glass, rear polarizer, reflector — the extended Jones method
 * (Yeh, JOSA 72:507 (1982); Gu & Yeh, JOSA A 10:966 (1993)), without multiple reflections.
 *
 * - Front surface: air → index n_s with n_s from the stack's normal-incidence R_s
 *   (isotropic-interface.ts); R_s(θ) = (R_s,s + R_s,p)/2 is added to every state (a uniformly
 *   bright surround is mirrored); s and p light enter and leave with T_s, T_p.
 * - Fields inside are tangential (E_x, E_y); at the ends they are turned into power amplitudes of
 *   s and p waves in the polarizer medium (index n_p = 1.5): a_s = √cos θ_p·(E·ŝ),
 *   a_p = (E·β̂)/√cos θ_p, so |a_s|² + |a_p|² is the flux along the normal. Glass plates are
 *   isotropic and, reflections neglected, leave the tangential field unchanged but for a phase.
 * - Polarizers: absorbing uniaxial films (absorbing-polarizer.ts); liquid crystal: oriented slabs
 *   (uniaxial-slabs.ts), walked backward with the backward modes on the way out.
 * - Reflector, two parts (reflector.ts's ρ and depolarised fraction δ):
 *   polarisation-keeping (1 − δ): a mirror (tangential E reversed, sign dropped) on the mirrored
 *   path — light in along the mirror image of the viewing direction, out toward the viewer;
 *   depolarising δ: a Lambertian scatterer. Light reaching it is averaged over the hemisphere of
 *   incidence with cosine weight (`incidentLight: 'hemisphere'`, a uniformly bright surround,
 *   hemisphere.ts) or taken along the mirrored path (`'mirrored'`, the normal-incidence model's
 *   choice); it returns unpolarised through the stack toward the viewer. Approximation: the
 *   scattered light is spread over the directions that leave the glass (light trapped by total
 *   internal reflection is taken as recycled into them, its loss folded into ρ).
 *   R = R_s(θ) + ρ·[(1 − δ)·½‖Q_o·B·F·Q_i‖² + δ·⟨½‖Q'·F·Q_i‖²⟩·½‖Q_o·B·Q'⁻¹‖²]
 *   with F, B the forward and backward stack matrices and Q the s/p ↔ tangential maps.
 * At normal incidence with 'mirrored' light this is the normal-incidence model of
 * ../stack-evaluator.ts with midpoint-retarder slabs (tested to 1e-12).
 * Conventions: ../README.md (e^{+iωt}); frame: view-direction.ts.
 */
import { createMatrix, frobeniusNormSquared, identity, multiply } from '../complex2x2';
import { FRONT_SURFACE_REFLECTANCE_DEFAULT } from '../fresnel';
import { samplePolarizer, type PolarizerSpec } from '../polarizer-models';
import { sampleReflector, type ReflectorSpec, type SampledReflector } from '../reflector';
import { hemisphereDirections } from './hemisphere';
import { indexOfNormalReflectance, isotropicInterface } from './isotropic-interface';
import { POLARIZER_INDEX, propagatePolarizer, type PolarizerPass } from './absorbing-polarizer';
import { propagateSlabs, type OrientedSlabs, type SlabPass } from './uniaxial-slabs';
import { waveGeometry, type ViewDirection } from './view-direction';

export interface ObliquePolarizer {
	polarizer: PolarizerSpec;
	/** Pass axis, deg in the display frame. */
	axis_deg: number;
}

export interface ObliqueStackSpec {
	front: ObliquePolarizer;
	rear: ObliquePolarizer;
	reflector: ReflectorSpec;
	frontSurfaceReflectance?: number;
}

export type IncidentLight = 'hemisphere' | 'mirrored';

export interface ObliqueStackOptions {
	wavelengths_nm: Float64Array;
	indices: { ne: Float64Array; no: Float64Array };
	stack: ObliqueStackSpec;
	incidentLight?: IncidentLight;
}

/** One director state, ready for any direction (hemisphere average done once). */
export interface PreparedState {
	slabs: OrientedSlabs;
	/** Cosine-weighted hemisphere average of the unpolarised flux reaching the reflector. */
	diffuseIn: Float64Array | null;
}

export interface DirectionParts {
	/** Stack reflectance factor per wavelength, 0…1, first surface included. */
	reflectance: Float64Array;
	/** Unpolarised flux reaching the reflector along the mirrored path, per wavelength. */
	toReflector: Float64Array;
	/** R_s at this angle. */
	surface: number;
}

export interface ObliqueStackEvaluator {
	readonly wavelengths_nm: Float64Array;
	prepare(slabs: OrientedSlabs): PreparedState;
	at(state: PreparedState, direction: ViewDirection): DirectionParts;
}

const RAD_PER_DEG = Math.PI / 180;

/** Real 2×2 [a b; c d] into complex storage. */
function setReal(out: Float64Array, a: number, b: number, c: number, d: number): Float64Array {
	out.fill(0);
	out[0] = a;
	out[2] = b;
	out[4] = c;
	out[6] = d;
	return out;
}

export function createObliqueStackEvaluator(options: ObliqueStackOptions): ObliqueStackEvaluator {
	const wavelengths_nm = Float64Array.from(options.wavelengths_nm);
	const count = wavelengths_nm.length;
	const { stack } = options;
	const { ne, no } = options.indices;
	if (ne.length !== count || no.length !== count)
		throw new RangeError('indices must have one value per wavelength');
	const front = samplePolarizer(stack.front.polarizer, wavelengths_nm);
	const rear = samplePolarizer(stack.rear.polarizer, wavelengths_nm);
	const reflector: SampledReflector = sampleReflector(stack.reflector, wavelengths_nm);
	const rs = stack.frontSurfaceReflectance ?? FRONT_SURFACE_REFLECTANCE_DEFAULT;
	const surfaceIndex = indexOfNormalReflectance(rs);
	const delta = reflector.depolarizedFraction;
	const incidentLight = options.incidentLight ?? 'hemisphere';
	const f = createMatrix(),
		b = createMatrix(),
		q = createMatrix(),
		t = createMatrix();
	const slabPass: SlabPass = {
		slabs: {
			count: 0,
			thickness_m: 0,
			cx: new Float64Array(0),
			cy: new Float64Array(0),
			cz: new Float64Array(0)
		},
		betaX: 0,
		betaY: 0,
		ne: 0,
		no: 0,
		wavelength_m: 0,
		sense: 1
	};
	const frontPass: PolarizerPass = {
		axis_rad: stack.front.axis_deg * RAD_PER_DEG,
		k1: 0,
		k2: 0,
		betaX: 0,
		betaY: 0,
		wavelength_m: 0
	};
	const rearPass: PolarizerPass = { ...frontPass, axis_rad: stack.rear.axis_deg * RAD_PER_DEG };

	function evaluate(
		slabs: OrientedSlabs,
		direction: ViewDirection,
		diffuseIn: Float64Array | null,
		forwardOnly = false
	): DirectionParts {
		const g = waveGeometry(direction);
		const surface = isotropicInterface({ n1: 1, n2: surfaceIndex, sinTheta1: Math.sqrt(g.betaSq) });
		const surfaceR = (surface.Rs + surface.Rp) / 2;
		const ts = Math.sqrt(surface.Ts),
			tp = Math.sqrt(surface.Tp);
		const cosP = Math.sqrt(1 - g.betaSq / (POLARIZER_INDEX * POLARIZER_INDEX));
		const rc = Math.sqrt(cosP);
		// Q': power amplitudes (s, p) → tangential field; Q'⁻¹: back
		const qiS = [g.sX / rc, g.pX * rc, g.sY / rc, g.pY * rc] as const;
		const qoS = [g.sX * rc, g.sY * rc, g.pX / rc, g.pY / rc] as const;
		slabPass.slabs = slabs;
		slabPass.betaX = frontPass.betaX = rearPass.betaX = g.betaX;
		slabPass.betaY = frontPass.betaY = rearPass.betaY = g.betaY;
		const reflectance = new Float64Array(count);
		const toReflector = new Float64Array(count);
		for (let i = 0; i < count; i++) {
			const wavelength_m = wavelengths_nm[i] * 1e-9;
			slabPass.wavelength_m = frontPass.wavelength_m = rearPass.wavelength_m = wavelength_m;
			slabPass.ne = ne[i];
			slabPass.no = no[i];
			frontPass.k1 = front.k1[i];
			frontPass.k2 = front.k2[i];
			rearPass.k1 = rear.k1[i];
			rearPass.k2 = rear.k2[i];
			// forward: F·Q'·diag(t_s, t_p)
			setReal(f, qiS[0] * ts, qiS[1] * tp, qiS[2] * ts, qiS[3] * tp);
			propagatePolarizer(f, frontPass);
			slabPass.sense = 1;
			propagateSlabs(f, slabPass);
			propagatePolarizer(f, rearPass);
			setReal(q, qoS[0], qoS[1], qoS[2], qoS[3]);
			multiply(t, q, f);
			const arriving = 0.5 * frobeniusNormSquared(t);
			toReflector[i] = arriving;
			if (forwardOnly) continue;
			// backward stack B (tangential → tangential)
			identity(b);
			propagatePolarizer(b, rearPass);
			slabPass.sense = -1;
			propagateSlabs(b, slabPass);
			propagatePolarizer(b, frontPass);
			// diag(t_s, t_p)·Q'⁻¹·B
			setReal(q, qoS[0] * ts, qoS[1] * ts, qoS[2] * tp, qoS[3] * tp);
			multiply(b, q, b);
			multiply(t, b, f);
			const kept = 0.5 * frobeniusNormSquared(t);
			setReal(q, qiS[0], qiS[1], qiS[2], qiS[3]);
			multiply(t, b, q);
			const leaving = 0.5 * frobeniusNormSquared(t);
			const received = diffuseIn ? diffuseIn[i] : arriving;
			reflectance[i] =
				surfaceR + reflector.reflectance[i] * ((1 - delta) * kept + delta * received * leaving);
		}
		return { reflectance, toReflector, surface: surfaceR };
	}

	function prepare(slabs: OrientedSlabs): PreparedState {
		if (incidentLight === 'mirrored' || delta === 0) return { slabs, diffuseIn: null };
		const diffuseIn = new Float64Array(count);
		for (const d of hemisphereDirections()) {
			const parts = evaluate(slabs, d, null, true);
			for (let i = 0; i < count; i++) diffuseIn[i] += d.weight * parts.toReflector[i];
		}
		return { slabs, diffuseIn };
	}

	return {
		wavelengths_nm,
		prepare,
		at: (state, direction) => evaluate(state.slabs, direction, state.diffuseIn)
	};
}
