import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type DesignChange } from '../../src/lib/engine/case';
import { checkCase, type CaseDesignInput } from '../../src/lib/compute';
import { InputError } from '../../src/lib/engine';
import { findMaterial } from '../../reference/materials';
import { STOCK_HOLDING } from '../../reference/stock-holding';
import { materials } from '../../reference/materials';
import { allFinite } from './joinery-finite';

const IN = 0.0254;
const PSF = 4.4482216152605 / 0.3048 ** 2; // 1 lbf/ft² in Pa (1 lbf over a square foot)
const G = 9.80665;

const load40 = [{ kind: 'area' as const, pressure: '40 lbf/ft^2' }];
const bookcase = (over: Partial<CaseDesignInput> = {}): CaseDesignInput => ({
	name: 'Bay 1',
	width: '36"',
	height: '80"',
	depth: '12"',
	sides: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	back: { material: 'hardwood-plywood-veneer-core', thickness: '1/4"' },
	shelves: [
		{ height: '20"', kind: 'adjustable', loads: load40 },
		{ height: '40"', kind: 'fixed', joint: 'pocket-screw', loads: load40 },
		{ height: '60"', kind: 'adjustable', loads: load40 }
	],
	anchoring: { kind: 'bracket', intoStuds: true },
	...over
});

/** Apply suggested changes as the UI would: set each value at its path. */
function apply(design: CaseDesignInput, changes: DesignChange[]): CaseDesignInput {
	const copy = structuredClone(design) as Record<string | number, unknown>;
	for (const c of changes) {
		let at = copy as Record<string | number, unknown>;
		for (const k of c.path.slice(0, -1)) at = (at[k] ??= {}) as Record<string | number, unknown>;
		at[c.path[c.path.length - 1]] = c.value;
	}
	return copy as unknown as CaseDesignInput;
}

describe('checkCase: geometry, cut list and demand', () => {
	const r = checkCase(bookcase());

	it('spans the inside width and the depth inside a rabbeted back', () => {
		// 36" − 2 · 3/4" = 34-1/2" span; 12" − 1/4" back = 11-3/4" inside
		expect(r.shelves[0].spanM / IN).toBeCloseTo(34.5, 9);
		expect(r.shelves[0].depthM / IN).toBeCloseTo(11.75, 9);
		const side = r.parts.find((p) => p.name === 'side')!;
		expect(side.count).toBe(2);
		expect(side.lengthM / IN).toBeCloseTo(80, 9);
		// adjustable shelves cut 1/16" short of the opening (common practice, no source)
		const adjustable = r.parts.find((p) => p.name === 'adjustable shelf')!;
		expect(adjustable.count).toBe(2);
		expect(adjustable.lengthM / IN).toBeCloseTo(34.4375, 9);
	});

	it('each end of a simply supported shelf carries half its load (statics)', () => {
		// 40 lbf/ft² over 34.5" × 11.75" = 40 · 2.8151 ft² = 112.60 lbf = 500.9 N, plus the shelf's weight
		const s = r.shelves[1];
		const applied = 40 * PSF * 34.5 * IN * 11.75 * IN;
		expect(s.analysis.load.applied).toBeCloseTo(applied, 6);
		const j = r.joints.find((x) => x.id === 'shelf-2')!;
		expect(j.plan.demand.shearN).toBeCloseTo((applied + s.analysis.load.selfWeight) / 2, 6);
		expect(j.plan.fastener).toBe('pocket-screw');
		expect(r.joints.find((x) => x.id === 'shelf-1')!.plan.fastener).toBe('shelf-pin');
	});

	it('weighs the case from its panels and densities, and adds the contents', () => {
		const density = findMaterial('hardwood-plywood-veneer-core')!.densityKgM3;
		const t = 0.75 * IN;
		const inner = 34.5 * IN;
		const inside = 11.75 * IN;
		const panels =
			2 * 80 * IN * 12 * IN * t + // sides
			5 * inner * inside * t + // top, bottom, three shelves
			80 * IN * (inner + t) * 0.25 * IN; // back into half of each side
		const contents = (3 * 40 * PSF * inner * inside) / G;
		expect(r.stability.centreOfGravity.empty.massKg).toBeCloseTo(panels * density, 6);
		expect(r.stability.centreOfGravity.loaded.massKg).toBeCloseTo(panels * density + contents, 6);
	});

	it('is an estimate with cautions, and every number is finite', () => {
		expect(r.estimate).toBe(true);
		expect(r.cautions.join(' ')).toMatch(/Anchor every tall case/);
		expect(r.cautions.join(' ')).toMatch(/estimate/);
		expect(allFinite(r)).toEqual([]);
	});

	it('every shelf material has fastener-holding figures under the same id', () => {
		const held = new Set(STOCK_HOLDING.map((s) => s.id));
		expect(materials.map((m) => m.id).filter((id) => !held.has(id))).toEqual([]);
	});
});

