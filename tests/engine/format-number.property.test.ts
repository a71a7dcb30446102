import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../src/lib/engine/units/quantity';

// formatNumber keeps one Intl.NumberFormat instead of calling toLocaleString each time; the words
// it writes must be the same as toLocaleString's with the same options, for any number.
const byLocaleString = (value: number, significant: number) =>
	Number(value.toPrecision(significant)).toLocaleString('en-US', {
		maximumFractionDigits: 12,
		useGrouping: false
	});

describe('formatNumber', () => {
	it('writes what toLocaleString writes, for any finite number and precision', () => {
		fc.assert(
			fc.property(
				fc.double({ noNaN: true, noDefaultInfinity: true }).filter((v) => v !== 0),
				fc.integer({ min: 1, max: 12 }),
				(value, significant) => {
					expect(formatNumber(value, significant)).toBe(byLocaleString(value, significant));
				}
			),
			{ numRuns: 2000 }
		);
	});

	it('writes plain figures: 1820000, 40, 1.9, 0.0123, and a dash for no number', () => {
		expect(formatNumber(1_823_456)).toBe('1820000');
		expect(formatNumber(40)).toBe('40');
		expect(formatNumber(1.9)).toBe('1.9');
		expect(formatNumber(0.012345)).toBe('0.0123');
		expect(formatNumber(-0.5)).toBe('-0.5');
		expect(formatNumber(Number.NaN)).toBe('—');
		expect(formatNumber(0)).toBe('0');
	});
});
