import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { computeAnalysis } from '../../../src/lib/kinds/registry';
import { applyWallChanges } from '../../../src/lib/wall-designer/changes';
import { cutListCsv } from '../../../src/lib/wall-designer/csv';
import {
	copyCase,
	defaultWall,
	exactText,
	fromDesign,
	toInput
} from '../../../src/lib/wall-designer/draft';
import { runWall } from '../../../src/lib/wall-designer/run';

const IN = 0.0254;

describe('the wall screen’s form', () => {
	it('writes stored lengths exactly in the reader’s unit (23/32" stays 23/32")', () => {
		expect(exactText((23 / 32) * IN, 'frac16')).toBe('23/32"');
		expect(exactText(30 * IN, 'frac16')).toBe('30"');
		expect(exactText(0.762, 'mm')).toBe('762 mm');
		expect(defaultWall('frac16').cases[0].sides.thickness).toBe('23/32"');
	});
	it('reads a bare number in the user’s unit', () => {
		const d = defaultWall('frac16');
		d.cases[0].width = '30';
		expect(toInput(d, 'frac16').cases[0].width).toBe('30"');
		expect(toInput(d, 'mm').cases[0].width).toBe('30 mm');
	});
	it('the demo wall runs; an unreadable field is named, not thrown', () => {
		const d = defaultWall('frac16');
		const ok = runWall(d, 'frac16');
		expect(ok.ok).toBe(true);
		d.cases[2].depth = 'deep';
		const bad = runWall(d, 'frac16');
		expect(bad.ok).toBe(false);
		if (!bad.ok) expect(bad.issues.map((i) => i.field)).toContain('cases.2.depth');
	});
	it('a suggestion applies to the form and clears its failure', () => {
		const d = defaultWall('frac16');
		const run = runWall(d, 'frac16');
		if (!run.ok) throw new Error('demo wall unreadable');
		const fix = run.shop.check.suggestions[0];
		const next = applyWallChanges(d, fix.changes, 'frac16');
		const again = runWall(next, 'frac16');
		if (!again.ok) throw new Error('fixed wall unreadable');
		for (const key of fix.fixes)
			expect(again.shop.check.margins.find((m) => m.key === key)?.pass ?? true).toBe(true);
		expect(again.shop.check.summary.failures).toBeLessThan(run.shop.check.summary.failures);
	});
	it('copies a case beside itself', () => {
		const d = copyCase(defaultWall('frac16'), 1);
		expect(d.cases.map((c) => c.name)).toEqual([
			'tall bookcase, left',
			'low unit, left',
			'low unit, left (copy)',
			'low unit, right',
			'tall bookcase, right'
		]);
	});
	it('the cut list CSV keeps fractions and inch marks through a round trip', () => {
		const run = runWall(defaultWall('frac16'), 'frac16');
		if (!run.ok) throw new Error('demo wall unreadable');
		const rows = Papa.parse<string[]>(cutListCsv(run.shop.cutList, 'frac16')).data;
		const side = rows.find((r) => r[2] === 'side')!;
		expect(side[4]).toBe('23/32"');
		expect(side[5]).toBe('76 1/2"');
		expect(rows.length - 1).toBe(run.shop.cutList.groups.length);
	});
	it('is a kind of saved analysis: checked once, stored as SI, read back as texts', () => {
		const run = computeAnalysis('wall', toInput(defaultWall('frac16'), 'frac16'));
		expect(run.ok).toBe(true);
		if (!run.ok) return;
		expect(run.pass).toBe(false);
		const stored = run.input as { cases: { width: number }[] };
		expect(stored.cases[0].width).toBeCloseTo(30 * IN, 12);
		expect(fromDesign(stored, 'frac16').cases[0].width).toBe('30"');
	});
});
