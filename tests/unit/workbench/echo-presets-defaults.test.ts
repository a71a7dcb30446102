/**
 * Issue 15, the review's remainder: the echo beside a field shows exactly what was read, the load
 * picker writes a clean figure in the user's own system that is exactly what is stored, and a new
 * shelf or case starts from inputs that pass L/144.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeShelf, checkCase } from '../../../src/lib/compute';
import {
	exactLoadText,
	readLengthText,
	readLoadText,
	withLoadUnit
} from '../../../src/lib/components/quantity-input/reading';
import { defaultCase, toDesign } from '../../../src/lib/case-designer/draft';
import { fromDesign } from '../../../src/lib/case-designer/stored';
import { caseDesignSchema } from '../../../src/lib/schemas/case';
import { spreadLoad } from '../../../src/lib/case-designer/readers';
import { parseLength } from '../../../src/lib/engine/units/length';
import { parseQuantity } from '../../../src/lib/engine/units/quantity';
import { shelfRequestSchema } from '../../../src/lib/schemas/shelf';
import {
	LOAD_PRESETS,
	presetOf,
	presetSource,
	presetText,
	roundUpClean
} from '../../../src/lib/workbench/load-presets';
import type { UserLengthUnit } from '../../../src/lib/workbench/lengths';
import { defaultDraft, fromInput, toRequest } from '../../../src/lib/workbench/shelf-draft';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959)
const IN = 0.0254;
// 1 lbf/ft² = 4.4482216152605 N / 0.3048² m² (exact definitions of the pound-force and the foot)
const PSF = 4.4482216152605 / 0.3048 ** 2;
const UNITS: UserLengthUnit[] = ['frac16', 'frac32', 'frac64', 'decimal-in', 'mm'];

describe('the echo beside a field shows what was read, exactly', () => {
	it('23/32" echoes as 23/32" at every precision, not as the 3/4" of a 1/16" display', () => {
		for (const unit of UNITS.filter((u) => u !== 'mm'))
			expect(readLengthText('23/32', unit)).toEqual({
				ok: true,
				value: (23 / 32) * IN,
				shown: '23/32"'
			});
		// a metric user typing an inch fraction sees its exact millimetres where a few decimals
		// read back as the same metres, else the fraction itself (23/32" = 18.25625 mm)
		expect(readLengthText('3/4"', 'mm')).toMatchObject({ shown: '3/4"' });
		expect(readLengthText('1/2"', 'mm')).toMatchObject({ shown: '12.7 mm' });
		expect(readLengthText('23/32"', 'mm')).toMatchObject({ shown: '23/32"' });
	});
	it('a length with no exact fraction shows the digits it takes, and reads back to the same metres', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 1, max: 3_000_000 }),
				fc.constantFrom(...UNITS),
				(tenthsOfMicron, unit) => {
					const typed = `${tenthsOfMicron / 10_000} mm`;
					const read = readLengthText(typed, unit);
					if (!read.ok) throw new Error(typed);
					expect(parseLength(read.shown)).toBe(read.value);
				}
			)
		);
		expect(readLengthText('35.4375', 'frac16')).toMatchObject({ shown: '35 7/16"' });
		expect(readLengthText('35.43', 'frac16')).toMatchObject({ shown: '35.43"' });
	});
	it('a load echoes with the digits it takes in the user’s unit: 42.37 lbf/ft² is not 42.4', () => {
		expect(readLoadText('42.37', 'pressure', 'frac16')).toMatchObject({ shown: '42.37 lbf/ft²' });
		expect(readLoadText('1.915 kPa', 'pressure', 'mm')).toMatchObject({ shown: '1.915 kPa' });
		// 40 psf is 1.91521… kPa: to a metric user it is echoed in the unit it was typed in
		expect(readLoadText('40 psf', 'pressure', 'mm')).toMatchObject({ shown: '40 lbf/ft²' });
		expect(readLoadText('12.25', 'force', 'frac16')).toMatchObject({ shown: '12.25 lbf' });
		expect(spreadLoad('mm')('1.915')).toMatchObject({ shown: '1.915 kPa' });
		fc.assert(
			fc.property(
				fc.integer({ min: 1, max: 1_000_000 }),
				fc.constantFrom('pressure', 'lineLoad', 'force' as const),
				fc.constantFrom(...UNITS),
				(hundredths, kind, unit) => {
					const read = readLoadText(String(hundredths / 100), kind, unit);
					if (!read.ok) throw new Error('unread');
					expect(parseQuantity(read.shown, kind)).toBe(read.value);
					expect(exactLoadText(read.value, kind, unit)).toBe(read.shown);
				}
			)
		);
	});
});

describe('a load preset writes a clean figure in the user’s system, exactly what is stored', () => {
	it('inch users get the published figure; metric users the metric figure rounded up to two digits', () => {
		const texts = (unit: UserLengthUnit) =>
			Object.fromEntries(LOAD_PRESETS.map((p) => [p.id, presetText(p, unit)]));
		// the published figures (reference/load-presets.ts, each with its source)
		expect(texts('frac16')).toEqual({
			'aws-general': '40 lbf/ft²',
			'aws-library': '50 lbf/ft²',
			books: '20 lbf/ft',
			records: '35 lbf/ft',
			dishes: '30 lbf/ft²'
		});
		// 40 lbf/ft² = 1.9152 kPa → 2; 50 → 2.394 → 2.4; 30 → 1.4364 → 1.5;
		// 20 lbf/ft = 291.88 N/m → 300; 35 lbf/ft = 510.79 N/m → 520 (never lighter than published)
		expect(texts('mm')).toEqual({
			'aws-general': '2 kPa',
			'aws-library': '2.4 kPa',
			books: '300 N/m',
			records: '520 N/m',
			dishes: '1.5 kPa'
		});
		expect(roundUpClean(2.4000000000000004)).toBe(2.4);
		expect(roundUpClean(1.9152)).toBe(2);
	});
	it('the written text is what is computed and stored, and reopens as the same text and preset', () => {
		for (const unit of UNITS)
			for (const p of LOAD_PRESETS) {
				const text = presetText(p, unit);
				const draft = { ...defaultDraft(unit), loadKind: p.kind, load: text };
				const stored = JSON.parse(JSON.stringify(shelfRequestSchema.parse(toRequest(draft, unit))));
				const si = stored.loads[0].pressure ?? stored.loads[0].intensity;
				const kind = p.kind === 'area' ? 'pressure' : 'lineLoad';
				expect(si).toBe(parseQuantity(withLoadUnit(text, kind, unit), kind));
				expect(si).toBeGreaterThanOrEqual(p.valueSI * (1 - 1e-9));
				const reopened = fromInput(stored, unit);
				expect(reopened.load).toBe(text);
				expect(presetOf(reopened.loadKind, reopened.load, unit)?.id).toBe(p.id);
			}
	});
	it('a typed equal of a preset is that preset; a near figure is not', () => {
		expect(presetOf('area', '40 psf', 'frac16')?.id).toBe('aws-general');
		expect(presetOf('area', '40', 'frac16')?.id).toBe('aws-general');
		expect(presetOf('area', '2000 Pa', 'mm')?.id).toBe('aws-general');
		expect(presetOf('area', '1.92 kPa', 'mm')).toBeUndefined();
		expect(presetSource(LOAD_PRESETS[0], 'mm')).toMatch(/2 kPa is 1\.915 kPa rounded up/);
		expect(presetSource(LOAD_PRESETS[0], 'frac16')).not.toMatch(/rounded/);
	});
});

describe('a new shelf and a new case start from inputs that pass L/144', () => {
	for (const unit of ['frac16', 'mm'] as const) {
		it(`the default shelf passes (${unit})`, () => {
			const r = analyzeShelf(toRequest(defaultDraft(unit), unit));
			expect(r.limit.name).toBe('L/144');
			expect(r.limit.pass).toBe(true);
			expect(r.strength.pass).toBe(true);
			// its load is the general design load preset, in the user's system
			expect(presetOf('area', defaultDraft(unit).load, unit)?.id).toBe('aws-general');
		});
		it(`the default case passes every check (${unit})`, () => {
			const r = checkCase(toDesign(defaultCase(unit), unit));
			expect(r.margins.filter((m) => !m.pass)).toEqual([]);
			expect(r.pass).toBe(true);
		});
	}
	it('without its nosing the default shelf fails: the nosing is what makes it pass', () => {
		const bare = { ...defaultDraft('frac16') };
		bare.front = { ...bare.front, on: false };
		expect(analyzeShelf(toRequest(bare, 'frac16')).limit.pass).toBe(false);
		// 40 lbf/ft² is 1915.2 Pa; the metric default, 2 kPa, is the heavier
		expect(40 * PSF).toBeCloseTo(1915.2, 1);
		expect(parseQuantity(defaultDraft('mm').load, 'pressure')).toBe(2000);
	});
	it('a stored shelf or case shelf without a nosing reopens without one (the default’s is not added)', () => {
		const bare = { ...defaultDraft('frac16') };
		bare.front = { ...bare.front, on: false };
		const stored = JSON.parse(JSON.stringify(shelfRequestSchema.parse(toRequest(bare, 'frac16'))));
		expect(stored.edges).toEqual([]);
		expect(fromInput(stored, 'frac16').front.on).toBe(false);
		const withNosing = JSON.parse(
			JSON.stringify(shelfRequestSchema.parse(toRequest(defaultDraft('frac16'), 'frac16')))
		);
		expect(fromInput(withNosing, 'frac16').front.on).toBe(true);
		const draft = defaultCase('frac16');
		draft.shelves[1].nosing.on = false;
		const design = JSON.parse(JSON.stringify(caseDesignSchema.parse(toDesign(draft, 'frac16'))));
		expect(fromDesign(design, 'frac16').shelves.map((s) => s.nosing.on)).toEqual([
			true,
			false,
			true,
			true
		]);
	});
});