describe('checkCase: failures, worst first, and suggestions that fix them', () => {
	// 3/4" MDF over 46-1/2" at 50 lbf/ft² sags far past L/144
	const sagging = bookcase({
		width: '48"',
		sides: { material: 'mdf', thickness: '3/4"' },
		back: undefined,
		shelves: [
			{ height: '40"', kind: 'adjustable', loads: [{ kind: 'area', pressure: '50 lbf/ft^2' }] }
		]
	});

	it('puts the failing shelf first and offers thicker stock, a nosing and a narrower case', () => {
		const r = checkCase(sagging);
		expect(r.pass).toBe(false);
		expect(r.margins[0].key).toBe('shelves.0:sag');
		expect(r.margins[0].margin).toBeLessThan(0);
		const paths = r.suggestions.map((s) => s.changes.map((c) => c.path.join('.')).join(' '));
		expect(paths).toEqual(expect.arrayContaining(['shelves.0.nosing', 'width']));
	});

	it('each verified suggestion, applied to the design, clears the failure it names', () => {
		const r = checkCase(sagging);
		const verified = r.suggestions.filter((s) => s.verified);
		expect(verified.length).toBeGreaterThan(0);
		for (const s of verified) {
			const after = checkCase(apply(sagging, s.changes));
			for (const key of s.fixes)
				expect(after.margins.find((m) => m.key === key)?.pass, `${s.title} → ${key}`).toBe(true);
		}
	});

	it('a fixed-end shelf on biscuits cannot hold its end moment; a dado or simple ends fix it', () => {
		const fixed = bookcase({
			shelves: [{ height: '40"', kind: 'fixed', joint: 'biscuit', ends: 'fixed', loads: load40 }]
		});
		const r = checkCase(fixed);
		const joint = r.margins.find((m) => m.key === 'joint:shelf-1')!;
		expect(joint.pass).toBe(false);
		const fixes = r.suggestions.filter((s) => s.fixes.includes('joint:shelf-1') && s.verified);
		expect(fixes.length).toBeGreaterThan(0);
		for (const s of fixes)
			expect(
				checkCase(apply(fixed, s.changes)).margins.find((m) => m.key === 'joint:shelf-1')!.pass
			).toBe(true);
	});

	it('a tall case without anchoring fails until the anchoring suggestion is applied', () => {
		const loose = bookcase({ anchoring: undefined });
		const r = checkCase(loose);
		expect(r.margins[0]).toMatchObject({ key: 'stability:anchoring', pass: false, margin: null });
		const s = r.suggestions.find((x) => x.fixes.includes('stability:anchoring'))!;
		expect(
			checkCase(apply(loose, s.changes)).margins.find((m) => m.key === 'stability:anchoring')
		).toBeUndefined();
	});
});

describe('checkCase: requests', () => {
	it('every output is finite for valid designs', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 18, max: 60, noNaN: true }),
				fc.double({ min: 30, max: 96, noNaN: true }),
				fc.double({ min: 10, max: 24, noNaN: true }),
				fc.array(
					fc.record({
						frac: fc.double({ min: 0.1, max: 0.95, noNaN: true }),
						psf: fc.double({ min: 0, max: 60, noNaN: true }),
						fixed: fc.boolean()
					}),
					{ maxLength: 6 }
				),
				fc.constantFrom(
					'mdf',
					'particleboard-m2',
					'hardwood-plywood-veneer-core',
					'red-oak',
					'softwood-plywood'
				),
				(w, h, dp, shelves, material) => {
					const r = checkCase({
						width: w * IN,
						height: h * IN,
						depth: dp * IN,
						sides: { material, thickness: 0.75 * IN },
						shelves: shelves.map((s) => ({
							height: s.frac * h * IN,
							kind: s.fixed ? 'fixed' : 'adjustable',
							loads: [{ kind: 'area', pressure: s.psf * PSF }]
						}))
					});
					expect(allFinite(r)).toEqual([]);
					expect(r.cautions.length).toBeGreaterThan(0);
				}
			),
			{ numRuns: 60 }
		);
	});

	it('drawers and doors of the design reach the tip-over check', () => {
		const r = checkCase(
			bookcase({
				drawers: [{ height: '6"', weight: '15 lb', contentsWeight: '20 lb', extension: '10"' }],
				doors: [{ weight: '12 lb', width: '17"', centreHeight: '30"' }]
			})
		);
		const drawer = r.stability.frontEdgeLoads[0];
		expect(drawer.where).toBe('drawer 1 pulled out');
		// no set-back or tilt: the lever of a load on the drawer front is its 10" of extension
		expect(drawer.leverM / IN).toBeCloseTo(10, 9);
		expect(r.margins.some((m) => m.key === 'stability:front-edge')).toBe(true);
	});

	it('a material given by its figures is held as softwood of its specific gravity, and says so', () => {
		// density 560 kg/m³ → G = 560 / 1120 = 0.50 (the inverse of the density rule of reference/materials.ts)
		const custom = { name: 'shop panel', modulus: '1.2e6 psi', rupture: '5000 psi', density: 560 };
		const r = checkCase(bookcase({ sides: { material: custom, thickness: '3/4"' } }));
		expect(r.warnings.join(' ')).toMatch(/taken as softwood/);
		const side = r.joints[0].plan;
		expect(side.fastener).toBe('shelf-pin');
		// shelf-pin bearing uses the side: Fe = 16,600 · 0.5^1.84 = 4636.7 psi
		expect(side.sources[0]).toMatch(/shop panel/);
	});

	it('names every bad field', () => {
		try {
			checkCase({ ...bookcase(), width: '1"', shelves: [{ height: '90"' }] });
			expect.unreachable();
		} catch (e) {
			expect(e).toBeInstanceOf(InputError);
			const paths = (e as InputError).issues.map((i) => i.path.join('.'));
			expect(paths).toEqual(expect.arrayContaining(['sides.thickness', 'shelves.0.height']));
		}
	});
});
