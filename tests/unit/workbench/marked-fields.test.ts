/**
 * Issue 15 item 4 on the comparison and case screens: when a field is marked, the summary at the
 * top names it and links to its control (one shared component, components/error-summary).
 */
import { describe, expect, it } from 'vitest';
import { caseProblems, casePlace } from '../../../src/lib/case-designer/field-places';
import { issuesByField, runCase } from '../../../src/lib/case-designer/check';
import { defaultCase, toDesign } from '../../../src/lib/case-designer/draft';
import { compareErrors, compareProblems } from '../../../src/lib/workbench/compare-errors';
import { defaultComparison, toComparisonRequest } from '../../../src/lib/workbench/compare-draft';
import { runComparison } from '../../../src/lib/workbench/compare-run';

describe('the comparison names its marked fields', () => {
	it('files a candidate’s unreadable thickness under that candidate, a shared load under the shelf', () => {
		const draft = defaultComparison('frac16');
		draft.candidates[1].thickness = 'thick';
		draft.shelf.load = '40 bananas';
		const runs = runComparison(toComparisonRequest(draft, 'frac16'), 0.9144).runs;
		const errors = compareErrors(runs, false);
		expect(Object.keys(errors).sort()).toEqual(['1.thickness', 'load']);
		expect(compareProblems(errors, draft).map(({ id, label }) => [id, label])).toEqual([
			['load-value', 'Load'],
			['cand-1-thickness', 'Candidate 2, thickness']
		]);
	});
	it('a missing span is named, as the whole length when the shelf runs over a divider', () => {
		const draft = defaultComparison('frac16');
		draft.shelf.support = 'continuous';
		expect(compareProblems(compareErrors([], true), draft)).toEqual([
			{ id: 'cmp-span', label: 'Whole length', message: 'Enter the span.' }
		]);
	});
});

describe('the case designer names its marked fields', () => {
	it('a shelf’s unreadable thickness and a bad width, each linked to its control', () => {
		const draft = defaultCase('frac16');
		draft.shelves[2].thickness = 'thick';
		draft.width = '36 bananas';
		const run = runCase(toDesign(draft, 'frac16'));
		expect(run.ok).toBe(false);
		if (run.ok) return;
		const problems = caseProblems(issuesByField(run.issues), draft);
		expect(problems.map(({ id, label }) => [id, label])).toEqual(
			expect.arrayContaining([
				['case-width', 'Width'],
				['shelf-2-thickness', 'Shelf 3, thickness']
			])
		);
	});
	it('a named shelf is named by its name; a folded nosing field is found too', () => {
		const draft = defaultCase('frac16');
		draft.shelves[0].name = 'Top shelf';
		expect(casePlace('shelves.0.nosing.height', draft)).toEqual({
			id: 'shelf-0-nosing-h',
			label: 'Top shelf, nosing height'
		});
		expect(casePlace('faceFrame.railWidth', draft)?.id).toBe('frame-rail');
		expect(casePlace('form', draft)).toBeUndefined();
	});
});
