/**
 * A straight beam of one stiffness on any supports, by singularity functions and a small linear
 * solve. One method for every case: simple, fixed, cantilever and continuous over any spans
 * (the closed forms of Roark and AWC Design Aid 6 are its tests, not its method).
 *
 * Sign convention: x from the left end (the wall of a cantilever), sag v downward positive,
 * loads downward positive, sagging moment positive, reactions upward positive.
 * Timoshenko beam: v = v_bending + v_shear with v_bending'' = −M/EI, v_shear' = V/κGA, and the
 * cross-section rotation ψ = v_bending' (zero at a fixed end).
 *   v(x) = F(x)/EI + C1·x + C2 + M(x)/κGA,   ψ(x) = F'(x)/EI + C1,   F'' = −M.
 * Unknowns: M0 and V0 (moment and shear just right of x = 0), C1, C2 and one reaction per inner
 * support. Equations: two end conditions at each end and v = 0 at every inner support.
 */
import { bracketedRoot } from './root';

export type EndCondition = 'pin' | 'fixed' | 'free';

export interface BeamLoads {
	/** point loads: position m, force N */
	points: { at: number; force: number }[];
	/** uniform loads over part or all of the length: from, to m, intensity N/m */
	udls: { from: number; to: number; w: number }[];
}

export interface BeamModel {
	length: number;
	left: EndCondition;
	right: EndCondition;
	/** inner supports (pins), strictly between 0 and length, ascending */
	inner: number[];
	ei: number;
	/** κGA; Infinity to leave out shear deflection */
	ga: number;
}

export interface BeamSolution {
	model: BeamModel;
	loads: BeamLoads;
	m0: number;
	v0: number;
	c1: number;
	c2: number;
	/** upward reactions at the inner supports, N */
	inner: number[];
}

const pos = (x: number) => (x > 0 ? x : 0);
/** Two moments closer than this ratio are the same moment (rounding apart). */
const TIE = 1 + 1e-12;

/** F(x) of the loads alone (all unknowns zero): the bending part of the sag times EI. */
function loadF(loads: BeamLoads, x: number): number {
	let f = 0;
	for (const p of loads.points) {
		const d = pos(x - p.at);
		f += (p.force * d * d * d) / 6;
	}
	for (const u of loads.udls) {
		const a = pos(x - u.from);
		const b = pos(x - u.to);
		const a2 = a * a;
		const b2 = b * b;
		f += (u.w * (a2 * a2 - b2 * b2)) / 24;
	}
	return f;
}

/** F'(x) of the loads alone. */
function loadFp(loads: BeamLoads, x: number): number {
	let fp = 0;
	for (const p of loads.points) {
		const d = pos(x - p.at);
		fp += (p.force * d * d) / 2;
	}
	for (const u of loads.udls) {
		const a = pos(x - u.from);
		const b = pos(x - u.to);
		fp += (u.w * (a * a * a - b * b * b)) / 6;
	}
	return fp;
}

/** M(x) of the loads alone. */
function loadM(loads: BeamLoads, x: number): number {
	let m = 0;
	for (const p of loads.points) m -= p.force * pos(x - p.at);
	for (const u of loads.udls) {
		const a = pos(x - u.from);
		const b = pos(x - u.to);
		m -= (u.w * (a * a - b * b)) / 2;
	}
	return m;
}

/** V(x) of the loads alone (just right of x). */
function loadV(loads: BeamLoads, x: number): number {
	let v = 0;
	for (const p of loads.points) if (x >= p.at) v -= p.force;
	for (const u of loads.udls) v -= u.w * (pos(x - u.from) - pos(x - u.to));
	return v;
}

type Quantity = 'v' | 'psi' | 'm' | 'shear';

/**
 * Write the row of coefficients of the unknowns [M0, V0, C1, C2, R…] of a quantity at x into
 * a[o … o + n − 1] (already zero). The row hangs on the beam only, not on its loads.
 */
