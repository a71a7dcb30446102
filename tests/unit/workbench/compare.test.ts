import { describe, expect, it } from 'vitest';
import {
	candidateLabel,
	defaultComparison,
	fromComparisonInput,
	toComparisonRequest
} from '../../../src/lib/workbench/compare-draft';
import { alignParts, chartSpans } from '../../../src/lib/workbench/compare-run';
import { comparisonRequestSchema } from '../../../src/lib/schemas/analysis';

// 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
const IN = 0.0254;

describe('alignParts', () => {
	it('splits a figure where a column lines up: before the fraction or the decimal', () => {
		expect(alignParts('41 7/8"')).toEqual(['41', ' 7/8"']);
		expect(alignParts('39"')).toEqual(['39', '"']);
		expect(alignParts('3/16"')).toEqual(['', '3/16"']);
		expect(alignParts('1.25"')).toEqual(['1', '.25"']);
		expect(alignParts('902 mm')).toEqual(['902', ' mm']);
		expect(alignParts('< 1/16"')).toEqual(['', '< 1/16"']);
	});
});

describe('the comparison draft', () => {
	it('names a candidate by its thickness in the user unit, material and nosing', () => {
		expect(
			candidateLabel(
				{ material: 'red-oak', thickness: '3/4', nosing: true, nosingHeight: '1.5' },
				'frac16'
			)
		).toBe('3/4" Red oak + 1 1/2" nosing');
	});
	it('makes a request the shared comparison schema accepts, and reads it back', () => {
		const draft = defaultComparison('frac16');
		draft.candidates[1].nosing = true;
		const parsed = comparisonRequestSchema.parse(toComparisonRequest(draft, 'frac16'));
		expect(parsed.shelf.span).toBeCloseTo(36 * IN, 12);
		expect(parsed.candidates[1].edges?.[0].height).toBeCloseTo(1.5 * IN, 12);
		const back = fromComparisonInput(parsed, 'frac16');
		expect(back.shelf.span).toBe('36"');
		expect(back.candidates.map((c) => [c.material, c.thickness, c.nosing])).toEqual([
			['hardwood-plywood-veneer-core', '3/4"', false],
			['mdf', '3/4"', true]
		]);
		expect(back.candidates[1].nosingHeight).toBe('1 1/2"');
	});
	it('charts from a third of the span to past the longest span found', () => {
		const spans = chartSpans(0.9, 1.2, 5);
		expect(spans[0]).toBeCloseTo(0.3, 12);
		expect(spans.at(-1)).toBeCloseTo(1.38, 12); // 1.2 × 1.15 beats 0.9 × 1.4 = 1.26
	});
});
