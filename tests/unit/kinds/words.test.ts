import { describe, expect, it } from 'vitest';
import { type ShelfResult } from '../../../src/lib/engine';
import { analyzeShelf } from '../../../src/lib/compute';
import { describeShelf } from '../../../src/lib/kinds/shelf-words';
import { describeCase, otherChecks } from '../../../src/lib/kinds/case-words';
import { apart, count } from '../../../src/lib/kinds/words';

const IN = 0.0254;

describe('one shelf sentence writer', () => {
	// moved from tests/engine/shelf.test.ts when the engine's copy of the sentence was removed
	it('says the sag in fractions of an inch and whether it passes', () => {
		const r = analyzeShelf({
			span: '30"',
			depth: '10"',
			thickness: '3/4"',
			material: 'red-oak',
			loads: [{ kind: 'area', pressure: '40 psf' }]
		});
		const said = describeShelf(r, 'frac32');
		expect(said.sag).toMatch(
			/^This shelf sags about \d*\s?\d+\/\d+" when loaded, and about .* in the long run/
		);
		expect(said.verdict).toMatch(r.limit.pass ? /within the L\/144/ : /more than the L\/144/);
		expect(said.summary).toMatch(
			/^Sags \d*\s?\d+\/\d+" when loaded, .* long-term; (within|over) L\/144/
		);
	});

	it('never says "after a year" nor "under the same" load for a brief load', () => {
		const r = analyzeShelf({
			span: '36"',
			depth: '10"',
			thickness: '3/4"',
			material: 'red-oak',
			duration: 'short',
			loads: [{ kind: 'point', force: '150 lbf', at: '18"' }]
		});
		// the shelf's own weight still creeps, so a long-term figure exists
		expect(r.sag.checked).toBe('longTerm');
		expect(r.sag.longTerm).toBeGreaterThan(r.sag.instant * 1.005);
		const said = describeShelf(r, 'frac16', { contents: 'books', brief: true });
		expect(said.sag).not.toMatch(/year|month|under the same/);
		expect(said.sag).toMatch(/under the brief load; once its own weight has settled it/);
		expect(said.sagLabel).toBe('once settled');
		expect(said.summary).not.toMatch(/long-term|year/);
	});

	it('writes a sag and an allowance that read the same at 1/16" finely enough to tell apart', () => {
		// 0.251" and 0.250" both read 1/4" to the sixteenth
		expect(apart(0.251 * IN, 0.25 * IN, 'frac16')).toEqual(['0.251"', '0.25"']);
		expect(apart(0.3 * IN, 0.25 * IN, 'frac16')).toEqual(['5/16"', '1/4"']);
		expect(apart(6.34e-3, 6.3e-3, 'mm')).toEqual(['6.34 mm', '6.3 mm']);
		expect(apart(0.25 * IN, 0.25 * IN, 'frac16')).toEqual(['1/4"', '1/4"']);
	});

	it('does not call a sag "more than" an allowance that prints the same', () => {
		const real = analyzeShelf({
			span: '36"',
			depth: '10"',
			thickness: '3/4"',
			material: 'red-oak',
			loads: [{ kind: 'area', pressure: '40 psf' }]
		});
		// the same result, its sag a hair over the 1/4" that L/144 of 36" allows
		const r: ShelfResult = {
			...real,
			sag: { ...real.sag, checked: 'longTerm', instant: 0.2 * IN, longTerm: 0.251 * IN },
			limit: { ...real.limit, allowed: 0.25 * IN, pass: false, margin: -0.004 }
		};
		const said = describeShelf(r, 'frac16');
		expect(said.verdict).toBe(
			'That is more than the L/144 limit allows (0.25"): less than 1% too much sag.'
		);
		expect(said.sag).toContain('about 0.251" in the long run');
	});
});

describe('counts and plurals', () => {
	it('writes one thing in the singular', () => {
		expect(count(1, 'check')).toBe('1 check');
		expect(count(3, 'check')).toBe('3 checks');
		expect(count(2, 'shelf pin')).toBe('2 shelf pins');
		expect(otherChecks(1)).toBe('The other check, passing');
		expect(otherChecks(4)).toBe('The other 4 checks, all passing');
	});

	it('says a case with one failure "fails"', () => {
		const margin = { key: 'k', what: 'shelf 1 sag', path: [], margin: -0.2, pass: false };
		// describeCase reads only the verdict, the margins and the count of failures
		const r = {
			pass: false,
			margins: [margin, { ...margin, key: 'j', pass: true, margin: 0.3 }],
			summary: { failures: 1, worst: [margin] }
		};
		expect(describeCase(r).summary).toBe('1 of 2 checks fails; worst: shelf 1 sag, over by 20%.');
	});
});