function writeRow(model: BeamModel, q: Quantity, x: number, a: Float64Array, o: number): void {
	const { ei, ga, inner } = model;
	const shearFlex = Number.isFinite(ga) ? 1 / ga : 0;
	if (q === 'v') {
		a[o] = (-x * x) / 2 / ei + shearFlex;
		a[o + 1] = (-x * x * x) / 6 / ei + x * shearFlex;
		a[o + 2] = x;
		a[o + 3] = 1;
		for (let j = 0; j < inner.length; j++) {
			const d = pos(x - inner[j]);
			a[o + 4 + j] = (-d * d * d) / 6 / ei + d * shearFlex;
		}
	} else if (q === 'psi') {
		a[o] = -x / ei;
		a[o + 1] = (-x * x) / 2 / ei;
		a[o + 2] = 1;
		for (let j = 0; j < inner.length; j++) {
			const d = pos(x - inner[j]);
			a[o + 4 + j] = (-d * d) / 2 / ei;
		}
	} else if (q === 'm') {
		a[o] = 1;
		a[o + 1] = x;
		for (let j = 0; j < inner.length; j++) a[o + 4 + j] = pos(x - inner[j]);
	} else {
		a[o + 1] = 1;
		for (let j = 0; j < inner.length; j++) a[o + 4 + j] = x >= inner[j] ? 1 : 0;
	}
}

/** The loads' part of a quantity at x (the constant of its row). */
function rowConstant(model: BeamModel, loads: BeamLoads, q: Quantity, x: number): number {
	if (q === 'v') {
		const shearFlex = Number.isFinite(model.ga) ? 1 / model.ga : 0;
		return loadF(loads, x) / model.ei + loadM(loads, x) * shearFlex;
	}
	if (q === 'psi') return loadFp(loads, x) / model.ei;
	if (q === 'm') return loadM(loads, x);
	return loadV(loads, x);
}

const END_EQUATIONS: Record<EndCondition, [Quantity, Quantity]> = {
	pin: ['v', 'm'],
	fixed: ['v', 'psi'],
	free: ['m', 'shear']
};

/**
 * Gaussian elimination with partial pivoting on an n × n matrix stored row by row; rows are
 * scaled first (the units differ). Overwrites a with its factors: U on and above the diagonal,
 * the multipliers below it (rows swapped along with the rest of a row); scale[i] is row i's
 * scale and swaps[k] the row swapped into place k, so that substitute() can solve for any right
 * side with the same arithmetic as eliminating it alongside.
 */
function factor(a: Float64Array, n: number, scale: Float64Array, swaps: Int32Array): void {
	for (let i = 0; i < n; i++) {
		let s = 0;
		for (let j = 0; j < n; j++) s = Math.max(s, Math.abs(a[i * n + j]));
		scale[i] = s;
		if (s > 0) for (let j = 0; j < n; j++) a[i * n + j] /= s;
	}
	for (let k = 0; k < n; k++) {
		let p = k;
		for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]) > Math.abs(a[p * n + k])) p = i;
		swaps[k] = p;
		if (p !== k) {
			for (let j = 0; j < n; j++) {
				const t = a[k * n + j];
				a[k * n + j] = a[p * n + j];
				a[p * n + j] = t;
			}
		}
		const pivot = a[k * n + k];
		if (pivot === 0) throw new Error('The supports do not hold the shelf (a mechanism).');
		for (let i = k + 1; i < n; i++) {
			const f = a[i * n + k] / pivot;
			a[i * n + k] = f;
			if (f === 0) continue;
			for (let j = k + 1; j < n; j++) a[i * n + j] -= f * a[k * n + j];
		}
	}
}

/** Solve the factored system for the right side b (overwritten) into x. */
function substitute(
	a: Float64Array,
	n: number,
	scale: Float64Array,
	swaps: Int32Array,
	b: Float64Array,
	x: Float64Array
): void {
	for (let i = 0; i < n; i++) if (scale[i] > 0) b[i] /= scale[i];
	for (let k = 0; k < n; k++) {
		const p = swaps[k];
		if (p !== k) {
			const t = b[k];
			b[k] = b[p];
			b[p] = t;
		}
	}
	// each row takes off its multiples of the pivot rows above it, in the order of elimination
	for (let i = 1; i < n; i++) {
		let s = b[i];
		for (let k = 0; k < i; k++) {
			const f = a[i * n + k];
			if (f !== 0) s -= f * b[k];
		}
		b[i] = s;
	}
	for (let i = n - 1; i >= 0; i--) {
		let s = b[i];
		for (let j = i + 1; j < n; j++) s -= a[i * n + j] * x[j];
		x[i] = s / a[i * n + i];
	}
}

/** Scratch space of the linear solve, reused by every solve (the engine runs on one thread); it
 * holds the factors of the last beam solved, for solveAgain. */
