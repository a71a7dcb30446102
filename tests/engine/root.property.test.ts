import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bracketedRoot, rootNear } from '../../src/lib/engine';
import { analyzeShelf, maxLoad, maxSpan, minEdge, type ShelfRequest } from '../../src/lib/compute';

// The one root finder (engine/shelf/root.ts) and the solvers built on it: laws that hold for any
// monotone function and any shelf, whatever the method inside.
const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true });

describe('bracketedRoot', () => {
	it('returns the passing end of a bracket no wider than the tolerance around the root', () => {
		fc.assert(
			fc.property(positive(0.02, 9), positive(0.5, 5), positive(1e-9, 1e-3), (root, p, tol) => {
				const g = (x: number) => 1 - (x / root) ** p; // falls through zero at root
				const x = bracketedRoot(g, 0.01, 10, tol);
				expect(g(x)).toBeGreaterThanOrEqual(0);
				expect(root - x).toBeLessThanOrEqual(tol);
				// (a root found exactly may sit a rounding step past the true one)
				expect(root - x).toBeGreaterThanOrEqual(-1e-12 * root);
			})
		);
	});
	it('keeps the Illinois correction on: a smooth root in a few steps, not one end at a time', () => {
		// a cubic law like the sag over the limit: plain regula falsi moves one end only and needs
		// dozens of steps; with the correction both ends close in
		fc.assert(
			fc.property(positive(0.02, 9.5), (root) => {
				let n = 0;
				const g = (x: number) => (n++, 1 - (x / root) ** 3);
				bracketedRoot(g, 0.01, 10, 1e-5);
				expect(n).toBeLessThanOrEqual(20);
			})
		);
	});
	it('refuses a bracket without a sign change', () => {
		expect(() => bracketedRoot((x) => x + 1, 0, 1, 1e-6)).toThrow(/no sign change/);
	});
});

describe('rootNear', () => {
	it('finds the root from any estimate in the range, or names the bound it ran into', () => {
		fc.assert(
			fc.property(positive(0.001, 20), positive(0.01, 10), fc.boolean(), (root, estimate, up) => {
				const g = (x: number) => (up ? x - root : root - x);
				const found = rootNear(g, estimate, 0.01, 10, 1e-6, up);
				if (root > 0.01 && root < 10) {
					expect(found.found).toBe(true);
					expect(Math.abs(found.x - root)).toBeLessThanOrEqual(1e-6);
					expect(g(found.x)).toBeGreaterThanOrEqual(0);
				} else {
					expect(found.found).toBe(false);
					if (!found.found) expect(found.bound).toBe(root <= 0.01 ? 'min' : 'max');
				}
			})
		);
	});
});

const shelf = fc.record({
	depth: positive(0.15, 0.6),
	thickness: fc.constantFrom('1/2"', '5/8"', '3/4"', '1"'),
	material: fc.constantFrom('red-oak', 'mdf', 'hardwood-plywood-veneer-core', 'particleboard-m2'),
	support: fc.constantFrom('simple' as const, 'fixed' as const, 'cantilever' as const),
	pressure: positive(200, 4000),
	duration: fc.constantFrom('short' as const, 'long' as const)
});
type Shelf = typeof shelf extends fc.Arbitrary<infer T> ? T : never;
const request = (s: Shelf) => ({
	depth: s.depth,
	thickness: s.thickness,
	material: s.material,
	support: s.support,
	duration: s.duration,
	loads: [{ kind: 'area' as const, pressure: s.pressure }]
});

describe('the solvers answer at the limit', () => {
	const passes = (r: ShelfRequest) => analyzeShelf(r).limit.pass;
	it('maxSpan: its span passes and a step past its tolerance (10 µm) does not', () => {
		fc.assert(
			fc.property(shelf, (s) => {
				const r = maxSpan(request(s));
				expect(r.analysis.limit.pass).toBe(true);
				if (r.capped) return;
				expect(passes({ ...request(s), span: r.span })).toBe(true);
				expect(passes({ ...request(s), span: r.span + 1.001e-5 })).toBe(false);
			}),
			{ numRuns: 40 }
		);
	});
	it('minEdge: its strip passes and one a step (1 µm) lower does not', () => {
		fc.assert(
			fc.property(shelf, positive(0.6, 1.6), (s, span) => {
				const strip = { side: 'front' as const, material: 'red-oak', thickness: 0.019 };
				const r = minEdge({ ...request(s), span, strip });
				if (!r.needed || r.height === null) return;
				const at = (height: number) => ({ ...request(s), span, edges: [{ ...strip, height }] });
				expect(passes(at(r.height))).toBe(true);
				if (r.height > 0.0005 + 1e-6) expect(passes(at(r.height - 1.001e-6))).toBe(false);
			}),
			{ numRuns: 40 }
		);
	});
	it('maxLoad: the largest load passes and a millionth more does not', () => {
		fc.assert(
			fc.property(shelf, positive(0.4, 1.4), (s, span) => {
				const { loads: _loads, ...bare } = request(s);
				const r = maxLoad({ ...bare, span, load: { kind: 'area' } });
				const at = (pressure: number) =>
					analyzeShelf({ ...bare, span, loads: [{ kind: 'area', pressure }] });
				const ok = (a: ReturnType<typeof analyzeShelf>) => a.limit.pass && a.strength.pass;
				if (r.magnitude === 0) return;
				expect(ok(at(r.magnitude))).toBe(true);
				expect(ok(at(r.magnitude * (1 + 1e-6)))).toBe(false);
			}),
			{ numRuns: 40 }
		);
	});
});
