/**
 * Issue 15, items 1–3 and 13: what the user typed is what is computed, stored and shown back.
 * Display precision never becomes input, a bare number means the user's own unit system, errors
 * name the exact field and bound, and the retired per-foot limit still opens.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { materials } from '../../../reference/materials';
import { analyzeShelf } from '../../../src/lib/compute';
import { parseLength } from '../../../src/lib/engine/units/length';
import { parseQuantity } from '../../../src/lib/engine/units/quantity';
import {
	bareLoadUnits,
	withLoadUnit,
	withUnitMark
} from '../../../src/lib/components/quantity-input/reading';
import { spreadLoad } from '../../../src/lib/case-designer/readers';
import { defaultCase, toDesign } from '../../../src/lib/case-designer/draft';
import { fromDesign } from '../../../src/lib/case-designer/stored';
import { caseDesignSchema } from '../../../src/lib/schemas/case';
import { shelfRequestSchema } from '../../../src/lib/schemas/shelf';
import { lengthText, type UserLengthUnit } from '../../../src/lib/workbench/lengths';
import {
	LIMIT_CHOICES,
	defaultDraft,
	fromInput,
	toRequest,
	type ShelfDraft
} from '../../../src/lib/workbench/shelf-draft';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959)
const IN = 0.0254;
// 1 lbf/ft² = 4.4482216152605 N / 0.3048² m² (exact definitions of the pound-force and the foot)
const PSF = 4.4482216152605 / 0.3048 ** 2;
const LBF = 4.4482216152605;
const PLF = LBF / 0.3048;

const UNITS: UserLengthUnit[] = ['frac16', 'frac32', 'frac64', 'decimal-in', 'mm'];
const STOCKED = [...new Set(materials.flatMap((m) => m.thicknesses.map((t) => t.actualM)))];

/** The field's text read back as the form reads it. */
const readBack = (text: string, unit: UserLengthUnit) => parseLength(withUnitMark(text, unit));

/** Save → reload: the draft as the server parses and stores it (JSON), then as the form reopens it. */
function saveAndReopen(draft: ShelfDraft, unit: UserLengthUnit): ShelfDraft {
	const stored = JSON.parse(JSON.stringify(shelfRequestSchema.parse(toRequest(draft, unit))));
	return fromInput(stored, unit);
}

describe('a thickness is never rounded away (issue 15 item 1)', () => {
	it('23/32" reopens as 23/32" at every precision, not as the 3/4" of a 1/16" display', () => {
		for (const unit of UNITS) expect(lengthText((23 / 32) * IN, unit)).toBe('23/32"');
		const reopened = fromInput(
			{
				...shelfRequestSchema.parse(toRequest(defaultDraft('frac16'), 'frac16')),
				thickness: (23 / 32) * IN
			},
			'frac16'
		);
		expect(reopened.thickness).toBe('23/32"');
	});

	it('every stocked thickness at every precision: format → parse → format is the identity, the result unchanged', () => {
		fc.assert(
			fc.property(fc.constantFrom(...STOCKED), fc.constantFrom(...UNITS), (metres, unit) => {
				const text = lengthText(metres, unit);
				const read = readBack(text, unit);
				expect(read).toBe(metres);
				expect(lengthText(read, unit)).toBe(text);
				const shelf = { span: 0.9144, depth: 0.2794, material: 'red-oak' };
				expect(analyzeShelf({ ...shelf, thickness: withUnitMark(text, unit) })).toEqual(
					analyzeShelf({ ...shelf, thickness: metres })
				);
			}),
			{ numRuns: STOCKED.length * UNITS.length * 2 }
		);
	});

	it('any length typed in 64ths or tenths of a millimetre survives save, reload and save again', () => {
		fc.assert(
			fc.property(fc.integer({ min: 1, max: 64 * 60 }), fc.constantFrom(...UNITS), (n, unit) => {
				const typed = unit === 'mm' ? `${n / 10} mm` : `${Math.floor(n / 64)} ${n % 64}/64"`;
				const draft = { ...defaultDraft(unit), span: typed };
				const once = saveAndReopen(draft, unit);
				const twice = saveAndReopen(once, unit);
				expect(readBack(once.span, unit)).toBe(readBack(typed, unit));
				expect(twice).toEqual(once);
			})
		);
	});

	it('loads reopen exactly: 42.37 lbf/ft² stays 42.37, not the 42.4 of three digits', () => {
		const draft = { ...defaultDraft('frac16'), load: '42.37 lbf/ft²' };
		const reopened = saveAndReopen(draft, 'frac16');
		expect(reopened.load).toBe('42.37 lbf/ft²');
		expect(saveAndReopen(reopened, 'frac16')).toEqual(reopened);
	});

	it('a case design keeps 23/32" sides through save and reopen', () => {
		const draft = defaultCase('frac16');
		draft.sides.thickness = '23/32"';
		const stored = JSON.parse(JSON.stringify(caseDesignSchema.parse(toDesign(draft, 'frac16'))));
		expect(fromDesign(stored, 'frac16').sides.thickness).toBe('23/32"');
	});
});

