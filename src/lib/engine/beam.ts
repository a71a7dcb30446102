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

/** F(x), F'(x), M(x) and V(x) of the loads alone (all unknowns zero). */
function loadTerms(loads: BeamLoads, x: number) {
	let f = 0;
	let fp = 0;
	let m = 0;
	let v = 0;
	for (const p of loads.points) {
		const d = pos(x - p.at);
		f += (p.force * d * d * d) / 6;
		fp += (p.force * d * d) / 2;
		m -= p.force * d;
		if (x >= p.at) v -= p.force;
	}
	for (const u of loads.udls) {
		const a = pos(x - u.from);
		const b = pos(x - u.to);
		f += (u.w * (a ** 4 - b ** 4)) / 24;
		fp += (u.w * (a ** 3 - b ** 3)) / 6;
		m -= (u.w * (a * a - b * b)) / 2;
		v -= u.w * (a - b);
	}
	return { f, fp, m, v };
}

type Quantity = 'v' | 'psi' | 'm' | 'shear';

/** Row of coefficients of the unknowns [M0, V0, C1, C2, R…] and the load constant of a quantity. */
function row(model: BeamModel, loads: BeamLoads, q: Quantity, x: number): [number[], number] {
	const { ei, ga, inner } = model;
	const shearFlex = Number.isFinite(ga) ? 1 / ga : 0;
	const coef = new Array<number>(4 + inner.length).fill(0);
	const l = loadTerms(loads, x);
	if (q === 'v') {
		coef[0] = (-x * x) / 2 / ei + shearFlex;
		coef[1] = (-x * x * x) / 6 / ei + x * shearFlex;
		coef[2] = x;
		coef[3] = 1;
		inner.forEach((s, j) => {
			const d = pos(x - s);
			coef[4 + j] = (-d * d * d) / 6 / ei + d * shearFlex;
		});
		return [coef, l.f / ei + l.m * shearFlex];
	}
	if (q === 'psi') {
		coef[0] = -x / ei;
		coef[1] = (-x * x) / 2 / ei;
		coef[2] = 1;
		inner.forEach((s, j) => {
			const d = pos(x - s);
			coef[4 + j] = (-d * d) / 2 / ei;
		});
		return [coef, l.fp / ei];
	}
	if (q === 'm') {
		coef[0] = 1;
		coef[1] = x;
		inner.forEach((s, j) => (coef[4 + j] = pos(x - s)));
		return [coef, l.m];
	}
	coef[1] = 1;
	inner.forEach((s, j) => (coef[4 + j] = x >= s ? 1 : 0));
	return [coef, l.v];
}

const END_EQUATIONS: Record<EndCondition, [Quantity, Quantity]> = {
	pin: ['v', 'm'],
	fixed: ['v', 'psi'],
	free: ['m', 'shear']
};

/** Gaussian elimination with partial pivoting; rows are scaled first (the units differ). */
export function solveLinear(a: number[][], b: number[]): number[] {
	const n = b.length;
	for (let i = 0; i < n; i++) {
		let scale = 0;
		for (const c of a[i]) scale = Math.max(scale, Math.abs(c));
		if (scale > 0) {
			for (let j = 0; j < n; j++) a[i][j] /= scale;
			b[i] /= scale;
		}
	}
	for (let k = 0; k < n; k++) {
		let p = k;
		for (let i = k + 1; i < n; i++) if (Math.abs(a[i][k]) > Math.abs(a[p][k])) p = i;
		[a[k], a[p]] = [a[p], a[k]];
		[b[k], b[p]] = [b[p], b[k]];
		const pivot = a[k][k];
		if (pivot === 0) throw new Error('The supports do not hold the shelf (a mechanism).');
		for (let i = k + 1; i < n; i++) {
			const f = a[i][k] / pivot;
			if (f === 0) continue;
			for (let j = k; j < n; j++) a[i][j] -= f * a[k][j];
			b[i] -= f * b[k];
		}
	}
	const x = new Array<number>(n).fill(0);
	for (let i = n - 1; i >= 0; i--) {
		let s = b[i];
		for (let j = i + 1; j < n; j++) s -= a[i][j] * x[j];
		x[i] = s / a[i][i];
	}
	return x;
}

export function solveBeam(model: BeamModel, loads: BeamLoads): BeamSolution {
	const rows: number[][] = [];
	const rhs: number[] = [];
	const add = (q: Quantity, x: number) => {
		const [c, k] = row(model, loads, q, x);
		rows.push(c);
		rhs.push(-k);
	};
	for (const q of END_EQUATIONS[model.left]) add(q, 0);
	for (const q of END_EQUATIONS[model.right]) add(q, model.length);
	for (const s of model.inner) add('v', s);
	const u = solveLinear(rows, rhs);
	return { model, loads, m0: u[0], v0: u[1], c1: u[2], c2: u[3], inner: u.slice(4) };
}

/** Sag at x, m (downward positive). */
export function sagAt(s: BeamSolution, x: number): number {
	const { ei, ga, inner } = s.model;
	const shearFlex = Number.isFinite(ga) ? 1 / ga : 0;
	const l = loadTerms(s.loads, x);
	let f = l.f - (s.m0 * x * x) / 2 - (s.v0 * x * x * x) / 6;
	let m = l.m + s.m0 + s.v0 * x;
	for (let j = 0; j < inner.length; j++) {
		const d = pos(x - inner[j]);
		f -= (s.inner[j] * d * d * d) / 6;
		m += s.inner[j] * d;
	}
	return f / ei + s.c1 * x + s.c2 + m * shearFlex;
}

/** Bending moment at x, N·m (sagging positive). */
export function momentAt(s: BeamSolution, x: number): number {
	let m = loadTerms(s.loads, x).m + s.m0 + s.v0 * x;
	for (let j = 0; j < s.inner.length; j++) m += s.inner[j] * pos(x - s.model.inner[j]);
	return m;
}

/** Shear force just right of x, N. */
export function shearAt(s: BeamSolution, x: number): number {
	let v = loadTerms(s.loads, x).v + s.v0;
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
	inner.forEach((x, j) => out.push({ at: x, force: s.inner[j], moment: 0 }));
	if (right !== 'free') {
		const sum = out.reduce((a, r) => a + r.force, 0);
		out.push({
			at: length,
			force: totalLoad(s.loads) - sum,
			moment: right === 'fixed' ? momentAt(s, length) : 0
		});
	}
	return out;
}

/** Largest absolute bending moment and where: checked at every break point and shear zero. */
export function maxMoment(s: BeamSolution): { moment: number; at: number } {
	const { length, inner } = s.model;
	const breaks = new Set<number>([0, length, ...inner]);
	for (const p of s.loads.points) breaks.add(p.at);
	for (const u of s.loads.udls) {
		breaks.add(u.from);
		breaks.add(u.to);
	}
	const xs = [...breaks].filter((x) => x >= 0 && x <= length).sort((a, b) => a - b);
	let best = { moment: 0, at: 0 };
	const consider = (x: number) => {
		const m = Math.abs(momentAt(s, x));
		if (m > best.moment) best = { moment: m, at: x };
	};
	for (let i = 0; i < xs.length; i++) {
		consider(xs[i]);
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
				if (x0 > a && x0 < b) consider(x0);
			}
		}
	}
	return best;
}
