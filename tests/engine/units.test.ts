import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	QuantityError,
	formatForce,
	formatLength,
	formatLineLoad,
	formatPressure,
	parseLength,
	parseQuantity,
	tryParseLength
} from '../../src/lib/engine/units';

const IN = 0.0254; // exact by definition (1959 international inch)

describe('parseLength: every form the issue lists', () => {
	it.each([
		['35 1/2"', 35.5 * IN],
		['35-1/2 in', 35.5 * IN],
		[`2' 11-1/2"`, 35.5 * IN],
		['3/4"', 0.75 * IN],
		['900 mm', 0.9],
		['0.9 m', 0.9],
		['0.9', 0.9],
		['2 ft 11 1/2 in', 35.5 * IN],
		[`2'-11 1/2"`, 35.5 * IN],
		['23/32"', (23 / 32) * IN],
		['36 in', 36 * IN],
		['3 ft', 36 * IN],
		['90 cm', 0.9],
		['1,200 mm', 1.2],
		['35½"'.replace('½', ' 1/2'), 35.5 * IN],
		['12″', 12 * IN]
	])('%s', (text, metres) => {
		expect(parseLength(text)).toBeCloseTo(metres, 12);
	});

	it('takes a number as metres', () => {
		expect(parseLength(1.25)).toBe(1.25);
	});

	it.each(['', 'abc', '3/0"', '12 furlongs', '1/2/3"', NaN as unknown as string])(
		'rejects %s with what was expected',
		(text) => {
			expect(() => parseLength(text)).toThrow(QuantityError);
			try {
				parseLength(text);
			} catch (e) {
				expect((e as QuantityError).expected).toMatch(/35 1\/2"/);
			}
			expect(tryParseLength(text).ok).toBe(false);
		}
	);
});

describe('parseQuantity', () => {
	// 1 lbf/ft² = 4.4482216152605 N / 0.09290304 m² = 47.880259 Pa (exact definitions)
	it.each([
		['40 lbf/ft^2', 'pressure', 40 * 47.88025898],
		['40 psf', 'pressure', 40 * 47.88025898],
		['40 lbf/ft²', 'pressure', 40 * 47.88025898],
		['1.9 kPa', 'pressure', 1900],
		['1.8e6 psi', 'modulus', 1.8e6 * 6894.757293],
		['12 GPa', 'modulus', 12e9],
		['200 lbf', 'force', 889.6443231],
		['200 lb', 'force', 889.6443231],
		['20 kg', 'force', 20 * 9.80665],
		['20 lbf/ft', 'lineLoad', 291.878059],
		['300 N/m', 'lineLoad', 300],
		['700 kg/m^3', 'density', 700],
		['40 lb/ft^3', 'density', 640.7385],
		['500 lbf in', 'moment', 56.49241]
	] as const)('%s as %s', (text, kind, si) => {
		expect(Math.abs(parseQuantity(text, kind) / si - 1)).toBeLessThan(1e-6);
	});

	it('names the field kind in the error', () => {
		expect(() => parseQuantity('40 m', 'pressure')).toThrow(/area load such as 40 lbf\/ft\^2/);
		expect(() => parseQuantity('fast', 'force')).toThrow(/force such as 200 lbf/);
	});
});

describe('formatLength', () => {
	it.each([
		[35.5 * IN, { unit: 'frac16' }, '35 1/2"'],
		[(3 / 32) * IN, { unit: 'frac32' }, '3/32"'],
		[0.1 * IN, { unit: 'frac16' }, '1/8"'], // nearest 1/16": 1.6/16 → 2/16
		[(5 / 64) * IN, { unit: 'frac64' }, '5/64"'],
		[35.5 * IN, { unit: 'frac16', feet: true }, `2' 11 1/2"`],
		[35.5 * IN, { unit: 'decimal-in' }, '35.5"'],
		[0.9, { unit: 'mm' }, '900 mm'],
		[0.0024, { unit: 'mm' }, '2.4 mm'],
		[0.0001, { unit: 'frac16' }, '< 1/16"']
	] as const)('%s m as %o', (m, f, text) => {
		expect(formatLength(m, f)).toBe(text);
	});

	it('round-trips any 1/64" length through every format', () => {
		fc.assert(
			fc.property(fc.integer({ min: 1, max: 64 * 200 }), (n) => {
				const metres = (n / 64) * IN;
				expect(parseLength(formatLength(metres, { unit: 'frac64' }))).toBeCloseTo(metres, 12);
				expect(parseLength(formatLength(metres, { unit: 'frac64', feet: true }))).toBeCloseTo(
					metres,
					12
				);
				expect(parseLength(formatLength(metres, { unit: 'decimal-in', digits: 6 }))).toBeCloseTo(
					metres,
					9
				);
				expect(parseLength(formatLength(metres, { unit: 'mm', digits: 6 }))).toBeCloseTo(metres, 7);
			})
		);
	});

	it('round-trips forces, pressures and line loads', () => {
		fc.assert(
			fc.property(fc.double({ min: 1, max: 1e5, noNaN: true }), (x) => {
				const rel = (a: number, b: number) => Math.abs(a - b) / b;
				expect(rel(parseQuantity(formatForce(x, { digits: 10 }), 'force'), x)).toBeLessThan(1e-8);
				expect(rel(parseQuantity(formatPressure(x, { digits: 10 }), 'pressure'), x)).toBeLessThan(
					1e-8
				);
				expect(
					rel(parseQuantity(formatPressure(x, { unit: 'kPa', digits: 10 }), 'pressure'), x)
				).toBeLessThan(1e-8);
				expect(rel(parseQuantity(formatLineLoad(x, { digits: 10 }), 'lineLoad'), x)).toBeLessThan(
					1e-8
				);
			})
		);
	});
});
