import { describe, expect, it } from 'vitest';
import { analyzeInput, type ShelfInput } from '../../src/lib/engine';
import { shelfCases } from './support/solver-cases';

// The compute API's `curve` query asks the engine for fewer curve points (or none): only the curve
// changes, uplift is still looked for at 101 points, and the curve's points lie on the same sag.
const withPoints = (input: ShelfInput, curvePoints: number): ShelfInput => ({
	...input,
	options: { ...input.options, curvePoints }
});

describe('a shorter curve', () => {
	const inputs = shelfCases(60, 11);
	it('changes nothing but the curve, warnings (uplift) included', () => {
		let uplifts = 0;
		for (const input of inputs) {
			let full;
			try {
				full = analyzeInput(input);
			} catch {
				continue; // a request the engine refuses: refused the same whatever the curve
			}
			const { curve, ...figures } = full;
			expect(curve).toHaveLength(101);
			if (full.warnings.some((w) => w.code === 'uplift')) uplifts++;
			for (const n of [0, 2, 11, 51]) {
				const { curve: short, ...same } = analyzeInput(withPoints(input, n));
				expect(same).toEqual(figures);
				expect(short).toHaveLength(n);
				if (n) expect(short[n - 1][0]).toBeCloseTo(full.span, 12);
				// every (100 / (n − 1))th point of the full curve, to rounding
				short.forEach(([x, y], i) => {
					const j = (i * 100) / (n - 1);
					expect(x).toBeCloseTo(curve[j][0], 12);
					expect(y).toBeCloseTo(curve[j][1], 12);
				});
			}
		}
		// the set holds shelves that lift off a support, so the uplift scan is exercised
		expect(uplifts).toBeGreaterThan(0);
	});
});
