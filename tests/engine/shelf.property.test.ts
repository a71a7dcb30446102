import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { materialIds } from '../../src/lib/engine';
import { analyzeShelf, safeAnalyzeShelf, type ShelfRequest } from '../../src/lib/compute';

// Property tests: relations beam theory guarantees, over random shelves (SI numbers).
const material = fc.record({
	name: fc.constant('random board'),
	modulus: fc.double({ min: 1e9, max: 2e10, noNaN: true }),
	rupture: fc.double({ min: 1e7, max: 1e8, noNaN: true }),
	density: fc.double({ min: 300, max: 1000, noNaN: true })
});
const shelf = fc.record({
	span: fc.double({ min: 0.2, max: 2, noNaN: true }),
	depth: fc.double({ min: 0.1, max: 0.6, noNaN: true }),
	thickness: fc.double({ min: 0.01, max: 0.04, noNaN: true }),
	material,
	support: fc.constantFrom('simple', 'fixed', 'cantilever') as fc.Arbitrary<
		'simple' | 'fixed' | 'cantilever'
	>,
	pressure: fc.double({ min: 100, max: 5000, noNaN: true })
});
type Shelf = typeof shelf extends fc.Arbitrary<infer T> ? T : never;

function request(s: Shelf, extra: Partial<ShelfRequest> = {}): ShelfRequest {
	return {
		span: s.span,
		depth: s.depth,
		thickness: s.thickness,
		material: s.material,
		support: s.support,
		loads: [{ kind: 'area', pressure: s.pressure }],
		selfWeight: false,
		duration: 'short',
		options: { shearDeflection: false },
		...extra
	};
}
const sag = (r: ShelfRequest) => analyzeShelf(r).sag.instant;
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('proportionality (bending only)', () => {
	it('sag ∝ load', () => {
		fc.assert(
			fc.property(shelf, fc.double({ min: 0.1, max: 10, noNaN: true }), (s, k) => {
				expect(
					rel(sag(request({ ...s, pressure: s.pressure * k })), k * sag(request(s)))
				).toBeLessThan(1e-9);
			})
		);
	});
	it('sag ∝ span⁴ under a uniform load', () => {
		fc.assert(
			fc.property(shelf, fc.double({ min: 0.5, max: 2, noNaN: true }), (s, k) => {
				expect(
					rel(sag(request({ ...s, span: s.span * k })), k ** 4 * sag(request(s)))
				).toBeLessThan(1e-7);
			})
		);
	});
	it('sag ∝ 1/thickness³ and ∝ 1/E', () => {
		fc.assert(
			fc.property(shelf, fc.double({ min: 0.5, max: 2, noNaN: true }), (s, k) => {
				const base = sag(request(s));
				expect(rel(sag(request({ ...s, thickness: s.thickness * k })), base / k ** 3)).toBeLessThan(
					1e-7
				);
				const stiffer = { ...s.material, modulus: s.material.modulus * k };
				expect(rel(sag(request({ ...s, material: stiffer })), base / k)).toBeLessThan(1e-9);
			})
		);
	});
});

describe('superposition', () => {
	it('the curve under two loads is the sum of the curves (shear included)', () => {
		fc.assert(
			fc.property(
				shelf,
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 10, max: 2000, noNaN: true }),
				(s, where, force) => {
					const opts = { options: { shearDeflection: true } };
					const point = { kind: 'point' as const, force, at: where * s.span };
					const area = { kind: 'area' as const, pressure: s.pressure };
					const a = analyzeShelf(request(s, { ...opts, loads: [area] })).curve;
					const b = analyzeShelf(request(s, { ...opts, loads: [point] })).curve;
					const both = analyzeShelf(request(s, { ...opts, loads: [area, point] })).curve;
					const scale = Math.max(...both.map(([, y]) => Math.abs(y)));
					both.forEach(([, y], i) =>
						expect(Math.abs(y - a[i][1] - b[i][1])).toBeLessThan(1e-9 * scale)
					);
				}
			)
		);
	});
});

describe('a stiffener never increases sag', () => {
	const strip = fc.record({
		side: fc.constantFrom('front', 'back', 'below') as fc.Arbitrary<'front' | 'back' | 'below'>,
		height: fc.double({ min: 0.005, max: 0.1, noNaN: true }),
		thickness: fc.double({ min: 0.005, max: 0.04, noNaN: true }),
		material
	});
	it('without self-weight, any strip of any material', () => {
		fc.assert(
			fc.property(
				shelf,
				strip,
				fc.constantFrom('short', 'long') as fc.Arbitrary<'short' | 'long'>,
				(s, e, duration) => {
					const plain = analyzeShelf(request(s, { duration, options: { shearDeflection: true } }));
					const stiff = analyzeShelf(
						request(s, { duration, edges: [e], options: { shearDeflection: true } })
					);
					expect(stiff.sag.longTerm).toBeLessThanOrEqual(plain.sag.longTerm * (1 + 1e-12));
				}
			)
		);
	});
	it('with self-weight, a strip of the panel material at least as tall as the panel', () => {
		fc.assert(
			fc.property(shelf, strip, fc.double({ min: 1, max: 4, noNaN: true }), (s, e, k) => {
				const edge = { ...e, material: s.material, height: s.thickness * k };
				const sw = {
					selfWeight: true,
					duration: 'long' as const,
					options: { shearDeflection: true }
				};
				const plain = analyzeShelf(request(s, sw));
				const stiff = analyzeShelf(request(s, { ...sw, edges: [edge] }));
				expect(stiff.sag.longTerm).toBeLessThanOrEqual(plain.sag.longTerm * (1 + 1e-9));
			})
		);
	});
});

