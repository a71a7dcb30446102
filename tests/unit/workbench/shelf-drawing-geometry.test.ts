import { describe, expect, it } from 'vitest';
import {
	exaggerationFor,
	layoutShelf,
	sagAt,
	type ShelfDrawingInput
} from '../../../src/lib/components/shelf-drawing/geometry';

// A made-up shelf for the drawing only (no published figures): 0.9 m span, 19 mm panel,
// a parabola-like sag of 2 mm at mid-span, a limit of 6.25 mm.
const curve: [number, number][] = Array.from({ length: 11 }, (_, i) => {
	const x = (0.9 * i) / 10;
	return [x, (0.002 * 4 * x * (0.9 - x)) / 0.81];
});
const shelf: ShelfDrawingInput = {
	spanM: 0.9,
	thicknessM: 0.019,
	support: 'simple',
	supportsM: [0, 0.9],
	loads: [{ kind: 'area', fromM: 0, toM: 0.9, label: '40 lbf/ft²' }],
	strips: [],
	curve,
	sagAtM: 0.45,
	sagM: 0.002,
	allowedM: 0.00625
};

describe('exaggerationFor', () => {
	it('takes the largest 1-2-5 factor not above the wanted one', () => {
		expect(exaggerationFor(37)).toBe(20);
		expect(exaggerationFor(50)).toBe(50);
		expect(exaggerationFor(9.9)).toBe(5);
		expect(exaggerationFor(230)).toBe(200);
	});
	it('never shrinks a sag that is already large', () => {
		expect(exaggerationFor(0.4)).toBe(1);
		expect(exaggerationFor(Number.POSITIVE_INFINITY)).toBe(1);
	});
});

describe('sagAt', () => {
	it('interpolates between the points of the curve', () => {
		// between x = 0.09 and 0.18 the made-up curve goes 0.00072 → 0.00128
		expect(sagAt(curve, 0.135)).toBeCloseTo(0.001, 6);
		expect(sagAt(curve, 0.45)).toBeCloseTo(0.002, 9);
		expect(sagAt(null, 0.3)).toBe(0);
	});
});

describe('layoutShelf', () => {
	it('draws the span across the width between the case sides', () => {
		const g = layoutShelf(shelf, 720);
		// 720 px less 22 left, 84 right and two 16 px sides
		expect(g.x1 - g.x0).toBeCloseTo(582, 0);
		expect(g.scale).toBeCloseTo(582 / 0.9, 3);
		expect(g.spans).toEqual([{ from: g.x0, to: g.x1, lengthM: 0.9 }]);
	});
	it('exaggerates so the larger of sag and limit is about 56 px, on a 1-2-5 step', () => {
		const g = layoutShelf(shelf, 720);
		// the limit 6.25 mm at 646.7 px/m is 4.04 px: ×13.9 wanted, ×10 taken
		expect(g.exaggeration).toBe(10);
		expect(g.limit!.y - g.sag!.built).toBeCloseTo(0.00625 * g.scale * 10, 0);
		expect(g.sag!.loaded - g.sag!.built).toBeCloseTo(0.002 * g.scale * 10, 0);
	});
	it('spaces the arrows of an area load over the whole span, tips on the bent shelf', () => {
		const g = layoutShelf(shelf, 720);
		expect(g.arrows.length).toBeGreaterThan(10);
		expect(g.arrows[0].x).toBeCloseTo(g.x0, 0);
		expect(g.arrows.at(-1)!.x).toBeCloseTo(g.x1, 0);
		const mid = g.arrows[Math.floor(g.arrows.length / 2)];
		expect(mid.tip).toBeGreaterThan(g.arrows[0].tip);
	});
	it('puts a divider under each inner support of a continuous shelf', () => {
		const g = layoutShelf({ ...shelf, support: 'continuous', supportsM: [0, 0.45, 0.9] }, 720);
		expect(g.supports.map((s) => s.kind)).toEqual(['side', 'divider', 'side']);
		expect(g.spans).toHaveLength(2);
		expect(g.spans[0].lengthM).toBeCloseTo(0.45, 9);
	});
	it('draws dividers to scale and dimensions each span clear between faces (issue 15 item 10)', () => {
		// spans of 0.3 m and 0.5 m clear over a 0.02 m divider: its centre at 0.31 m, the shelf 0.82 m
		const g = layoutShelf(
			{ ...shelf, spanM: 0.82, support: 'continuous', supportsM: [0, 0.31, 0.82], dividerM: 0.02 },
			720
		);
		const divider = g.supports[1];
		expect(divider.kind).toBe('divider');
		expect(divider.width).toBeCloseTo(0.02 * g.scale, 0);
		expect(divider.x + divider.width / 2).toBeCloseTo(g.x0 + 0.31 * g.scale, 0);
		expect(g.spans.map((s) => s.lengthM)).toEqual([
			expect.closeTo(0.3, 12),
			expect.closeTo(0.5, 12)
		]);
		// the dimension lines end at the divider's faces
		expect(g.spans[0].to).toBeCloseTo(divider.x, 0);
		expect(g.spans[1].from).toBeCloseTo(divider.x + divider.width, 0);
		expect(g.spans[1].to - g.spans[1].from).toBeCloseTo(0.5 * g.scale, 0);
	});
	it('draws a divider of no given thickness as a hairline at its centre', () => {
		const g = layoutShelf({ ...shelf, support: 'continuous', supportsM: [0, 0.45, 0.9] }, 720);
		expect(g.supports[1].width).toBe(2);
		expect(g.spans[0].lengthM).toBeCloseTo(0.45, 12);
	});
	it('draws a wall and one reach for a cantilever', () => {
		const g = layoutShelf({ ...shelf, support: 'cantilever', supportsM: [0] }, 375);
		expect(g.supports).toEqual([{ kind: 'wall', x: g.x0 - 16, width: 16 }]);
		expect(g.spans).toEqual([{ from: g.x0, to: g.x1, lengthM: 0.9 }]);
	});
	it('makes the front face as tall as a nosing deeper than the panel', () => {
		const g = layoutShelf({ ...shelf, strips: [{ side: 'front', heightM: 0.038 }] }, 720);
		expect(g.facePx).toBeCloseTo(0.038 * g.scale, 0);
		expect(g.bands.map((b) => b.side)).toEqual(['panel', 'front']);
	});
	it('still lays out a shelf whose inputs cannot be read yet', () => {
		const g = layoutShelf({ ...shelf, curve: null, sagM: null, sagAtM: null, allowedM: null }, 320);
		expect(g.exaggeration).toBe(1);
		expect(g.sag).toBeNull();
		expect(Number.isFinite(g.height)).toBe(true);
	});
});
