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
	it('loads the shelves as the shelf screen does: 40 lbf/ft², or 2 kPa (rounded up) to a metric user', () => {
		// 40 lbf/ft² is 1.9152 kPa (1 lbf/ft² = 47.880 Pa, from the exact pound-force and inch in
		// src/lib/engine/units/si.ts); 2 kPa is never lighter
		expect(defaultWall('frac16').cases[0].shelves?.[0].loads).toEqual([
			{ kind: 'area', pressure: '40 lbf/ft^2' }
		]);
		expect(defaultWall('mm').cases[0].shelves?.[0].loads).toEqual([
			{ kind: 'area', pressure: '2 kPa' }
		]);
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

describe('every field the engine takes, as the builder types it', () => {
	it('a bare number in a shelf load or a drawer’s contents is in the user’s load units', () => {
		const d = defaultWall('frac16');
		d.cases[0].shelves![0].loads = [{ kind: 'area', pressure: '50' }];
		d.cases[1].drawers![0].contentsWeight = '20';
		const input = toInput(d, 'frac16');
		expect(input.cases[0].shelves![0].loads![0]).toEqual({ kind: 'area', pressure: '50 lbf/ft²' });
		expect(input.cases[1].drawers![0].contentsWeight).toBe('20 lbf');
		const metric = toInput(d, 'mm');
		expect(metric.cases[0].shelves![0].loads![0]).toEqual({ kind: 'area', pressure: '50 kPa' });
		expect(metric.cases[1].drawers![0].contentsWeight).toBe('20 N');
	});
	it('hinge side, overlay or inset, slides, materials, face frame, sheet sizes and grain reach the engine and come back as typed', () => {
		const d = defaultWall('frac16');
		const low = d.cases[1];
		low.doors = [
			{
				bottom: '4 1/4"',
				height: '20"',
				count: 1,
				hinge: 'right',
				front: { material: 'mdo', thickness: '3/4"', mount: 'inset', overlay: '3/8"', gap: '3/32"' }
			}
		];
		low.drawers![0].bottom = '24 1/4"';
		low.drawers![0].heights = ['5"'];
		low.drawers![0].slide.sideClearance = '0.5';
		low.drawers![0].slide.length = '12';
		low.drawers![0].box.material = 'softwood-plywood';
		low.drawers![0].front.material = 'birch-multiply';
		low.back = { material: 'mdf', thickness: '1/4', fitted: 'applied' };
		low.top = { material: 'birch-multiply', thickness: '3/4', joint: 'dado', loads: [] };
		low.faceFrame = {
			material: 'yellow-poplar',
			thickness: '3/4',
			stileWidth: '1 1/2',
			railWidth: '1 1/2',
			joint: 'pocket-screw',
			attach: 'biscuit'
		};
		d.sharedFaceFrame = false;
		d.sheets!.stocks = [{ material: 'mdo', length: '120', width: '60', keepGrain: true }];
		const run = runWall(d, 'frac16');
		expect(run.ok).toBe(true);
		if (!run.ok) return;
		const c = run.design.cases[1];
		expect(c.doors[0].hinge).toBe('right');
		expect(c.doors[0].front.mount).toBe('inset');
		expect(c.drawers[0].slide.sideClearance).toBeCloseTo(0.5 * IN, 12);
		expect(c.drawers[0].slide.length).toBeCloseTo(12 * IN, 12);
		expect(c.back).toEqual({ material: 'mdf', thickness: 0.25 * IN, fitted: 'applied' });
		expect(c.top.joint).toBe('dado');
		expect(c.faceFrame!.stileWidth).toBeCloseTo(1.5 * IN, 12);
		const parts = run.shop.check.parts.filter((p) => p.caseIndex === 1);
		expect(parts.find((p) => p.role === 'back')!.material).toBe('mdf');
		expect(parts.find((p) => p.role === 'drawer front')!.material).toBe('birch-multiply');
		expect(parts.find((p) => p.role === 'drawer side')!.material).toBe('softwood-plywood');
		expect(parts.filter((p) => p.role === 'face-frame rail').length).toBeGreaterThan(2);
		const mdo = run.sheets.perMaterial.find((m) => m.materialName.startsWith('MDO'))!;
		expect(inchOf(mdo.lengthM)).toBeCloseTo(120, 9);
		expect(inchOf(mdo.widthM)).toBeCloseTo(60, 9);
		expect(
			run.sheets.sheets
				.filter((s) => s.materialName.startsWith('MDO'))
				.flatMap((s) => s.placements)
				.every((p) => !p.turned)
		).toBe(true);
		// saved as SI and read back: the typed texts, and the loads in the user's units
		const saved = computeAnalysis('wall', toInput(d, 'frac16'));
		if (!saved.ok) throw new Error('not saved');
		const back = fromDesign(saved.input, 'frac16');
		expect(back.cases[1].doors![0].hinge).toBe('right');
		expect(back.cases[1].drawers![0].slide.length).toBe('12"');
		expect(back.cases[0].shelves![0].loads![0]).toEqual({ kind: 'area', pressure: '40 lbf/ft^2' });
		expect(back.sheets!.stocks![0]).toEqual({
			material: 'mdo',
			length: '120"',
			width: '60"',
			keepGrain: true
		});
	});
	it('an unreadable slide clearance is named at its own field, and the text stays as typed', () => {
		const d = defaultWall('frac16');
		d.cases[1].drawers![0].slide.sideClearance = 'half an inch';
		const run = runWall(d, 'frac16');
		expect(run.ok).toBe(false);
		if (run.ok) return;
		expect(run.issues.map((i) => i.field)).toContain('cases.1.drawers.0.slide.sideClearance');
		expect(d.cases[1].drawers![0].slide.sideClearance).toBe('half an inch');
	});
});

const inchOf = (m: number) => m / IN;
