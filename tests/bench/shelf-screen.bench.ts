// Time from an input change to the updated drawing data on the shelf check screen, as the browser
// does it on every keystroke: the form's texts to a request, the engine's safe analysis, the
// sentences, the drawing's inputs and its layout. The fixes (inverse solvers) run once typing
// pauses and the comparison on each change of its screen: measured apart.
import { bench, describe } from 'vitest';
import { layoutShelf } from '../../src/lib/components/shelf-drawing/geometry';
import { safeAnalyzeShelf } from '../../src/lib/compute';
import { defaultComparison, toComparisonRequest } from '../../src/lib/workbench/compare-draft';
import { runComparison } from '../../src/lib/workbench/compare-run';
import { defaultDraft, toRequest } from '../../src/lib/workbench/shelf-draft';
import { fixesFor } from '../../src/lib/workbench/shelf-fixes';
import { describeShelf } from '../../src/lib/kinds/shelf-words';
import { drawingFor } from '../../src/lib/workbench/shelf-view';

const draft = defaultDraft('frac16');
const spans = ['30', '30 1/2', '31', '31 1/2', '32', '32 1/2', '33', '35 1/2"'];
let i = 0;

describe('shelf check: one keystroke', () => {
	bench('span typed → request → analysis → sentences → drawing layout', () => {
		const d = { ...draft, span: spans[i++ % spans.length] };
		const run = safeAnalyzeShelf(toRequest(d, 'frac16'));
		if (!run.ok) throw new Error('unreadable');
		describeShelf(run.result, 'frac16', { contents: 'books' });
		layoutShelf(drawingFor(d, run.result, 'frac16'), 720);
	});
});

describe('shelf check: after typing pauses', () => {
	const failing = { ...draft, material: 'mdf', span: '24' };
	const request = toRequest(failing, 'frac16');
	bench('fixes from the inverse solvers (span, thickness, nosing, centre support)', () => {
		fixesFor(failing, request, 'frac16');
	});
});

describe('comparison: one change', () => {
	const comparison = defaultComparison('frac16');
	comparison.candidates.push({ ...comparison.candidates[0], material: 'red-oak' });
	const request = toComparisonRequest(comparison, 'frac16');
	bench('three candidates: analyses, longest spans and 32 chart points each', () => {
		runComparison(request, 0.9144);
	});
});
