import { describe, expect, it } from 'vitest';
import { CREEP_TIME_EXPONENT, creepShare, sagAfter } from '../../../src/lib/engine/index';
import {
	START,
	bendingSag,
	labRequest,
	positionOf,
	runLab,
	sliders
} from '../../../src/lib/lab/lab-state';
import { lawsFor, ratioWords } from '../../../src/lib/lab/laws';
import { EXPERIMENTS, answerTo, stateAt } from '../../../src/lib/lab/experiments';
import { currentX, sweep, sweepKey } from '../../../src/lib/lab/sweep';
import { describeLab } from '../../../src/lib/lab/words';
import { formatLength } from '../../../src/lib/engine/units/length';

// 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
const IN = 0.0254;
// 1 lbf/ft = 14.5939 N/m (NIST SP 811 B.8, from memory)
const PLF = 14.59390294;

describe('creep with time under load', () => {
	it('starts at nothing, reaches the long-term figure after a year and grows as a power of time', () => {
		expect(creepShare(0)).toBe(0);
		expect(creepShare(365)).toBe(1);
		expect(creepShare(3650)).toBe(1);
		// (30/365)^(1/4), the exponent being an estimate (from memory; see creep-time.ts)
		expect(creepShare(30)).toBeCloseTo((30 / 365) ** CREEP_TIME_EXPONENT, 12);
		expect(creepShare(30)).toBeCloseTo(0.5354, 3);
		expect(sagAfter(0.002, 0.0032, 0)).toBe(0.002);
		expect(sagAfter(0.002, 0.0032, 365)).toBeCloseTo(0.0032, 12);
	});
});

describe('the lab shelf', () => {
	it('asks the engine for the shelf the sliders show', () => {
		const r = labRequest({ ...START, support: 'divider', nosingM: 1.5 * IN });
		expect(r.support).toEqual({ spans: [18 * IN, 18 * IN], ends: 'simple' });
		expect(r.loads).toHaveLength(1);
		expect(r.loads![0]).toMatchObject({ kind: 'line' });
		expect((r.loads![0] as { intensity: number }).intensity).toBeCloseTo(20 * PLF, 4);
		expect(r.edges).toEqual([
			{ side: 'front', material: 'red-oak', height: 1.5 * IN, thickness: 0.75 * IN }
		]);
		const point = labRequest({ ...START, loadKind: 'point', pointAt: 0.25 });
		expect(point.loads).toEqual([{ kind: 'point', force: START.pointN, at: 9 * IN }]);
		expect(labRequest({ ...START, support: 'wall' }).support).toBe('cantilever');
	});

	it('matches the closed form for bending alone: 5wL⁴/384EI', () => {
		// red oak E = 12,500 MPa (Wood Handbook FPL-GTR-282, Table 5-3a) at the instant of loading
		const s = { ...START, days: 0 };
		const w = 20 * PLF;
		const L = 36 * IN;
		const I = (11 * IN * (0.75 * IN) ** 3) / 12;
		expect(bendingSag(s)).toBeCloseTo((5 * w * L ** 4) / (384 * 12.5e9 * I), 9);
	});

	it('sags between the instant and the long-term figure as time passes', () => {
		const now = runLab({ ...START, days: 0 });
		const week = runLab({ ...START, days: 7 });
		const year = runLab({ ...START, days: 365 });
		expect(now.sagM).toBeCloseTo(now.result.sag.instant, 12);
		expect(year.sagM).toBeCloseTo(year.result.sag.longTerm, 12);
		expect(week.sagM).toBeGreaterThan(now.sagM);
		expect(week.sagM).toBeLessThan(year.sagM);
		const deepest = Math.max(...week.curve.map((p) => p[1]));
		expect(deepest).toBeCloseTo(week.sagM, 4);
	});

	it('puts slider positions on their own grid and converts them exactly', () => {
		const span = sliders('imperial').spanM;
		expect(positionOf(span, 36 * IN)).toBe(36);
		expect(span.toSI(36.5)).toBe(36.5 * IN);
		const mm = sliders('metric').spanM;
		expect(positionOf(mm, 36 * IN)).toBe(910);
		expect(sliders('imperial').booksNPerM.text(20 * PLF)).toBe('20 lb per foot');
	});
});

