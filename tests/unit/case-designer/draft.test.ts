import { describe, expect, it } from 'vitest';
import { caseDesignSchema } from '../../../src/lib/schemas/case';
import { applyChanges, suggestedLengthText } from '../../../src/lib/case-designer/changes';
import { fieldKey, runCase } from '../../../src/lib/case-designer/check';
import { defaultCase, toDesign } from '../../../src/lib/case-designer/draft';
import { nextShelfHeight } from '../../../src/lib/case-designer/spacing';
import { fromDesign } from '../../../src/lib/case-designer/stored';

// The inch is exactly 25.4 mm (international yard and pound agreement, 1959).
const IN = 0.0254;

describe('the case form and the design it stands for', () => {
	it('reads the first case in inches as the engine design in metres', () => {
		const d = caseDesignSchema.parse(toDesign(defaultCase('frac16'), 'frac16'));
		expect(d.width).toBeCloseTo(36 * IN, 12);
		expect(d.height).toBeCloseTo(84 * IN, 12);
		expect(d.sides.thickness).toBeCloseTo(0.75 * IN, 12);
		expect(d.shelves.map((s) => s.height / IN)).toEqual(
			[16, 30, 44, 58].map((h) => expect.closeTo(h, 9))
		);
		expect(d.shelves[2].kind).toBe('fixed');
		// 40 lbf/ft² = 40 × 4.4482216 N / 0.09290304 m² = 1915.2 Pa
		const load = d.shelves[0].loads[0];
		expect(load.kind === 'area' && load.pressure).toBeCloseTo(1915.2, 0);
	});

	it('reads bare numbers as millimetres for a millimetre user', () => {
		const draft = { ...defaultCase('mm'), width: '750' };
		expect(caseDesignSchema.parse(toDesign(draft, 'mm')).width).toBeCloseTo(0.75, 12);
	});

	it('comes back from storage as the same design, in the reader unit', () => {
		const stored = caseDesignSchema.parse(toDesign(defaultCase('frac16'), 'frac16'));
		const draft = fromDesign(stored, 'frac16');
		expect(draft.width).toBe('36"');
		expect(draft.shelves[3].height).toBe('58"');
		expect(draft.shelves[0].load).toBe('40 lbf/ft²');
		expect(caseDesignSchema.parse(toDesign(draft, 'frac16'))).toEqual(stored);
		// exact in the reader's unit: 36" is 914.4 mm, never the 914 mm of a whole-millimetre display
		// (issue 15 item 1: display precision never becomes input)
		expect(fromDesign(stored, 'mm').width).toBe('914.4 mm');
	});

	it('keeps what the form does not edit (drawers) when it writes the design back', () => {
		const stored = caseDesignSchema.parse({
			...toDesign(defaultCase('frac16'), 'frac16'),
			drawers: [{ height: '6"', weight: '20 lbf' }]
		});
		const again = caseDesignSchema.parse(toDesign(fromDesign(stored, 'frac16'), 'frac16'));
		expect(again.drawers).toEqual(stored.drawers);
	});
});

