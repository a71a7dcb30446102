import { describe, expect, it } from 'vitest';
import stored from './solver-answers.json';
import { answersOf } from './support/solver-cases';

// The answers the engine gave before its solvers were rewritten for speed (issue 12), against
// today's. Each solver's result may move within the tolerance it states (its bracket's width);
// everything computed directly (analyses, case checks) stays the same to rounding.
const now = answersOf();

/** Every leaf equal: strings and booleans exactly, numbers within rel·|a| + abs. */
function near(a: unknown, b: unknown, rel: number, abs: number, path = '$'): string | null {
	if (typeof a === 'number' && typeof b === 'number')
		return Math.abs(a - b) <= rel * Math.abs(a) + abs ? null : `${path}: ${a} vs ${b}`;
	if (Array.isArray(a) && Array.isArray(b)) {
		if (a.length !== b.length) return `${path}: ${a.length} items vs ${b.length}`;
		for (let i = 0; i < a.length; i++) {
			const d = near(a[i], b[i], rel, abs, `${path}[${i}]`);
			if (d) return d;
		}
		return null;
	}
	if (a && b && typeof a === 'object' && typeof b === 'object') {
		const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
		for (const k of keys) {
			const d = near(
				(a as Record<string, unknown>)[k],
				(b as Record<string, unknown>)[k],
				rel,
				abs,
				`${path}.${k}`
			);
			if (d) return d;
		}
		return null;
	}
	return a === b ? null : `${path}: ${JSON.stringify(a)} vs ${JSON.stringify(b)}`;
}

describe('answers before and after the speed work', () => {
	it('maxSpan: the span within its bracket (10 µm), passing and just so', () => {
		now.maxSpan.forEach((a, i) => {
			const { margin, ...rest } = a as { margin: number };
			const { margin: before, ...stays } = stored.maxSpan[i] as { margin: number };
			expect(near(rest, stays, 1e-12, 1e-5, `maxSpan[${i}]`)).toBeNull();
			// both on the passing side of the limit, within what 10 µm of span moves the margin
			for (const m of [margin, before]) expect(m).toBeGreaterThanOrEqual(0);
			for (const m of [margin, before]) expect(m).toBeLessThan(1e-4);
		});
	});
	it('minThickness: the same stock chosen and tried; the exact thickness within 1 µm', () => {
		now.minThickness.forEach((a, i) => {
			expect(near(a, stored.minThickness[i], 1e-9, 2e-6, `minThickness[${i}]`)).toBeNull();
		});
	});
	it('minEdge: the same rounded strip; the exact height within 1 µm', () => {
		now.minEdge.forEach((a, i) => {
			expect(near(a, stored.minEdge[i], 0, 2e-6, `minEdge[${i}]`)).toBeNull();
		});
	});
	it('maxLoad: every magnitude within its bracket (a millionth of it)', () => {
		now.maxLoad.forEach((a, i) => {
			expect(near(a, stored.maxLoad[i], 1e-6, 0, `maxLoad[${i}]`)).toBeNull();
		});
	});
	it('analyses: the same numbers to rounding', () => {
		now.analyze.forEach((a, i) => {
			const { momentAt, ...rest } = a as { momentAt: number; supports: number[] };
			const { momentAt: before, ...stays } = stored.analyze[i] as typeof a & { momentAt: number };
			expect(near(rest, stays, 1e-9, 1e-15, `analyze[${i}]`)).toBeNull();
			// where equal moments stand at two supports (a fixed shelf's ends), either is the place
			if (momentAt !== before) expect([momentAt, before].every((x) => rest.supports.includes(x)));
		});
	});
	it('case checks: the same shelves, joints, margins, parts and suggestions', () => {
		now.checkCase.forEach((a, i) => {
			expect(near(a, stored.checkCase[i], 1e-6, 1e-12, `checkCase[${i}]`)).toBeNull();
		});
	});
});
