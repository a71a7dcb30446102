import { describe, expect, it } from 'vitest';
import { readLengthText, withUnitMark } from '../../../src/lib/components/quantity-input/reading';
import { ceilTo, floorTo, unitStepM } from '../../../src/lib/workbench/lengths';
import {
	defaultDraft,
	fieldOf,
	fromInput,
	toRequest
} from '../../../src/lib/workbench/shelf-draft';
import { aboutLength, describeShelf } from '../../../src/lib/kinds/shelf-words';
import { analyzeShelf } from '../../../src/lib/compute';
import { shelfRequestSchema } from '../../../src/lib/schemas/shelf';

// 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
const IN = 0.0254;

describe('what woodworkers type', () => {
	it('reads bare numbers as inches (or mm for a mm user), never as metres', () => {
		expect(withUnitMark('3/4', 'frac16')).toBe('3/4"');
		expect(withUnitMark('35 1/2', 'frac16')).toBe('35 1/2"');
		expect(withUnitMark('900', 'mm')).toBe('900 mm');
		expect(withUnitMark('2\' 11-1/2"', 'frac16')).toBe('2\' 11-1/2"');
	});
	it('shows the value read exactly, or why it could not be read', () => {
		const read = (t: string, u: 'frac16' | 'mm') => readLengthText(t, u);
		expect(read('2\' 11-1/2"', 'frac16')).toEqual({ ok: true, value: 35.5 * IN, shown: '35 1/2"' });
		// issue 15: the echo is what was read, not a display rounding (it was 35 7/16" and 19 mm):
		// 900 mm has no short exact inch figure (35.433…"), so it is echoed as read
		expect(read('900 mm', 'frac16')).toMatchObject({ ok: true, shown: '900 mm' });
		// 3/4" is 19.05 mm, which reads back a hair off in floating point: the fraction is exact
		expect(read('3/4', 'mm')).toMatchObject({ ok: true, shown: '3/4"' });
		expect(read('11 1/4 bananas', 'frac16')).toMatchObject({ ok: false });
		expect(read('', 'frac16')).toEqual({ ok: false, message: 'Enter a length.' });
	});
});

describe('rounding on the user grid', () => {
	it('rounds a longest span down and a strip up to the unit step', () => {
		expect(floorTo(19.0006 * IN, unitStepM('frac16')) / IN).toBeCloseTo(19, 12);
		expect(floorTo(19.07 * IN, unitStepM('frac16')) / IN).toBeCloseTo(19.0625, 12);
		expect(ceilTo(1.01 * IN, IN / 4) / IN).toBeCloseTo(1.25, 12);
		expect(ceilTo(0.0381, 0.005)).toBeCloseTo(0.04, 12);
	});
});

describe('the shelf draft', () => {
	it('makes a valid request from the first shelf and reads a stored one back in the same texts', () => {
		const draft = {
			...defaultDraft('frac16'),
			front: { ...defaultDraft('frac16').front, on: true }
		};
		const stored = shelfRequestSchema.parse(toRequest(draft, 'frac16'));
		expect(stored.span).toBeCloseTo(36 * IN, 12);
		expect(stored.depth).toBeCloseTo(11.25 * IN, 12);
		const back = fromInput(stored, 'frac16');
		expect([back.span, back.depth, back.thickness, back.load]).toEqual([
			'36"',
			'11 1/4"',
			'3/4"',
			'40 lbf/ft²'
		]);
		expect(back.front).toEqual({
			on: true,
			material: 'red-oak',
			height: '1 1/2"',
			thickness: '3/4"'
		});
	});
	it('sends each span of a shelf over dividers as typed and names the field of an issue', () => {
		// issue 15 item 10: the spans are no longer one length shared equally; each has its own
		const draft = {
			...defaultDraft('frac16'),
			support: 'continuous' as const,
			spans: ['16', '16', '16'],
			divider: ''
		};
		const req = shelfRequestSchema.parse(toRequest(draft, 'frac16'));
		expect(req.support).toMatchObject({
			spans: [16 * IN, 16 * IN, 16 * IN].map((x) => expect.closeTo(x, 12))
		});
		expect(req.span).toBeUndefined();
		expect(fieldOf(['loads', 0, 'at'])).toBe('pointAt');
		expect(fieldOf(['support', 'spans', 1])).toBe('spans.1');
		expect(fieldOf(['support', 'divider'])).toBe('divider');
	});
});

describe('plain sentences', () => {
	it('says the sag, the creep and the margin in words', () => {
		// the default shelf without its solid nosing (the default has one, and passes)
		const first = defaultDraft('frac16');
		const r = analyzeShelf(toRequest({ ...first, front: { ...first.front, on: false } }, 'frac16'));
		const said = describeShelf(r, 'frac16', { contents: 'books' });
		expect(said.sag).toBe(
			`This shelf sags ${aboutLength(r.sag.instant, 'frac16')} when loaded, and ${aboutLength(r.sag.longTerm, 'frac16')} in the long run under the same books.`
		);
		// L/144 of 36" is exactly 1/4". The bare default 3/4" veneer-core hardwood plywood shelf, worked
		// out by hand: E = 13,400 MPa × 0.35526 (transformed section of a 7-ply panel, see
		// reference/materials.ts), G = E/16, 40 lbf/ft² over 11 1/4" plus its own weight (600 kg/m³);
		// bending + shear sag 0.267", long-term × (1 + 0.80) (Eurocode 5 Table 3.2, EN 636-2, dry)
		// = 0.480": 92% over the 1/4" allowed, so the sentence says so.
		const E = 13400e6 * 0.35526;
		const [L, b, t] = [36 * IN, 11.25 * IN, 0.75 * IN];
		const w = 40 * 47.88025898 * b + 600 * 9.80665 * b * t;
		const sag =
			(5 * w * L ** 4) / (384 * E * ((b * t ** 3) / 12)) +
			(w * L ** 2) / (8 * (5 / 6) * (E / 16) * b * t);
		const margin = (L / 144 - 1.8 * sag) / (L / 144);
		expect(margin).toBeCloseTo(-0.92, 2);
		expect(r.limit.margin).toBeCloseTo(margin, 3);
		expect(said.verdict).toBe(
			`That is more than the L/144 limit allows (1/4"): ${Math.round(-margin * 100)}% too much sag.`
		);
		expect(aboutLength(0.0001, 'frac16')).toBe('less than 1/16"');
	});
});
