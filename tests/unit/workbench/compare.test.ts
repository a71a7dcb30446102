import { describe, expect, it } from 'vitest';
import {
	candidateLabel,
	defaultComparison,
	fromComparisonInput,
	toComparisonRequest
} from '../../../src/lib/workbench/compare-draft';
import {
	alignParts,
	at,
	candidateRequest,
	chartSpans,
	runComparison
} from '../../../src/lib/workbench/compare-run';
import { safeAnalyzeShelf, safeMaxSpan } from '../../../src/lib/compute';
import type { ComparisonRequest } from '../../../src/lib/schemas/analysis';
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

describe('the comparison chart, computed once per candidate', () => {
	// what the chart showed before: every span's request read by the schema and analysed again
	function pointsByRequest(req: ComparisonRequest, currentM: number) {
		const first = runComparison(req, currentM);
		const longest = Math.max(currentM, ...first.runs.map((r) => r.maxSpanM ?? 0));
		return req.candidates.map((_, i) => {
			if (!first.runs[i].result) return [];
			const points: [number, number][] = [];
			for (const s of chartSpans(currentM, longest)) {
				const out = safeAnalyzeShelf(at(candidateRequest(req, i), s));
				if (out.ok) points.push([s, out.result.sag[out.result.sag.checked]]);
			}
			return points;
		});
	}

	const shelf = (extra: Record<string, unknown> = {}) =>
		({
			span: 36 * IN,
			depth: 11.25 * IN,
			loads: [{ kind: 'area', pressure: '40 psf' }],
			...extra
		}) as ComparisonRequest['shelf'];
	// [what, request, current span, how many of the 32 spans each candidate charts]
	const cases: [string, ComparisonRequest, number, number[]][] = [
		[
			'two panels under a spread load',
			{
				shelf: shelf(),
				candidates: [
					{ material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
					{ material: 'mdf', thickness: '3/4"' }
				]
			},
			36 * IN,
			[32, 32]
		],
		[
			'a point load that falls off the shorter spans, and a nosing',
			{
				shelf: shelf({ loads: [{ kind: 'point', force: '50 lbf', at: '30"' }] }),
				candidates: [
					{ material: 'red-oak', thickness: '3/4"' },
					{
						material: 'mdf',
						thickness: '3/4"',
						edges: [{ side: 'front', material: 'red-oak', height: '1 1/2"', thickness: '3/4"' }]
					}
				]
			},
			36 * IN,
			[-1, -1]
		],
		[
			'over two dividers: each chart span split between them',
			{
				shelf: shelf({ span: 4, support: { spans: [2, 2], ends: 'simple' } }),
				candidates: [
					{ material: 'mdf', thickness: '5/8"' },
					{ material: 'red-oak', thickness: '1"' }
				]
			},
			4,
			[32, 32]
		],
		[
			'a candidate the engine refuses (an unknown material)',
			{
				shelf: shelf(),
				candidates: [
					{ material: 'unobtainium', thickness: '3/4"' },
					{ material: 'mdf', thickness: '3/4"' }
				]
			},
			36 * IN,
			[0, 32]
		]
	];
	for (const [what, req, currentM, counts] of cases)
		it(`charts the same points as reading each span's request: ${what}`, () => {
			const parsed = comparisonRequestSchema.parse(req);
			const { runs } = runComparison(parsed, currentM);
			const expected = pointsByRequest(parsed, currentM);
			expect(runs.map((r) => r.points)).toEqual(expected);
			runs.forEach((r, i) => {
				if (counts[i] >= 0) expect(r.points).toHaveLength(counts[i]);
				else {
					// some spans charted, some refused
					expect(r.points.length).toBeGreaterThan(5);
					expect(r.points.length).toBeLessThan(32);
				}
			});
		});

	it('finds the same longest span as the solver, from memory on the next span change', () => {
		const req = comparisonRequestSchema.parse(cases[0][1]);
		const first = runComparison(req, 36 * IN);
		const again = runComparison(req, 30 * IN);
		for (const [i, run] of again.runs.entries()) {
			const solved = safeMaxSpan({ ...candidateRequest(req, i), span: undefined });
			expect(solved.ok).toBe(true);
			if (solved.ok) expect(run.maxSpanM).toBe(solved.result.span);
			expect(run.maxSpanM).toBe(first.runs[i].maxSpanM);
		}
	});
});