describe('applying a suggestion to the form', () => {
	it('writes a thicker stock rounded up on the user grid, a narrower case rounded down', () => {
		const t = (23 / 32) * IN; // 3/4" plywood is 23/32" actual
		expect(suggestedLengthText('thickness', t, 'frac16')).toBe('3/4"');
		expect(suggestedLengthText('thickness', t, 'frac32')).toBe('23/32"');
		expect(suggestedLengthText('width', 28.25 * IN, 'frac16')).toBe('28 1/4"');
		// 28 1/4" = 717.55 mm: a width is never rounded up past what passed
		expect(suggestedLengthText('width', 28.25 * IN, 'mm')).toBe('717 mm');
		expect(suggestedLengthText('thickness', 18.2e-3, 'mm')).toBe('19 mm');
	});

	it('sets the shelf, nosing and anchoring the changes name, and nothing else', () => {
		const before = defaultCase('frac16');
		const after = applyChanges(
			before,
			[
				{ path: ['shelves', 2, 'thickness'], value: (23 / 32) * IN },
				{
					path: ['shelves', 1, 'nosing'],
					value: { material: 'red-oak', height: (1 + 1 / 16) * IN, thickness: 0.75 * IN }
				},
				{ path: ['anchoring'], value: { kind: 'strap', intoStuds: true } }
			],
			'frac16'
		);
		expect(after.shelves[2].thickness).toBe('3/4"');
		expect(after.shelves[1].nosing).toEqual({
			on: true,
			material: 'red-oak',
			height: '1 1/16"',
			thickness: '3/4"'
		});
		expect(after.anchoring).toEqual({ kind: 'strap', intoStuds: true });
		expect(after.shelves[0]).toEqual(before.shelves[0]);
		expect(before.shelves[2].thickness).toBe('');
	});

	it('refuses a change to a field the form does not hold', () => {
		expect(() =>
			applyChanges(
				defaultCase('frac16'),
				[{ path: ['shelves', 9, 'thickness'], value: 1 }],
				'frac16'
			)
		).toThrow(/shelves\.9/);
	});

	it('fixes a failing shelf with the engine suggestion, end to end', () => {
		const draft = defaultCase('frac16');
		// the first case's shelves carry solid nosings (and pass); these are bare
		for (const s of draft.shelves) s.nosing.on = false;
		draft.shelves[2].thickness = '1/2"';
		const failing = runCase(toDesign(draft, 'frac16'));
		if (!failing.ok) throw new Error('the design should read');
		const shelf = failing.result.shelves.find((s) => s.path.join('.') === 'shelves.2')!;
		expect(shelf.pass).toBe(false);
		const fix = failing.result.suggestions.find((s) => s.fixes.includes('shelves.2:sag'))!;
		const fixed = runCase(toDesign(applyChanges(draft, fix.changes, 'frac16'), 'frac16'));
		if (!fixed.ok) throw new Error('the fixed design should read');
		// the fixed shelf passes; the other three are bare 3/4" veneer-core hardwood plywood over the
		// 34 1/2" opening, 69% over L/144 with the ply-by-ply panel figure (1.92 × (34.5/36)³ = 1.69,
		// from the 36" shelf worked out in tests/unit/workbench/shelf-form.test.ts)
		expect(fixed.result.shelves.map((s) => [s.path.join('.'), s.pass])).toEqual([
			['shelves.0', false],
			['shelves.1', false],
			['shelves.2', true],
			['shelves.3', false]
		]);
		const other = fixed.result.margins.find((m) => m.key === 'shelves.0:sag')!;
		expect(other.margin).toBeCloseTo(-0.69, 2);
	});
});

describe('form fields of issues and new shelves', () => {
	it('files an issue under the field that shows it', () => {
		expect(fieldKey(['shelves', 2, 'loads', 0, 'pressure'])).toBe('shelves.2.load');
		expect(fieldKey(['faceFrame', 'railWidth'])).toBe('faceFrame.railWidth');
		expect(fieldKey([])).toBe('form');
	});

	it('names the unreadable field rather than failing', () => {
		const draft = defaultCase('frac16');
		draft.shelves[1].thickness = 'thick';
		const run = runCase(toDesign(draft, 'frac16'));
		expect(run.ok).toBe(false);
		if (!run.ok) expect(run.issues.map((i) => i.field)).toContain('shelves.1.thickness');
	});

	it('puts a new shelf halfway up the largest opening', () => {
		// openings of the first case: 4 3/4"–15 1/4", … , 58"–83 1/4" (the largest, 25 1/4");
		// its middle is 70 5/8", and the shelf top sits 3/8" (half its thickness) above: 71"
		expect(nextShelfHeight(defaultCase('frac16'), 'frac16')).toBe('71"');
	});
});