let scratchA = new Float64Array(16 * 16);
let scratchB = new Float64Array(16);
let scratchX = new Float64Array(16);
let scratchScale = new Float64Array(16);
let scratchSwaps = new Int32Array(16);
let factored: BeamModel | undefined;

export function solveBeam(model: BeamModel, loads: BeamLoads): BeamSolution {
	const n = 4 + model.inner.length;
	if (scratchB.length < n) {
		scratchA = new Float64Array(n * n);
		scratchB = new Float64Array(n);
		scratchX = new Float64Array(n);
		scratchScale = new Float64Array(n);
		scratchSwaps = new Int32Array(n);
	}
	const a = scratchA;
	a.fill(0, 0, n * n);
	const left = END_EQUATIONS[model.left];
	const right = END_EQUATIONS[model.right];
	factored = undefined;
	writeRow(model, left[0], 0, a, 0);
	writeRow(model, left[1], 0, a, n);
	writeRow(model, right[0], model.length, a, 2 * n);
	writeRow(model, right[1], model.length, a, 3 * n);
	for (let j = 0; j < model.inner.length; j++) writeRow(model, 'v', model.inner[j], a, (4 + j) * n);
	factor(a, n, scratchScale, scratchSwaps);
	factored = model;
	return solveAgain(model, loads);
}

/**
 * The beam solved last (by solveBeam, the same object) under other loads: its equations are
 * factored already, only their right side changes (an analysis solves the instant beam under all
 * the loads and under the shelf's own weight alone).
 */
export function solveAgain(model: BeamModel, loads: BeamLoads): BeamSolution {
	if (factored !== model) throw new Error('solveAgain: not the beam solved last');
	const n = 4 + model.inner.length;
	const b = scratchB;
	const left = END_EQUATIONS[model.left];
	const right = END_EQUATIONS[model.right];
	b[0] = -rowConstant(model, loads, left[0], 0);
	b[1] = -rowConstant(model, loads, left[1], 0);
	b[2] = -rowConstant(model, loads, right[0], model.length);
	b[3] = -rowConstant(model, loads, right[1], model.length);
	for (let j = 0; j < model.inner.length; j++)
		b[4 + j] = -rowConstant(model, loads, 'v', model.inner[j]);
	const u = scratchX;
	substitute(scratchA, n, scratchScale, scratchSwaps, b, u);
	const inner: number[] = new Array(n - 4);
	for (let j = 4; j < n; j++) inner[j - 4] = u[j];
	return { model, loads, m0: u[0], v0: u[1], c1: u[2], c2: u[3], inner };
}

/**
 * The same beam without shear deflection (κGA = ∞) under the same loads. A statically determinate
 * beam (no inner support, two of its four end equations statics: simple, cantilever) carries the
 * same moments and shears either way, so only C1 and C2 are fitted again, from its two kinematic
 * end equations, instead of a new solve; any other beam is solved again. `general` forces the
 * solve (tests/engine/shelf-shortcuts.property.test.ts compares the two).
 */
export function withoutShear(s: BeamSolution, general = false): BeamSolution {
	const { model, loads, m0, v0 } = s;
	const bending: BeamModel = {
		length: model.length,
		left: model.left,
		right: model.right,
		inner: model.inner,
		ei: model.ei,
		ga: Infinity
	};
	if (!Number.isFinite(model.ga))
		return { model: bending, loads, m0, v0, c1: s.c1, c2: s.c2, inner: s.inner };
	const left = END_EQUATIONS[model.left];
	const right = END_EQUATIONS[model.right];
	if (general || model.inner.length > 0) return solveBeam(bending, loads);
	// each kinematic row (v or ψ at an end): k1·C1 + k2·C2 + r = 0, r its value with C1 = C2 = 0
	let found = 0;
	let a1 = 0;
	let a2 = 0;
	let ar = 0;
	let b1 = 0;
	let b2 = 0;
	let br = 0;
	for (let i = 0; i < 4; i++) {
		const q = i < 2 ? left[i] : right[i - 2];
		if (q !== 'v' && q !== 'psi') continue;
		const x = i < 2 ? 0 : model.length;
		const k1 = q === 'v' ? x : 1;
		const k2 = q === 'v' ? 1 : 0;
		const r =
			q === 'v'
				? (loadF(loads, x) - (m0 * x * x) / 2 - (v0 * x * x * x) / 6) / model.ei
				: (loadFp(loads, x) - m0 * x - (v0 * x * x) / 2) / model.ei;
		if (found === 0) {
			a1 = k1;
			a2 = k2;
			ar = r;
		} else {
			b1 = k1;
			b2 = k2;
			br = r;
		}
		found++;
	}
	const det = a1 * b2 - b1 * a2;
	// not two kinematic equations (a fixed shelf: statically indeterminate): solve it
	if (found !== 2 || det === 0) return solveBeam(bending, loads);
	const c1 = (-ar * b2 + br * a2) / det;
	const c2 = (-a1 * br + b1 * ar) / det;
	return { model: bending, loads, m0, v0, c1, c2, inner: [] };
}

