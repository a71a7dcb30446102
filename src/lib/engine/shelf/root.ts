/**
 * The engine's one root finder, for the inverse solvers (longest span, thinnest stock, smallest
 * strip, largest load) and the peak of a sag curve: regula falsi with the Illinois correction on a
 * bracket where g changes sign, and a search that grows a bracket outward from an estimate.
 */

/**
 * Root of g on [a, b] where g(a) and g(b) differ in sign, to within `tolerance`: the end of the
 * final bracket on the side where g ≥ 0 (the side that passes).
 *
 * Regula falsi with the Illinois correction in Anderson and Björck's form: when the same end of the
 * bracket is kept twice in a row, its value is scaled down (by 1 − g(new)/g(old), or halved when
 * that is not positive), so the next step lands past the root and both ends close in. A step is
 * kept at least half a tolerance inside the bracket (so the bracket closes once the root is found to
 * within it), and when three steps have not halved the bracket the next one bisects it (at the
 * geometric mean when its ends are positive and far apart in ratio).
 */
export function bracketedRoot(
	g: (x: number) => number,
	a: number,
	b: number,
	tolerance: number,
	ga = g(a),
	gb = g(b)
): number {
	if (ga === 0) return a;
	if (gb === 0) return b;
	if (ga * gb > 0) throw new Error('bracketedRoot: the bracket holds no sign change');
	let side = 0;
	let width = Math.abs(b - a);
	let checkpoint = width;
	const nudge = 0.5 * tolerance;
	for (let i = 1; i <= 200 && width > tolerance; i++) {
		let c: number;
		const lo = a < b ? a : b;
		const hi = a < b ? b : a;
		if (i % 3 === 0 && width > 0.5 * checkpoint)
			c = lo > 0 && hi > 4 * lo ? Math.sqrt(lo * hi) : 0.5 * (a + b);
		else {
			c = (a * gb - b * ga) / (gb - ga);
			if (!(c > lo && c < hi)) c = 0.5 * (a + b);
			else if (c - lo < nudge) c = lo + nudge;
			else if (hi - c < nudge) c = hi - nudge;
		}
		if (i % 3 === 0) checkpoint = width;
		const gc = g(c);
		if (gc === 0) return c;
		if (gc * gb > 0) {
			const m = 1 - gc / gb;
			b = c;
			gb = gc;
			if (side === -1) ga *= m > 0 ? m : 0.5;
			side = -1;
		} else {
			const m = 1 - gc / ga;
			a = c;
			ga = gc;
			if (side === 1) gb *= m > 0 ? m : 0.5;
			side = 1;
		}
		width = Math.abs(b - a);
	}
	// the side that passes (g ≥ 0); scaled values keep their sign
	return ga >= 0 ? a : b;
}

/** Where a search for a root of a monotone function ended. */
export type RootSearch =
	| { found: true; x: number }
	/** g keeps one sign all the way to this bound */
	| { found: false; bound: 'min' | 'max'; x: number; gx: number };

/**
 * Root of a monotone g in [min, max] (min > 0), starting from an estimate: steps out from it by a
 * growing factor, toward the root as g's sign and slope show, until g changes sign, then
 * bracketedRoot. A good estimate (a closed form) makes the bracket tight and the root quick.
 */
export function rootNear(
	g: (x: number) => number,
	estimate: number,
	min: number,
	max: number,
	tolerance: number,
	/** g is rising with x (true) or falling (false) */
	rising: boolean,
	firstStep = 1.01
): RootSearch {
	let x = Math.min(max, Math.max(min, estimate));
	let gx = g(x);
	if (gx === 0) return { found: true, x };
	let factor = firstStep;
	for (let i = 0; i < 200; i++) {
		// below the root a rising g is negative, a falling one positive
		const up = gx < 0 === rising;
		if (up ? x >= max : x <= min) return { found: false, bound: up ? 'max' : 'min', x, gx };
		const next = up ? Math.min(max, x * factor) : Math.max(min, x / factor);
		const gn = g(next);
		if (gn === 0) return { found: true, x: next };
		if (gn * gx < 0)
			return {
				found: true,
				x: up
					? bracketedRoot(g, x, next, tolerance, gx, gn)
					: bracketedRoot(g, next, x, tolerance, gn, gx)
			};
		x = next;
		gx = gn;
		factor *= factor;
	}
	throw new Error('rootNear: no sign change found');
}