describe('continuous shelves converge to the closed forms', () => {
	it('short outer spans [ε, L, ε] approach the fixed-ended shelf', () => {
		fc.assert(
			fc.property(shelf, (s) => {
				const fixed = sag(
					request({ ...s, support: 'fixed' }, { loads: [{ kind: 'line', intensity: 1000 }] })
				);
				const eps = s.span * 1e-4;
				const cont = sag(
					request(s, {
						span: undefined,
						support: { spans: [eps, s.span, eps] },
						loads: [{ kind: 'line', intensity: 1000, from: eps, to: eps + s.span }]
					})
				);
				expect(rel(cont, fixed)).toBeLessThan(2e-3);
			})
		);
	});
	it('one span of two equal spans is the closed form wl⁴/(185·EI) (DA6), any length', () => {
		fc.assert(
			fc.property(shelf, (s) => {
				const r = analyzeShelf(
					request(s, {
						span: undefined,
						support: { spans: [s.span, s.span] },
						loads: [{ kind: 'line', intensity: 500 }]
					})
				);
				const ei = (s.material.modulus * s.depth * s.thickness ** 3) / 12;
				expect(rel(r.sag.instant, (500 * s.span ** 4) / (184.6 * ei))).toBeLessThan(2e-3);
			})
		);
	});
});

describe('every valid input gives finite numbers; every invalid one a clear error', () => {
	const anyLoad = (span: number) =>
		fc.oneof(
			fc.record({
				kind: fc.constant('area' as const),
				pressure: fc.double({ min: 0, max: 1e4, noNaN: true })
			}),
			fc.record({
				kind: fc.constant('line' as const),
				intensity: fc.double({ min: 0, max: 1e4, noNaN: true }),
				from: fc.double({ min: 0, max: span / 2, noNaN: true }),
				to: fc.double({ min: span / 2 + 1e-3, max: span, noNaN: true })
			}),
			fc.record({
				kind: fc.constant('point' as const),
				force: fc.double({ min: 0, max: 5000, noNaN: true }),
				at: fc.double({ min: 0, max: span, noNaN: true })
			})
		);
	it('valid requests, library or custom materials, any support, strips and loads', () => {
		fc.assert(
			fc.property(
				shelf.chain((s) =>
					fc.record({
						s: fc.constant(s),
						loads: fc.array(anyLoad(s.span), { maxLength: 4 }),
						lib: fc.option(fc.constantFrom(...materialIds)),
						spans: fc.option(
							fc.array(fc.double({ min: 0.1, max: 1.5, noNaN: true }), {
								minLength: 2,
								maxLength: 4
							})
						),
						duration: fc.constantFrom('short', 'long') as fc.Arbitrary<'short' | 'long'>,
						service: fc.constantFrom('dry', 'humid', 'wet') as fc.Arbitrary<'dry' | 'humid' | 'wet'>
					})
				),
				({ s, loads, lib, spans, duration, service }) => {
					const total = spans ? spans.reduce((a, b) => a + b, 0) : s.span;
					const r = safeAnalyzeShelf({
						...request(s),
						material: lib ?? s.material,
						span: spans ? undefined : s.span,
						support: spans ? { spans } : s.support,
						// positions drawn on s.span, scaled onto the shelf's real length
						loads: loads.map((l) => {
							const k = total / s.span;
							if (l.kind === 'point') return { ...l, at: Math.min(l.at * k, total) };
							if (l.kind === 'line')
								return { ...l, from: l.from * k, to: Math.min(l.to * k, total) };
							return l;
						}),
						selfWeight: true,
						duration,
						service,
						options: { shearDeflection: true }
					});
					expect(r.ok).toBe(true);
					if (r.ok) {
						const numbers = JSON.stringify(r.result).match(/-?\d[\d.e+-]*|null/g) ?? [];
						expect(numbers.length).toBeGreaterThan(100);
						const walk = (v: unknown): void => {
							if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
							else if (v && typeof v === 'object') Object.values(v).forEach(walk);
						};
						walk(r.result);
					}
				}
			),
			{ numRuns: 200 }
		);
	});
	it('junk never throws: it comes back as issues with a field and a message', () => {
		const junkField = fc.oneof(
			fc.anything(),
			fc.string(),
			fc.constant(-1),
			fc.constant(NaN),
			fc.constant('12 parsecs')
		);
		fc.assert(
			fc.property(
				fc.constantFrom(
					'span',
					'depth',
					'thickness',
					'material',
					'support',
					'loads',
					'edges',
					'limit',
					'grain'
				),
				junkField,
				(key, junk) => {
					const good: Record<string, unknown> = {
						span: '30"',
						depth: '10"',
						thickness: '3/4"',
						material: 'red-oak'
					};
					const r = safeAnalyzeShelf({ ...good, [key]: junk } as ShelfRequest);
					if (!r.ok) {
						expect(r.issues.length).toBeGreaterThan(0);
						for (const i of r.issues) {
							expect(Array.isArray(i.path)).toBe(true);
							expect(i.message.length).toBeGreaterThan(3);
						}
						// the field named is the one we broke (or inside it)
						expect(r.issues.some((i) => i.path[0] === key)).toBe(true);
					}
				}
			),
			{ numRuns: 300 }
		);
		expect(safeAnalyzeShelf(null as never).ok).toBe(false);
		expect(safeAnalyzeShelf('shelf' as never).ok).toBe(false);
	});
});
