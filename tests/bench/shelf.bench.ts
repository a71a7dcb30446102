import { bench, describe } from 'vitest';
import { analyzeInput, maxSpanInput } from '../../src/lib/engine';
import { analyzeShelf, maxSpan, type ShelfRequest } from '../../src/lib/compute';
import { maxSpanRequestSchema } from '../../src/lib/schemas/shelf';
import { buildModel } from '../../src/lib/engine/shelf/model';
import { solveShelf } from '../../src/lib/engine/shelf/analyze';
import { shelfRequestSchema } from '../../src/lib/schemas/shelf';

// Each engine figure sits beside a bare inline formula loop run in the same process: the ratio
// is the figure that travels between machines.
const request: ShelfRequest = {
	span: 0.9,
	depth: 0.28,
	thickness: 0.019,
	material: 'red-oak',
	loads: [{ kind: 'area', pressure: 1915 }]
};
const E = 12.5e9;
const I = (0.28 * 0.019 ** 3) / 12;
const w = 1915 * 0.28;
let sink = 0;

describe('one analysis', () => {
	bench('analyzeShelf (validate, model, solve, 101-point curve)', () => {
		sink += analyzeShelf(request).sag.longTerm;
	});
	const validated = shelfRequestSchema.parse(request);
	bench('analyzeInput (already validated: model, solve, 101-point curve)', () => {
		sink += analyzeInput(validated).sag.longTerm;
	});
	bench('bare formula: 5wL⁴/384EI + wL²/8κGA', () => {
		const L = 0.9 + sink * 1e-12;
		sink +=
			(5 * w * L ** 4) / (384 * E * I) + (w * L * L) / (8 * (5 / 6) * (E / 16) * 0.28 * 0.019);
	});
});

describe('longest span', () => {
	const { span: _s, ...withoutSpan } = request;
	bench('maxSpan (bracketed root find over the full analysis)', () => {
		sink += maxSpan(withoutSpan).span;
	});
	const validated = maxSpanRequestSchema.parse(withoutSpan);
	bench('maxSpanInput (already validated)', () => {
		sink += maxSpanInput(validated).span;
	});
	bench('bare formula: cube root of 384EI/(144·5w)', () => {
		sink += Math.cbrt((384 * E * I) / (144 * 5 * (w + sink * 1e-12)));
	});
});

describe('curve of 101 points', () => {
	const input = shelfRequestSchema.parse(request);
	const solved = solveShelf(buildModel(input));
	bench('engine curve (quartic pieces, creep included)', () => {
		let s = 0;
		for (let i = 0; i <= 100; i++) s += solved.longTerm((0.9 * i) / 100);
		sink += s;
	});
	bench('bare formula loop: w·x(L³ − 2Lx² + x³)/24EI', () => {
		let s = 0;
		const L = 0.9;
		for (let i = 0; i <= 100; i++) {
			const x = (L * i) / 100;
			s += (w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * E * I);
		}
		sink += s;
	});
});
