import { G_M_PER_S2 } from '../joinery/units';

/** A lumped mass in the case's own frame: x back from the front face, z up from the floor. */
export interface MassPoint {
	massKg: number;
	xM: number;
	zM: number;
}

export interface Frame {
	/** the tipping line, behind the front face */
	pivotXM: number;
	/** forward floor tilt, radians */
	tiltRad: number;
}

export function centreOf(points: MassPoint[]) {
	let m = 0;
	let mx = 0;
	let mz = 0;
	for (const p of points) {
		m += p.massKg;
		mx += p.massKg * p.xM;
		mz += p.massKg * p.zM;
	}
	return { massKg: m, fromFrontM: m > 0 ? mx / m : 0, heightM: m > 0 ? mz / m : 0 };
}

/**
 * Moment of the weights about the front tipping line that holds the case upright (N·m). With the
 * floor tilted forward by θ, gravity in the case frame is W(−sin θ, −cos θ), so each weight
 * contributes W·[(x − x_p)·cos θ − z·sin θ]. Negative: it tips by itself.
 */
export function restoringMoment(points: MassPoint[], f: Frame): number {
	const c = Math.cos(f.tiltRad);
	const s = Math.sin(f.tiltRad);
	let m = 0;
	for (const p of points) m += p.massKg * G_M_PER_S2 * ((p.xM - f.pivotXM) * c - p.zM * s);
	return m;
}

/** Lever of a horizontal forward force at height h on the front face: h·cos θ − x_p·sin θ. */
export const horizontalLever = (heightM: number, f: Frame) =>
	heightM * Math.cos(f.tiltRad) - f.pivotXM * Math.sin(f.tiltRad);

/** Lever of a vertical load at x (negative in front of the case) and height z:
 * (x_p − x)·cos θ + z·sin θ. Zero or less: a load there cannot tip the case forward. */
export const verticalLever = (xM: number, zM: number, f: Frame) =>
	(f.pivotXM - xM) * Math.cos(f.tiltRad) + zM * Math.sin(f.tiltRad);

/** Lever of a wall restraint pulling back horizontally at the case back, height z:
 * z·cos θ + (depth − x_p)·sin θ. */
export const restraintLever = (zM: number, depthM: number, f: Frame) =>
	zM * Math.cos(f.tiltRad) + (depthM - f.pivotXM) * Math.sin(f.tiltRad);

/** Steady sideways (forward) acceleration, in g, that tips the case: M_r / Σ W·((x − x_p)·sin θ + z·cos θ). */
export function tipAccelerationG(points: MassPoint[], f: Frame): number {
	const mr = restoringMoment(points, f);
	const c = Math.cos(f.tiltRad);
	const s = Math.sin(f.tiltRad);
	let d = 0;
	for (const p of points) d += p.massKg * G_M_PER_S2 * ((p.xM - f.pivotXM) * s + p.zM * c);
	return mr > 0 && d > 0 ? mr / d : 0;
}

/** Horizontal force at the top front edge that tips the case (N, never negative). */
export function tipForceAtTop(points: MassPoint[], heightM: number, f: Frame): number {
	const mr = restoringMoment(points, f);
	const lever = horizontalLever(heightM, f);
	return mr > 0 && lever > 0 ? mr / lever : 0;
}
