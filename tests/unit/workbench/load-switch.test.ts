import { describe, expect, it } from 'vitest';
import { defaultDraft } from '../../../src/lib/workbench/shelf-draft';
import { switchLoadKind } from '../../../src/lib/workbench/load-switch';

describe('changing how the load lies', () => {
	it('carries 40 lbf/ft² over a 36" × 12" shelf to a point load of the same total, 120 lbf', () => {
		// 40 lbf/ft² × 3 ft × 1 ft = 120 lbf
		const d = { ...defaultDraft('frac16'), span: '36"', depth: '12"', load: '40 lbf/ft²' };
		const to = switchLoadKind(d, 'point', 'frac16');
		expect(to.load).toBe('120 lbf');
		expect(to.hint).toContain('same total load');
		// and along the span: 120 lbf over 3 ft is 40 lbf/ft
		expect(switchLoadKind(d, 'line', 'frac16').load).toBe('40 lbf/ft');
		// 40 lbf/ft² × 3 ft × 0.9375 ft = 112.5 lbf: the half pound is kept, not rounded away
		const deep = { ...d, depth: '11 1/4"' };
		expect(switchLoadKind(deep, 'point', 'frac16').load).toBe('112.5 lbf');
	});

	it('writes the carried value in the metric user’s units', () => {
		// 1 kPa × 0.9 m × 0.3 m = 270 N
		const d = { ...defaultDraft('mm'), span: '900 mm', depth: '300 mm', load: '1 kPa' };
		expect(switchLoadKind(d, 'point', 'mm').load).toBe('270 N');
	});

	it('clears the field with a hint in the new unit when the load cannot be read', () => {
		const d = { ...defaultDraft('frac16'), load: '40 bananas' };
		expect(switchLoadKind(d, 'point', 'frac16')).toEqual({
			load: '',
			hint: 'Enter the load in lbf.'
		});
		const noSpan = { ...defaultDraft('frac16'), span: '', load: '40 lbf/ft²' };
		expect(switchLoadKind(noSpan, 'point', 'frac16').load).toBe('');
	});
});

describe('a wall-hung shelf', () => {
	it('names its span the reach out from the wall and its depth the width along it', async () => {
		const { fieldPlace } = await import('../../../src/lib/workbench/shelf-draft');
		const held = (support: 'cantilever' | 'simple') => ({ support, spans: [], divider: '' });
		expect(fieldPlace('span', held('cantilever'))?.label).toBe('Reach out from the wall');
		expect(fieldPlace('depth', held('cantilever'))?.label).toBe('Width along the wall');
		expect(fieldPlace('span', held('simple'))?.label).toBe('Span');
		expect(fieldPlace('depth', held('simple'))?.label).toBe('Depth');
	});
});
