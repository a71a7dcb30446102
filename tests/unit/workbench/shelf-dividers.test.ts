/**
 * Issue 15 item 10 on the shelf form: over dividers each span has its own length and the divider
 * its thickness; they are saved and reopened as typed, older analyses (one length shared equally,
 * no divider) reopen computing as they did, and the fixes keep the shelf's meaning.
 */
import { describe, expect, it } from 'vitest';
import { analyzeShelf } from '../../../src/lib/compute';
import { shelfRequestSchema } from '../../../src/lib/schemas/shelf';
import { drawingDescription, drawingFor } from '../../../src/lib/workbench/shelf-view';
import { fixesFor, headroomFor } from '../../../src/lib/workbench/shelf-fixes';
import {
	defaultDraft,
	fieldPlace,
	fromInput,
	overDividers,
	spanLabel,
	toRequest,
	type ShelfDraft
} from '../../../src/lib/workbench/shelf-draft';
import { formatLength } from '../../../src/lib/engine/units/length';
import { shelfSettingRows } from '../../../src/lib/kinds/input-rows';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959)
const IN = 0.0254;

const overTwo = (unit: 'frac16' | 'mm', spans: string[], divider: string): ShelfDraft => ({
	...defaultDraft(unit),
	support: 'continuous',
	spans,
	divider
});
const store = (d: ShelfDraft, unit: 'frac16' | 'mm') =>
	JSON.parse(JSON.stringify(shelfRequestSchema.parse(toRequest(d, unit))));

