import { describe, expect, it } from 'vitest';
import { layoutElevation } from '../../../src/lib/components/case-elevation/geometry';
import { defaultCase, toDesign } from '../../../src/lib/case-designer/draft';
import { inUserUnits, jointSentence, marginWords } from '../../../src/lib/case-designer/words';
import { formatLength } from '../../../src/lib/engine/units/length';
import { caseDesignSchema } from '../../../src/lib/schemas/case';

const IN = 0.0254; // exactly, by the 1959 international inch

describe('margins in words', () => {
	it('says how much is to spare or over, with the shape in text', () => {
		expect(marginWords(0.351, true)).toEqual({
			pass: true,
			glyph: '✓',
			words: 'passes, 35% to spare'
		});
		expect(marginWords(-1.14, false)).toEqual({
			pass: false,
			glyph: '✕',
			words: 'fails, over by 114%'
		});
		expect(marginWords(null, false).words).toBe('fails');
		expect(marginWords(1, true).words).toBe('passes, nothing to carry');
	});

	it('says how a joint does', () => {
		expect(jointSentence(true, 0.31)).toBe('Carries its load: it uses 31% of what it can carry.');
		expect(jointSentence(true, 0)).toMatch(/^Nothing to carry/);
		expect(jointSentence(false, 1.5)).toBe(
			'Does not carry its load: uses 150% of what it can carry.'
		);
	});

	it('writes the engine metres in the reader unit', () => {
		const f = (m: number) => formatLength(m, { unit: 'frac16' });
		expect(inUserUnits('load on the shelf at 0.762 m against 60 lb', f)).toBe(
			'load on the shelf at 30" against 60 lb'
		);
		expect(inUserUnits('for units over 1000 mm tall', f)).toBe('for units over 1000 mm tall');
	});
});

describe('the front elevation layout', () => {
	const d = caseDesignSchema.parse(toDesign(defaultCase('frac16'), 'frac16'));
	const g = layoutElevation(d);

	it('fits the taller side of the case and keeps its proportions', () => {
		// 84" tall against 36" wide: the height governs, 520 units over 2.1336 m
		expect(g.scale).toBeCloseTo(520 / (84 * IN), 9);
		expect(g.outline.h).toBeCloseTo(520, 9);
		expect(g.outline.w / g.outline.h).toBeCloseTo(36 / 84, 9);
	});

	it('gives the clear opening between each pair of shelves', () => {
		// bottom top face at 4" base + 3/4"; shelves' tops at 16, 30, 44, 58; top underside at 83 1/4"
		const clear = g.openings.map((o) => o.clearM / IN);
		const expected = [15.25 - 4.75, 29.25 - 16, 43.25 - 30, 57.25 - 44, 83.25 - 58];
		clear.forEach((c, i) => expect(c).toBeCloseTo(expected[i], 9));
	});

	it('draws a shelf where its height puts it, the frame and base in front', () => {
		const shelf = g.shelves.find((s) => s.key === '0')!;
		expect(g.floorY - shelf.box.y).toBeCloseTo(16 * IN * g.scale, 9);
		expect(shelf.box.h).toBeCloseTo(0.75 * IN * g.scale, 9);
		expect(g.frame).toHaveLength(4);
		expect(g.base!.h).toBeCloseTo(4 * IN * g.scale, 9);
	});
});

describe('the case elevation in words, for screen readers', () => {
	it('counts shelves in plain English: one shelf, four shelves (never "shelfes")', async () => {
		const { checkCaseSI: checkCase } = await import('../../../src/lib/engine/case');
		const { elevationDescription } = await import('../../../src/lib/case-designer/shelf-verdicts');
		const d = caseDesignSchema.parse(toDesign(defaultCase('frac16'), 'frac16'));
		const four = {
			...d,
			shelves: [1, 2, 3, 4].map((k) => ({ ...d.shelves[0], height: k * 12 * IN }))
		};
		const text = elevationDescription(four, checkCase(four), 'frac16');
		expect(text).toContain('with 4 shelves at 12", 24", 36", 48" from the floor');
		expect(text).not.toContain('shelfes');
		const one = { ...d, shelves: [d.shelves[0]] };
		expect(elevationDescription(one, checkCase(one), 'frac16')).toMatch(/with 1 shelf at /);
	});
});