describe('a bare number means the user’s unit system (issue 15 item 2)', () => {
	const loadOf = (kind: ShelfDraft['loadKind'], load: string, unit: UserLengthUnit) =>
		shelfRequestSchema.parse(toRequest({ ...defaultDraft(unit), loadKind: kind, load }, unit))
			.loads[0];

	it('40 over the shelf is 40 lbf/ft² to an inch user and 40 kPa to a metric one, never 40 Pa', () => {
		expect(loadOf('area', '40', 'frac16')).toEqual({
			kind: 'area',
			pressure: expect.closeTo(40 * PSF, 9)
		});
		expect(loadOf('area', '40', 'mm')).toEqual({ kind: 'area', pressure: 40_000 });
	});
	it('50 at a point is 50 lbf or 50 N; 20 along the shelf is 20 lbf/ft or 20 N/m', () => {
		expect(loadOf('point', '50', 'decimal-in')).toMatchObject({
			force: expect.closeTo(50 * LBF, 9)
		});
		expect(loadOf('point', '50', 'mm')).toMatchObject({ force: 50 });
		expect(loadOf('line', '20', 'frac32')).toMatchObject({
			intensity: expect.closeTo(20 * PLF, 9)
		});
		expect(loadOf('line', '20', 'mm')).toMatchObject({ intensity: 20 });
	});
	it('the echo beside the field says the unit it was read in', () => {
		expect(spreadLoad('frac16')('40')).toMatchObject({ ok: true, shown: '40 lbf/ft²' });
		expect(spreadLoad('mm')('1.9')).toMatchObject({ ok: true, shown: '1.9 kPa' });
		expect(bareLoadUnits('frac16')).toEqual({
			pressure: 'lbf/ft²',
			lineLoad: 'lbf/ft',
			force: 'lbf'
		});
		expect(bareLoadUnits('mm')).toEqual({ pressure: 'kPa', lineLoad: 'N/m', force: 'N' });
		expect(withLoadUnit('40 psf', 'pressure', 'mm')).toBe('40 psf');
	});
	it('reads what shops write: 40 psf, 40 lb/ft2, 50 lb, 50#, 20 plf, 20 lb/ft', () => {
		expect(parseQuantity('40 psf', 'pressure')).toBeCloseTo(40 * PSF, 9);
		expect(parseQuantity('40 lb/ft2', 'pressure')).toBeCloseTo(40 * PSF, 9);
		expect(parseQuantity('50 lb', 'force')).toBeCloseTo(50 * LBF, 9);
		expect(parseQuantity('50#', 'force')).toBeCloseTo(50 * LBF, 9);
		expect(parseQuantity('20 plf', 'lineLoad')).toBeCloseTo(20 * PLF, 9);
		expect(parseQuantity('20 lb/ft', 'lineLoad')).toBeCloseTo(20 * PLF, 9);
	});
	it('a case designer’s bare spread load is the user’s unit too', () => {
		const draft = defaultCase('frac16');
		draft.shelves[0].load = '40';
		const design = caseDesignSchema.parse(toDesign(draft, 'frac16'));
		expect(design.shelves[0].loads[0]).toEqual({
			kind: 'area',
			pressure: expect.closeTo(40 * PSF, 9)
		});
	});
});

describe('errors name the exact field and bound (issue 15 item 3)', () => {
	const base = { span: '36"', depth: '10"', thickness: '3/4"' };
	const issuesOf = (request: object) => {
		try {
			analyzeShelf(request as Parameters<typeof analyzeShelf>[0]);
		} catch (e) {
			return (e as { issues: unknown }).issues;
		}
		return [];
	};
	it('a custom material out of range: material.shearModulus, at most 1e11 Pa', () => {
		const material = {
			name: 'test',
			modulus: '1.8e6 psi',
			rupture: '10000 psi',
			density: 600,
			shearModulus: '1e12 Pa'
		};
		expect(issuesOf({ ...base, material })).toEqual([
			{ path: ['material', 'shearModulus'], message: expect.stringContaining('At most 1e11 Pa') }
		]);
	});
	it('a union reports the branch the user meant, or what each branch expects', () => {
		const material = { name: 'test', modulus: '1.8e6 psi', rupture: 'strong', density: 600 };
		expect(issuesOf({ ...base, material })).toEqual([
			{
				path: ['material', 'rupture'],
				message: expect.stringContaining('Expected a stiffness or strength')
			}
		]);
		expect(issuesOf({ ...base, material: 'red-oak', limit: { ratio: 5 } })).toEqual([
			{ path: ['limit', 'ratio'], message: expect.stringMatching(/10/) }
		]);
		expect(issuesOf({ ...base, material: 'red-oak', limit: 'L/600' })).toEqual([
			{ path: ['limit'], message: expect.stringContaining('{ ratio: n } for L/n') }
		]);
	});
});

describe('the 0.02" per foot preset is retired (issue 15 item 13)', () => {
	it('is no longer offered', () => {
		expect(LIMIT_CHOICES).toEqual(['L/144', '1/16in-per-ft', 'L/240', 'L/360']);
	});
	it('an analysis saved with it opens as L/600, the same sag, and says so', () => {
		const r = analyzeShelf({
			...{ span: '36"', depth: '10"', thickness: '3/4"' },
			material: 'red-oak',
			limit: '0.02in-per-ft'
		});
		expect(r.limit.name).toBe('L/600');
		expect(r.limit.allowed / IN).toBeCloseTo(0.06, 12);
		expect(r.limit.source).toMatch(/0\.02" per foot/);
		const reopened = fromInput({ limit: '0.02in-per-ft' }, 'frac16');
		expect([reopened.limit, reopened.limitRatio]).toEqual(['ratio', '600']);
		expect(reopened.limitNote).toMatch(/no longer offered/);
		const design = fromDesign(
			{
				...caseDesignSchema.parse(toDesign(defaultCase('frac16'), 'frac16')),
				limit: '0.02in-per-ft'
			},
			'frac16'
		);
		expect(design.limit).toBe('L/600');
		expect(caseDesignSchema.parse(toDesign(design, 'frac16')).limit).toEqual({ ratio: 600 });
	});
});