describe('a shelf over dividers on the form', () => {
	it('sends each span and the divider as typed; the stored input keeps them and reopens the same', () => {
		const draft = overTwo('frac16', ['23 5/8', '35 1/4"'], '23/32');
		const stored = store(draft, 'frac16');
		expect(stored.support).toEqual({
			spans: [23.625 * IN, 35.25 * IN],
			ends: 'simple',
			divider: (23 / 32) * IN
		});
		expect(stored.span).toBeUndefined();
		const back = fromInput(stored, 'frac16');
		expect([back.support, back.spans, back.divider]).toEqual([
			'continuous',
			['23 5/8"', '35 1/4"'],
			'23/32"'
		]);
		expect(store(back, 'frac16')).toEqual(stored);
		const metric = store(overTwo('mm', ['600', '750 mm', '450'], '18'), 'mm');
		expect(fromInput(metric, 'mm')).toMatchObject({
			spans: ['600 mm', '750 mm', '450 mm'],
			divider: '18 mm'
		});
	});

	it('computes the spans over the divider centres, the whole length counting the divider', () => {
		const r = analyzeShelf(toRequest(overTwo('frac16', ['24', '30'], '3/4'), 'frac16'));
		expect(r.span).toBeCloseTo(54.75 * IN, 12);
		expect(r.supports[1]).toBeCloseTo(24.375 * IN, 12);
		// how far it could go is said span by span, in the same proportion
		const room = headroomFor(toRequest(overTwo('frac16', ['24', '30'], '3/4'), 'frac16'), true);
		expect(room.maxSpansM).toHaveLength(2);
		expect(room.maxSpansM![1] / room.maxSpansM![0]).toBeCloseTo(30 / 24, 9);
	});

	it('reopens an analysis saved before spans of their own (one length shared equally, no divider)', () => {
		const old = {
			span: 36 * IN,
			depth: 11.25 * IN,
			thickness: 0.75 * IN,
			material: 'hardwood-plywood-veneer-core',
			support: { spans: [18 * IN, 18 * IN], ends: 'simple' },
			loads: [{ kind: 'area', pressure: 1915.2103592127 }]
		};
		const back = fromInput(old, 'frac16');
		expect([back.spans, back.divider, back.span]).toEqual([['18"', '18"'], '', '36"']);
		// the same shelf is computed: spans from centre to centre, as it was saved
		const again = shelfRequestSchema.parse(toRequest(back, 'frac16'));
		expect(again.support).toEqual({ spans: [18 * IN, 18 * IN], ends: 'simple' });
		expect(analyzeShelf(again).sag).toEqual(analyzeShelf(shelfRequestSchema.parse(old)).sag);
		expect(spanLabel(0, 2, false)).toBe('Span 1, side to divider (divider centres)');
		expect(shelfSettingRows(again, 'frac16').find(([k]) => k === 'Support')![1]).toBe(
			'Continuous over 2 spans (18" + 18", centre to centre of the dividers), ends simple'
		);
	});

	it('labels each span for what it measures and names it in the list of marked fields', () => {
		expect([0, 1, 2].map((i) => spanLabel(i, 3))).toEqual([
			'Span 1, clear from side to divider',
			'Span 2, clear from divider to divider',
			'Span 3, clear from divider to side'
		]);
		const draft = overTwo('frac16', ['24', 'long'], '3/4');
		expect(fieldPlace('spans.1', draft)).toEqual({
			id: 'shelf-span-1',
			label: 'Span 2, clear from divider to side'
		});
		expect(fieldPlace('divider', draft)?.id).toBe('shelf-divider');
	});

	it('a shelf just put over a divider takes the span typed for each span', () => {
		const d = { ...defaultDraft('frac16'), span: '30"', support: 'continuous' as const };
		expect(overDividers(d).spans).toEqual(['30"', '30"']);
		const told = { ...d, spans: ['30"', '24"'] };
		expect(overDividers(told).spans).toEqual(['30"', '24"']);
	});

	it('the drawing and its description carry the divider and each clear span', () => {
		const draft = overTwo('frac16', ['24', '30'], '3/4');
		const r = analyzeShelf(toRequest(draft, 'frac16'));
		expect(drawingFor(draft, r, 'frac16').dividerM).toBeCloseTo(0.75 * IN, 12);
		const format = (m: number) => formatLength(m, { unit: 'frac16' });
		expect(drawingDescription(draft, r, 'frac16', format)).toContain(
			'running over 1 divider 3/4" thick, in spans of 24" and 30" clear'
		);
	});

	it('the fixes keep the shelf’s meaning: shorter spans in proportion, or another divider', () => {
		// bare plywood (no nosing) over two long spans fails; every fix is checked before it is offered
		const failing = {
			...overTwo('frac16', ['36', '48'], '3/4'),
			front: { ...defaultDraft('frac16').front, on: false }
		};
		const req = toRequest(failing, 'frac16');
		expect(analyzeShelf(req).limit.pass).toBe(false);
		const fixes = fixesFor(failing, req, 'frac16');
		const shorter = fixes.find((f) => f.id === 'span')!;
		expect(shorter.action).toMatch(/^Shorten the spans to /);
		const applied = shorter.apply(failing);
		expect(applied.spans).toHaveLength(2);
		const [a, b] = applied.spans.map((s) => Number.parseFloat(s));
		expect(b / a).toBeCloseTo(48 / 36, 1);
		expect(analyzeShelf(toRequest(applied, 'frac16')).limit.pass).toBe(true);
		const divider = fixes.find((f) => f.id === 'support');
		if (divider) {
			const three = divider.apply(failing);
			expect(three.spans).toHaveLength(3);
			// the shelf keeps its length: 36 + 3/4 + 48 = 3 spans + 2 dividers of 3/4"
			const total = analyzeShelf(toRequest(three, 'frac16')).span;
			expect(total).toBeCloseTo(84.75 * IN, 9);
		}
		// a simple shelf gets a divider under its middle, the shelf keeping its length
		const simple = { ...defaultDraft('frac16'), span: '60', front: failing.front };
		const mid = fixesFor(simple, toRequest(simple, 'frac16'), 'frac16').find(
			(f) => f.id === 'support'
		)!;
		expect(mid.action).toBe('Add a divider under the middle (two spans of 29 5/8")');
		expect(analyzeShelf(toRequest(mid.apply(simple), 'frac16')).span).toBeCloseTo(60 * IN, 12);
	});
});
