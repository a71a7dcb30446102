import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_SHELF_OPTIONS, type ShelfInput } from '../../src/lib/engine';
import { solveShelf, uniformCreep } from '../../src/lib/engine/shelf/analyze';
import { piecesAt, sagAt, withoutShear } from '../../src/lib/engine/shelf/beam';
import { buildModel } from '../../src/lib/engine/shelf/model';

// The analysis's two shortcuts against the general way, over random shelves (SI numbers):
// the long-term beam of a section that creeps alike is the instant beam scaled by 1 + k_def, and a
// statically determinate beam without shear deflection keeps its moments and shears.
const custom = fc.record({
	name: fc.constant('random board'),
	modulus: fc.double({ min: 1e9, max: 2e10, noNaN: true }),
	rupture: fc.double({ min: 1e7, max: 1e8, noNaN: true }),
	density: fc.double({ min: 300, max: 1000, noNaN: true }),
	creepFactor: fc.double({ min: 1, max: 3, noNaN: true })
});
const material = fc.oneof(
	fc.constantFrom('red-oak', 'mdf', 'birch-multiply', 'particleboard-m2'),
	custom
) as fc.Arbitrary<ShelfInput['material']>;
const load = fc.oneof(
	fc.record({
		kind: fc.constant('area' as const),
		pressure: fc.double({ min: 0, max: 5000, noNaN: true })
	}),
	fc.record({
		kind: fc.constant('line' as const),
		intensity: fc.double({ min: 1, max: 800, noNaN: true }),
		from: fc.double({ min: 0, max: 0.3, noNaN: true })
	}),
	fc.record({
		kind: fc.constant('point' as const),
		at: fc.double({ min: 0.01, max: 0.5, noNaN: true }),
		force: fc.double({ min: 1, max: 500, noNaN: true })
	})
);
const shelf: fc.Arbitrary<ShelfInput> = fc.record({
	span: fc.double({ min: 0.6, max: 1.8, noNaN: true }),
	depth: fc.double({ min: 0.1, max: 0.6, noNaN: true }),
	thickness: fc.double({ min: 0.012, max: 0.04, noNaN: true }),
	material,
	grain: fc.constant('along' as const),
	support: fc.constantFrom('simple', 'fixed', 'cantilever') as fc.Arbitrary<
		'simple' | 'fixed' | 'cantilever'
	>,
	loads: fc.array(load, { minLength: 1, maxLength: 3 }),
	selfWeight: fc.boolean(),
	edges: fc.constantFrom(
		[],
		[{ side: 'front' as const, material: 'red-oak', height: 0.04, thickness: 0.019 }]
	),
	duration: fc.constantFrom('short', 'long') as fc.Arbitrary<'short' | 'long'>,
	service: fc.constantFrom('dry', 'humid') as fc.Arbitrary<'dry' | 'humid'>,
	limit: fc.constant('L/144' as const),
	options: fc.record({
		shearDeflection: fc.boolean(),
		safetyFactor: fc.constant(DEFAULT_SHELF_OPTIONS.safetyFactor),
		curvePoints: fc.constant(DEFAULT_SHELF_OPTIONS.curvePoints)
	})
});

/** Equal to rounding: relative to the largest of the two, or both below a femtometre. */
const same = (a: number, b: number, scale: number) =>
	expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-11 * Math.max(Math.abs(scale), 1e-15 / 1e-11));

describe('the shortcuts equal the general way', () => {
	it('the long-term sag: scaled instant beam = long-term beam solved', () => {
		let scaled = 0;
		fc.assert(
			fc.property(shelf, (input) => {
				const model = buildModel(input);
				if (uniformCreep(model) !== null) scaled++;
				const fast = solveShelf(model);
				const general = solveShelf(model, true);
				expect(fast.creepApplies).toBe(general.creepApplies);
				let peak = 0;
				for (let i = 0; i <= 40; i++)
					peak = Math.max(peak, Math.abs(general.longTerm((model.length * i) / 40)));
				for (let i = 0; i <= 40; i++) {
					const x = (model.length * i) / 40;
					same(piecesAt(fast.pieces, x), piecesAt(general.pieces, x), peak);
				}
			}),
			{ numRuns: 300 }
		);
		// most random sections creep alike, so the shortcut is what was tested
		expect(scaled).toBeGreaterThan(100);
	});
	it('the sag without shear: refitted determinate beam = beam solved without shear', () => {
		fc.assert(
			fc.property(shelf, (input) => {
				const model = buildModel(input);
				const { all } = solveShelf(model);
				const fast = withoutShear(all);
				const general = withoutShear(all, true);
				expect(fast.model.ga).toBe(Infinity);
				const scale = Math.max(
					...[0, 0.25, 0.5, 0.75, 1].map((f) => Math.abs(sagAt(general, f * model.length)))
				);
				for (let i = 0; i <= 40; i++) {
					const x = (model.length * i) / 40;
					same(sagAt(fast, x), sagAt(general, x), scale);
				}
			}),
			{ numRuns: 300 }
		);
	});
	it('a beam already without shear is kept as it is', () => {
		fc.assert(
			fc.property(shelf, (input) => {
				const model = buildModel({
					...input,
					options: { ...input.options, shearDeflection: false }
				});
				const { all } = solveShelf(model);
				const kept = withoutShear(all);
				expect([kept.m0, kept.v0, kept.c1, kept.c2]).toEqual([all.m0, all.v0, all.c1, all.c2]);
			}),
			{ numRuns: 100 }
		);
	});
});
