/**
 * Issue 15 item 10: a shelf over dividers, each span its own length and the divider its thickness.
 * Clear spans with a divider thickness are computed as spans from divider centre to divider centre
 * (the longer spans, the safe side); analyses saved before the thickness was asked for read as they
 * were (spans from support to support).
 */
import { describe, expect, it } from 'vitest';
import { analyzeShelf, maxSpan, safeAnalyzeShelf, type ShelfRequest } from '../../src/lib/compute';
import { shelfRequestSchema } from '../../src/lib/schemas/shelf';

/** Round figures for closed-form checks (the formulas are checked, not the material). */
const TEST_MATERIAL = { name: 'test board', modulus: 10e9, rupture: 60e6, density: 500 };
const w = 200; // N/m along the shelf

function bare(extra: Partial<ShelfRequest>): ShelfRequest {
	return {
		depth: 0.3,
		thickness: 0.02,
		material: TEST_MATERIAL,
		selfWeight: false,
		duration: 'short',
		options: { shearDeflection: false },
		loads: [{ kind: 'line', intensity: w }],
		...extra
	} as ShelfRequest;
}

describe('a shelf over dividers with spans of their own and a divider thickness', () => {
	const [l1, l2, t] = [0.6, 0.9, 0.019];

	it('is the beam over the divider centres: each clear span plus half the divider it meets', () => {
		const withDivider = analyzeShelf(bare({ support: { spans: [l1, l2], divider: t } }));
		const centres = analyzeShelf(bare({ support: { spans: [l1 + t / 2, l2 + t / 2] } }));
		expect(withDivider).toEqual(centres);
		expect(withDivider.span).toBeCloseTo(l1 + t + l2, 12);
		expect(withDivider.supports).toEqual([0, l1 + t / 2, expect.closeTo(l1 + t + l2, 12)]);
	});

	it('two unequal spans under a uniform load: the three-moment equation', () => {
		// Clapeyron's three-moment equation for two spans on pins under w:
		// M_B = w (a³ + b³) / (8 (a + b)) over the middle support; the end reactions follow by statics
		const [a, b] = [l1 + t / 2, l2 + t / 2];
		const r = analyzeShelf(bare({ support: { spans: [l1, l2], divider: t } }));
		const mB = (w * (a ** 3 + b ** 3)) / (8 * (a + b));
		const [ra, rb, rc] = r.reactions.map((x) => x.force);
		expect(ra).toBeCloseTo((w * a) / 2 - mB / a, 8);
		expect(rc).toBeCloseTo((w * b) / 2 - mB / b, 8);
		expect(rb).toBeCloseTo(w * (a + b) - ra - rc, 8);
		expect(r.moment).toBeCloseTo(mB, 8);
		// the longer span governs, each checked against its own limit (L/144 of that span)
		expect(r.limit.spans.map((s) => s.allowed)).toEqual([
			expect.closeTo(a / 144, 12),
			expect.closeTo(b / 144, 12)
		]);
		expect(r.limit.allowed).toBeCloseTo(b / 144, 12);
	});

	it('a thicker divider never makes the shelf look better (the spans only grow)', () => {
		const sag = (divider?: number) =>
			analyzeShelf(bare({ support: { spans: [l1, l2], ...(divider ? { divider } : {}) } })).sag
				.instant;
		expect(sag(0.012)).toBeGreaterThan(sag());
		expect(sag(0.038)).toBeGreaterThan(sag(0.012));
	});

	it('three spans of their own: each span checked, the supports where the dividers stand', () => {
		const r = analyzeShelf(bare({ support: { spans: [0.5, 0.3, 0.7], divider: 0.02 } }));
		expect(r.supports).toEqual([
			0,
			expect.closeTo(0.51, 12),
			expect.closeTo(0.83, 12),
			expect.closeTo(1.54, 12)
		]);
		expect(r.limit.spans.map((s) => s.to - s.from)).toEqual([
			expect.closeTo(0.51, 12),
			expect.closeTo(0.32, 12),
			expect.closeTo(0.71, 12)
		]);
	});

	it('an analysis saved before the divider was asked for reads as it did', () => {
		// the old form wrote one span shared equally: { spans: [L/2, L/2] }, no divider
		const old = shelfRequestSchema.parse({
			span: 0.9144,
			depth: 0.2794,
			thickness: 0.01905,
			material: 'red-oak',
			support: { spans: [0.4572, 0.4572], ends: 'simple' }
		});
		expect(old.support).toEqual({ spans: [0.4572, 0.4572], ends: 'simple' });
		const r = analyzeShelf(old);
		expect(r.supports).toEqual([0, 0.4572, 0.9144]);
	});

	it('the whole length, when given, counts the dividers; the thickness has its own bound', () => {
		const total = (span: number) =>
			safeAnalyzeShelf(bare({ span, support: { spans: [l1, l2], divider: t } }));
		expect(total(l1 + l2 + t).ok).toBe(true);
		const wrong = total(l1 + l2);
		expect(wrong.ok).toBe(false);
		if (!wrong.ok) expect(wrong.issues[0].path).toEqual(['span']);
		for (const divider of [0, 0.2, '3/4 bananas']) {
			const r = safeAnalyzeShelf(bare({ support: { spans: [l1, l2], divider } as never }));
			expect(r.ok).toBe(false);
			if (!r.ok) expect(r.issues[0].path).toEqual(['support', 'divider']);
		}
		expect(
			shelfRequestSchema.parse(bare({ support: { spans: ['24"', '30"'], divider: '3/4"' } }))
				.support
		).toEqual({
			spans: [expect.closeTo(0.6096, 12), expect.closeTo(0.762, 12)],
			ends: 'simple',
			divider: expect.closeTo(0.01905, 12)
		});
	});

	it('the longest spans keep their proportions and the divider its thickness', () => {
		const r = maxSpan(bare({ support: { spans: [l1, l2], divider: t } }));
		expect(r.spans[1] / r.spans[0]).toBeCloseTo(l2 / l1, 9);
		const [a, b] = [r.spans[0] + t / 2, r.spans[1] + t / 2];
		// at the longest spans the governing span sits on its limit
		expect(r.analysis.limit.margin).toBeCloseTo(0, 3);
		expect(r.analysis.span).toBeCloseTo(a + b, 9);
	});
});
