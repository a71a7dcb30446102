import { describe, expect, it } from 'vitest';
import { safeAnalyzeShelf, type ShelfRequest } from '../../src/lib/engine';

// Found by the junk-input property test (fast-check counterexample span = 5e-324): a denormal
// length reached the solver and came back as an issue with no field. Lengths below a micrometre
// are refused at the edge, naming the field.
describe('lengths too small to be real', () => {
	const shelf = { depth: '10"', thickness: '3/4"', material: 'red-oak' };
	for (const span of [5e-324, 1e-300, 1e-9])
		it(`span ${span} m is refused on the span field`, () => {
			const r = safeAnalyzeShelf({ ...shelf, span } as ShelfRequest);
			expect(r.ok).toBe(false);
			if (!r.ok)
				expect(r.issues).toEqual([
					{ path: ['span'], message: 'Too small: at least 0.001 mm. Check the unit.' }
				]);
		});
	it('a micrometre is still computed, and finite', () => {
		const r = safeAnalyzeShelf({ ...shelf, span: 1e-6 } as ShelfRequest);
		expect(r.ok).toBe(true);
		if (r.ok) expect(Number.isFinite(r.result.sag.instant)).toBe(true);
	});
});