/** Sag at x, m (downward positive). */
export function sagAt(s: BeamSolution, x: number): number {
	const { ei, ga, inner } = s.model;
	const shearFlex = Number.isFinite(ga) ? 1 / ga : 0;
	let f = loadF(s.loads, x) - (s.m0 * x * x) / 2 - (s.v0 * x * x * x) / 6;
	let m = loadM(s.loads, x) + s.m0 + s.v0 * x;
	for (let j = 0; j < inner.length; j++) {
		const d = pos(x - inner[j]);
		f -= (s.inner[j] * d * d * d) / 6;
		m += s.inner[j] * d;
	}
	return f / ei + s.c1 * x + s.c2 + m * shearFlex;
}

/** Bending moment at x, N·m (sagging positive). */
export function momentAt(s: BeamSolution, x: number): number {
	let m = loadM(s.loads, x) + s.m0 + s.v0 * x;
	for (let j = 0; j < s.inner.length; j++) m += s.inner[j] * pos(x - s.model.inner[j]);
	return m;
}

/** Shear force just right of x, N. */
export function shearAt(s: BeamSolution, x: number): number {
	let v = loadV(s.loads, x) + s.v0;
	for (let j = 0; j < s.inner.length; j++) if (x >= s.model.inner[j]) v += s.inner[j];
	return v;
}

export function totalLoad(loads: BeamLoads): number {
	let t = 0;
	for (const p of loads.points) t += p.force;
	for (const u of loads.udls) t += u.w * (u.to - u.from);
	return t;
}

/** Support reactions left to right: force upward N, and the moment the support takes, N·m. */
export function reactions(s: BeamSolution): { at: number; force: number; moment: number }[] {
	const { length, left, right, inner } = s.model;
	const out: { at: number; force: number; moment: number }[] = [];
	if (left !== 'free') out.push({ at: 0, force: s.v0, moment: left === 'fixed' ? s.m0 : 0 });
	for (let j = 0; j < inner.length; j++) out.push({ at: inner[j], force: s.inner[j], moment: 0 });
	if (right !== 'free') {
		let sum = 0;
		for (let j = 0; j < out.length; j++) sum += out[j].force;
		out.push({
			at: length,
			force: totalLoad(s.loads) - sum,
			moment: right === 'fixed' ? momentAt(s, length) : 0
		});
	}
	return out;
}

/** Largest absolute bending moment and where: checked at every break point and shear zero. Of
 * equal moments (to rounding: a fixed shelf's two ends) the first from the left is kept. */
export function maxMoment(
	s: BeamSolution,
	xs = breakPoints(s.model, s.loads)
): {
	moment: number;
	at: number;
} {
	let moment = 0;
	let at = 0;
	for (let i = 0; i < xs.length; i++) {
		const m = Math.abs(momentAt(s, xs[i]));
		if (m > moment * TIE) {
			moment = m;
			at = xs[i];
		}
		// left limit matters only for a jump in M, which point forces do not cause; shear is
		// linear between break points, so its zero (a moment peak) is found exactly from two points
		if (i + 1 < xs.length) {
			const a = xs[i];
			const b = xs[i + 1];
			const x1 = a + (b - a) / 3;
			const x2 = a + (2 * (b - a)) / 3;
			const v1 = shearAt(s, x1);
			const v2 = shearAt(s, x2);
			if (v1 !== v2) {
				const x0 = x1 - (v1 * (x2 - x1)) / (v2 - v1);
				if (x0 > a && x0 < b) {
					const m0 = Math.abs(momentAt(s, x0));
					if (m0 > moment * TIE) {
						moment = m0;
						at = x0;
					}
				}
			}
		}
	}
	return { moment, at };
}