describe('the laws, from the engine', () => {
	it('says the span and thickness laws with the engine’s own numbers', () => {
		const laws = lawsFor({ ...START, days: 0 });
		const byVar = Object.fromEntries(laws.map((l) => [l.variable, l]));
		expect(byVar.span.ratio).toBeCloseTo(16, 6);
		expect(byVar.span.text).toBe('Twice the span → 16 times the sag');
		expect(byVar.thickness.ratio).toBeCloseTo(1 / 8, 9);
		expect(byVar.thickness.text).toBe('Twice the thickness → an eighth of the sag');
		// red oak 12,500 MPa over MDF 2,500 MPa (reference/materials.ts and its sources)
		expect(byVar.material.ratio).toBeCloseTo(12500 / 2500, 6);
		expect(byVar.material.text).toBe('Red oak is about 5 times stiffer than MDF');
	});

	it('follows the load: one weight in the middle gives span³, not span⁴', () => {
		const laws = lawsFor({ ...START, loadKind: 'point', pointAt: 0.5 });
		expect(laws[0].ratio).toBeCloseTo(8, 6);
		expect(laws[0].text).toBe('Twice the span → 8 times the sag');
	});

	it('writes ratios in words', () => {
		expect(ratioWords(16)).toBe('16 times the sag');
		expect(ratioWords(2)).toBe('twice the sag');
		expect(ratioWords(0.5)).toBe('half the sag');
		expect(ratioWords(0.25)).toBe('a quarter of the sag');
		expect(ratioWords(1 / 27)).toBe('1/27 of the sag');
		expect(ratioWords(1)).toBe('the same sag');
	});
});

describe('experiments', () => {
	it('answers each question from the engine, nearest choice to the real ratio', () => {
		const span = EXPERIMENTS.find((e) => e.id === 'span')!;
		const a = answerTo(span, 0)!;
		const ratio = runLab(stateAt(span, 1)).sagM / runLab(stateAt(span, 0)).sagM;
		expect(a.ratio).toBe(ratio);
		expect(a.choice.ratio).toBe(16);
		expect(answerTo(span, 2)!.choice.ratio).toBe(8);
		const thick = EXPERIMENTS.find((e) => e.id === 'thickness')!;
		expect(answerTo(thick, 0)!.choice.ratio).toBe(1 / 8);
	});

	it('has a question on every step but the last, and every answer among its choices', () => {
		for (const e of EXPERIMENTS) {
			expect(e.steps.at(-1)!.ask).toBeUndefined();
			e.steps.forEach((step, i) => {
				if (!step.ask) return;
				const a = answerTo(e, i)!;
				expect(step.ask.choices).toContain(a.choice);
				expect(Number.isFinite(a.ratio) && a.ratio > 0).toBe(true);
			});
		}
	});
});

describe('the chart', () => {
	it('sweeps the chosen variable over its slider and keeps the curve while only it moves', () => {
		const c = sweep(START, 'span', 'imperial');
		expect(c.kind).toBe('curve');
		if (c.kind !== 'curve') return;
		expect(c.points[0][0]).toBe(12);
		expect(c.points.at(-1)![0]).toBe(72);
		expect(c.points.find((p) => p[0] === 36)![1]).toBeCloseTo(runLab(START).sagM, 12);
		expect(sweepKey(START, 'span', 'imperial')).toBe(
			sweepKey({ ...START, spanM: 48 * IN }, 'span', 'imperial')
		);
		expect(sweepKey(START, 'span', 'imperial')).not.toBe(
			sweepKey({ ...START, thicknessM: IN }, 'span', 'imperial')
		);
		expect(currentX(START, 'span', 'imperial')).toBeCloseTo(36, 9);
		const bars = sweep(START, 'support', 'imperial');
		expect(bars.kind === 'bars' && bars.bars.map((b) => b.id)).toEqual([
			'pins',
			'fixed',
			'divider',
			'wall'
		]);
	});
});

describe("the lab's sentence", () => {
	it('says "less than 1/16"" for a sag that rounds to nothing, and "about" otherwise', () => {
		const format = (m: number) => formatLength(m, { unit: 'frac16' });
		// a short, thick, lightly loaded shelf: its sag is far below 1/32"
		const stiff = { ...START, spanM: 8 * IN, thicknessM: 1.5 * IN, days: 0 };
		const small = runLab(stiff);
		expect(small.sagM).toBeLessThan(IN / 32);
		const sentence = describeLab(stiff, small, format, '20 lbf/ft');
		expect(sentence).toContain('sags less than 1/16"');
		expect(sentence).not.toContain('about <');
		const usual = runLab(START);
		expect(describeLab(START, usual, format, '20 lbf/ft')).toContain(
			`sags about ${format(usual.sagM)}`
		);
	});
});