/**
 * The sag of a solved beam as one polynomial per segment. Between break points (ends, inner
 * supports, point loads, the ends of part-length loads) every singularity term is either off or
 * a plain power of x, so v(x) is a quartic there. Coefficients are stored in the local coordinate
 * t = x − xs[i] (five per segment: t⁰ … t⁴), which keeps the powers small and the sums well
 * conditioned. Evaluating one is a short Horner loop; the largest sag of a segment comes from
 * the roots of a cubic instead of a search.
 */
export interface SagPieces {
	/** break points from 0 to the length, ascending, no repeats */
	xs: Float64Array;
	/** five coefficients per segment, lowest power first, in t = x − xs[i] */
	c: Float64Array;
}

/** Break points of a beam under its loads: where any singularity term switches on. */
export function breakPoints(model: BeamModel, loads: BeamLoads): Float64Array {
	const { length, inner } = model;
	const needed = 2 + inner.length + loads.points.length + 2 * loads.udls.length;
	if (breakScratch.length < needed) breakScratch = new Float64Array(2 * needed);
	const all = breakScratch;
	let n = 0;
	all[n++] = 0;
	all[n++] = length;
	for (let i = 0; i < inner.length; i++) all[n++] = inner[i];
	for (let i = 0; i < loads.points.length; i++) all[n++] = loads.points[i].at;
	for (let i = 0; i < loads.udls.length; i++) {
		all[n++] = loads.udls[i].from;
		all[n++] = loads.udls[i].to;
	}
	// insertion sort: a handful of points, mostly in order already
	for (let i = 1; i < n; i++) {
		const x = all[i];
		let j = i - 1;
		while (j >= 0 && all[j] > x) {
			all[j + 1] = all[j];
			j--;
		}
		all[j + 1] = x;
	}
	let m = 0;
	for (let i = 0; i < n; i++) {
		const x = all[i];
		if (x >= 0 && x <= length && (m === 0 || x > all[m - 1])) all[m++] = x;
	}
	return all.slice(0, m);
}
let breakScratch = new Float64Array(32);

/** Add k·(x − p)ᵏ for the segment starting at a ≥ p, in t = x − a, to c[o … o + 4]. */
function addPower(c: Float64Array, o: number, k: number, power: number, e: number): void {
	if (power === 1) {
		c[o] += k * e;
		c[o + 1] += k;
	} else if (power === 2) {
		c[o] += k * e * e;
		c[o + 1] += 2 * k * e;
		c[o + 2] += k;
	} else if (power === 3) {
		c[o] += k * e * e * e;
		c[o + 1] += 3 * k * e * e;
		c[o + 2] += 3 * k * e;
		c[o + 3] += k;
	} else {
		const e2 = e * e;
		c[o] += k * e2 * e2;
		c[o + 1] += 4 * k * e2 * e;
		c[o + 2] += 6 * k * e2;
		c[o + 3] += 4 * k * e;
		c[o + 4] += k;
	}
}

/**
 * Add scale × the sag of a solution, segment by segment over the break points xs (which must
 * include the solution's own break points), into c. Same terms as sagAt, expanded.
 */
export function addSagPieces(s: BeamSolution, xs: Float64Array, c: Float64Array, scale = 1): void {
	const { ei, ga, inner } = s.model;
	const sf = Number.isFinite(ga) ? scale / ga : 0;
	const fe = scale / ei;
	const { points, udls } = s.loads;
	for (let i = 0; i < xs.length - 1; i++) {
		const a = xs[i];
		const o = 5 * i;
		// unknowns at the left end: F −= M0·x²/2 + V0·x³/6, M += M0 + V0·x, and C1·x + C2
		addPower(c, o, (-s.m0 / 2) * fe, 2, a);
		addPower(c, o, (-s.v0 / 6) * fe, 3, a);
		c[o] += s.m0 * sf + s.c2 * scale;
		addPower(c, o, s.v0 * sf + s.c1 * scale, 1, a);
		for (let j = 0; j < inner.length; j++) {
			const e = a - inner[j];
			if (e < 0) continue;
			addPower(c, o, (-s.inner[j] / 6) * fe, 3, e);
			addPower(c, o, s.inner[j] * sf, 1, e);
		}
		for (const p of points) {
			const e = a - p.at;
			if (e < 0) continue;
			addPower(c, o, (p.force / 6) * fe, 3, e);
			addPower(c, o, -p.force * sf, 1, e);
		}
		for (const u of udls) {
			const e1 = a - u.from;
			if (e1 < 0) continue;
			addPower(c, o, (u.w / 24) * fe, 4, e1);
			addPower(c, o, (-u.w / 2) * sf, 2, e1);
			const e2 = a - u.to;
			if (e2 < 0) continue;
			addPower(c, o, (-u.w / 24) * fe, 4, e2);
			addPower(c, o, (u.w / 2) * sf, 2, e2);
		}
	}
}

/** Value of segment i at t (from the segment's start). */
export function pieceAt(c: Float64Array, i: number, t: number): number {
	const o = 5 * i;
	return c[o] + t * (c[o + 1] + t * (c[o + 2] + t * (c[o + 3] + t * c[o + 4])));
}

/** Segment holding x: the last i with xs[i] ≤ x (clamped to the first and last segment). */
export function segmentOf(xs: Float64Array, x: number): number {
	let lo = 0;
	let hi = xs.length - 2;
	while (lo < hi) {
		const mid = (lo + hi + 1) >> 1;
		if (xs[mid] <= x) lo = mid;
		else hi = mid - 1;
	}
	return lo;
}

/** Sag at x from the pieces. */
export function piecesAt(p: SagPieces, x: number): number {
	const i = segmentOf(p.xs, x);
	return pieceAt(p.c, i, x - p.xs[i]);
}

/** Roots of q0 + q1·t + q2·t² strictly inside (0, h), ascending (none, one or two). */
function quadraticRootsIn(q0: number, q1: number, q2: number, h: number, out: number[]): void {
	if (q2 === 0) {
		if (q1 !== 0) {
			const t = -q0 / q1;
			if (t > 0 && t < h) out.push(t);
		}
		return;
	}
	const disc = q1 * q1 - 4 * q2 * q0;
	if (disc < 0) return;
	// the stable form: no difference of nearly equal numbers
	const q = -0.5 * (q1 + (q1 >= 0 ? Math.sqrt(disc) : -Math.sqrt(disc)));
	const r1 = q / q2;
	const r2 = q !== 0 ? q0 / q : r1;
	const lo = Math.min(r1, r2);
	const hi = Math.max(r1, r2);
	if (lo > 0 && lo < h) out.push(lo);
	if (hi > 0 && hi < h && hi !== lo) out.push(hi);
}

const scratch: number[] = [];
/** where the slope of a segment crosses zero, as a share of the segment's length */
const PEAK_TOLERANCE = 1e-12;

function cubicAt(d0: number, d1: number, d2: number, d3: number, t: number): number {
	return d0 + t * (d1 + t * (d2 + t * d3));
}

/**
 * Largest value of segment i over [0, h] and where (t from the segment's start): the ends, the
 * turning points of the slope, and each zero where the slope goes from rising to falling.
 */
export function segmentPeak(c: Float64Array, i: number, h: number): { t: number; y: number } {
	const o = 5 * i;
	// slope v' = d0 + d1 t + d2 t² + d3 t³
	const d0 = c[o + 1];
	const d1 = 2 * c[o + 2];
	const d2 = 3 * c[o + 3];
	const d3 = 4 * c[o + 4];
	let bestT = 0;
	let best = c[o];
	scratch.length = 0;
	scratch.push(0);
	quadraticRootsIn(d1, 2 * d2, 3 * d3, h, scratch);
	scratch.push(h);
	for (let k = 0; k + 1 < scratch.length; k++) {
		const lo = scratch[k];
		const hi = scratch[k + 1];
		let t = -1;
		if (k > 0) t = lo;
		const fl = cubicAt(d0, d1, d2, d3, lo);
		const fh = cubicAt(d0, d1, d2, d3, hi);
		// the slope is monotone between these points: a maximum of v only where it falls through 0
		if (fl > 0 && fh < 0) {
			const root = bracketedRoot(
				(x) => cubicAt(d0, d1, d2, d3, x),
				lo,
				hi,
				PEAK_TOLERANCE * h,
				fl,
				fh
			);
			if (t >= 0) {
				const y = pieceAt(c, i, t);
				if (y > best) {
					best = y;
					bestT = t;
				}
			}
			t = root;
		}
		if (t >= 0) {
			const y = pieceAt(c, i, t);
			if (y > best) {
				best = y;
				bestT = t;
			}
		}
	}
	const y = pieceAt(c, i, h);
	if (y > best) {
		best = y;
		bestT = h;
	}
	return { t: bestT, y: best };
}
