import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import {
	hasFullUnitParser,
	normalise,
	parseQuantity,
	tryParseQuantity,
	unitTargetFor
} from '../../src/lib/engine/units/quantity';
import { UNIT_TABLE, readFromTable, type TableKind } from '../../src/lib/engine/units/unit-table';

// Exact definitions (international yard and pound, 1959; standard gravity, 3rd CGPM 1901), written
// out here apart from the engine's own constants. "B.8" below: NIST SP 811 (2008 ed.), Appendix
// B.8, factors for units listed alphabetically (from memory).
const IN = 0.0254;
const FT = 0.3048;
const LB_KG = 0.45359237;
const G = 9.80665;
const LBF = LB_KG * G; // 4.4482216152605 N

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

// mathjs is loaded only by the last describe block: until then the parser has the table alone,
// as in the browser.
type MathjsRead = (text: string, target: ReturnType<typeof unitTargetFor>) => number | undefined;
let mathjs: MathjsRead;

/** The trade's spellings, as typed, with their SI value worked from the exact definitions. */
const SPELLINGS: [string, TableKind, number][] = [
	['200 lbf', 'force', 200 * LBF],
	['200 lb', 'force', 200 * LBF],
	['200 lbs', 'force', 200 * LBF],
	['200 pounds', 'force', 200 * LBF],
	['1.5 kip', 'force', 1500 * LBF], // 1 kip = 1000 lbf (B.8)
	['450 N', 'force', 450],
	['0.45 kN', 'force', 450],
	['20 kgf', 'force', 20 * G],
	['20 kg', 'force', 20 * G],
	['1,200 lbf', 'force', 1200 * LBF],
	['40 psf', 'pressure', (40 * LBF) / FT ** 2],
	['40 lbf/ft^2', 'pressure', (40 * LBF) / FT ** 2],
	['40 lbf/ft²', 'pressure', (40 * LBF) / FT ** 2],
	['40 lbf / ft^2', 'pressure', (40 * LBF) / FT ** 2],
	['40lbf/ft^2', 'pressure', (40 * LBF) / FT ** 2],
	['40 lb/ft²', 'pressure', (40 * LBF) / FT ** 2],
	['0.5 lbf/in^2', 'pressure', (0.5 * LBF) / IN ** 2],
	['0.5 psi', 'pressure', (0.5 * LBF) / IN ** 2],
	['1.9 kPa', 'pressure', 1900],
	['.5 kPa', 'pressure', 500],
	['1900 Pa', 'pressure', 1900],
	['1900 N/m^2', 'pressure', 1900],
	['1.9 kN/m²', 'pressure', 1900],
	['1.8e6 psi', 'modulus', (1.8e6 * LBF) / IN ** 2],
	['1.8E6 psi', 'modulus', (1.8e6 * LBF) / IN ** 2],
	['1.8 Mpsi', 'modulus', (1.8e6 * LBF) / IN ** 2],
	['1800 ksi', 'modulus', (1.8e6 * LBF) / IN ** 2], // ksi = 1000 lbf/in² (B.8)
	['12400 MPa', 'modulus', 12.4e9],
	['12.4 GPa', 'modulus', 12.4e9],
	['12400 N/mm^2', 'modulus', 12.4e9],
	['12400 N/mm²', 'modulus', 12.4e9],
	['12.4 kN/mm²', 'modulus', 12.4e9],
	['200 kgf/m²', 'pressure', 200 * G],
	['20 plf', 'lineLoad', (20 * LBF) / FT],
	['20 lbf/ft', 'lineLoad', (20 * LBF) / FT],
	['20 lb/ft', 'lineLoad', (20 * LBF) / FT],
	['2 lbf/in', 'lineLoad', (2 * LBF) / IN],
	['300 N/m', 'lineLoad', 300],
	['0.3 kN/m', 'lineLoad', 300],
	['0.3 N/mm', 'lineLoad', 300],
	['700 kg/m^3', 'density', 700],
	['700 kg/m³', 'density', 700],
	['0.7 g/cm^3', 'density', 700],
	['40 lb/ft^3', 'density', (40 * LB_KG) / FT ** 3],
	['40 lb/ft³', 'density', (40 * LB_KG) / FT ** 3],
	['40 pcf', 'density', (40 * LB_KG) / FT ** 3],
	['60 N m', 'moment', 60],
	['60 N·m', 'moment', 60],
	['60 N*m', 'moment', 60],
	['0.06 kN m', 'moment', 60],
	['500 lbf in', 'moment', 500 * LBF * IN],
	['500 lbf·in', 'moment', 500 * LBF * IN],
	['500 in-lb', 'moment', 500 * LBF * IN],
	['40 lbf ft', 'moment', 40 * LBF * FT],
	['40 lbf·ft', 'moment', 40 * LBF * FT],
	['40 ft-lb', 'moment', 40 * LBF * FT],
	['-3 N', 'force', -3]
];

describe('the unit table alone (as in the browser, no mathjs)', () => {
	it('has no full parser registered yet', () => {
		expect(hasFullUnitParser()).toBe(false);
	});

	it.each(SPELLINGS)('%s as %s', (text, kind, si) => {
		expect(readFromTable(normalise(text), kind)).toBeDefined();
		expect(rel(parseQuantity(text, kind), si)).toBeLessThan(1e-12);
	});

	it.each([
		['40 m', 'pressure'],
		['40 lbf', 'pressure'],
		['40 lb/ft^2', 'modulus'], // a modulus is never a weight per area
		['fast', 'force'],
		['1e400 N', 'force'],
		['lbf 40', 'force']
	] as const)('refuses %s as %s, saying what was expected', (text, kind) => {
		expect(() => parseQuantity(text, kind)).toThrow(/such as/);
	});

	it('refuses a unit outside the table until the full parser is loaded', () => {
		// 2 bar = 200 kPa (B.8: bar, 1.0 E+05 Pa): mathjs knows it, the table does not
		expect(readFromTable('2 bar', 'pressure')).toBeUndefined();
		expect(tryParseQuantity('2 bar', 'pressure')).toEqual({
			ok: false,
			expected: 'an area load such as 40 lbf/ft^2, 40 psf or 1.9 kPa'
		});
	});
});

/** A spelling mathjs reads with the same meaning, where it does not read the table's own. */
function mathjsSpelling(unit: string, kind: TableKind): string {
	const exact: Record<string, string> = {
		// mathjs rounds its kip (4448.2216 N) and psi (6894.75729276459 Pa) constants; the table
		// keeps the exact values, so they are checked against mathjs's exact lbf, in and ft
		kip: '1000 lbf',
		psi: 'lbf/in^2',
		Mpsi: '1e6 lbf/in^2',
		'kip/in^2': '1000 lbf/in^2',
		'kip/ft^2': '1000 lbf/ft^2',
		'kip/ft': '1000 lbf/ft'
	};
	if (exact[unit]) return exact[unit];
	if (kind === 'moment') return unit.replace('-', ' ').replace(/\blb\b/, 'lbf'); // in-lb is lbf·in
	return unit;
}

describe('every table entry against mathjs itself', () => {
	beforeAll(async () => {
		mathjs = (await import('../../src/lib/engine/units/quantity-full')).parseWithMathjs;
	});

	const entries = (Object.keys(UNIT_TABLE) as TableKind[]).flatMap((kind) =>
		Object.keys(UNIT_TABLE[kind]).map((unit) => [kind, unit] as const)
	);

	it.each(entries)('%s: %s', (kind, unit) => {
		const spelled = mathjsSpelling(unit, kind);
		const [scale, mathjsUnit] = /^[\d.e]+ /.test(spelled)
			? [Number(spelled.split(' ')[0]), spelled.slice(spelled.indexOf(' ') + 1)]
			: [1, spelled];
		for (const x of [1, 2.5, 40, 1.8e6]) {
			const fromMathjs = mathjs(`${x * scale} ${mathjsUnit}`, unitTargetFor(kind));
			expect(fromMathjs).toBeDefined();
			expect(rel(readFromTable(`${x} ${unit}`, kind)!, fromMathjs!)).toBeLessThan(1e-12);
		}
	});

	it('differs from mathjs only by its rounded kip and psi constants', () => {
		// mathjs: kip 4448.2216 N, psi 6894.75729276459 Pa; exact: 4448.2216152605 N and
		// 6894.757293168361 Pa (1000 lbf; lbf/in²; B.8)
		const psi = mathjs('1 psi', unitTargetFor('modulus'))!;
		const kip = mathjs('1 kip', unitTargetFor('force'))!;
		expect(rel(psi, (1 * LBF) / IN ** 2)).toBeGreaterThan(1e-12);
		expect(rel(psi, (1 * LBF) / IN ** 2)).toBeLessThan(1e-10);
		expect(rel(kip, 1000 * LBF)).toBeLessThan(1e-8);
		expect(rel(parseQuantity('1 psi', 'modulus'), (1 * LBF) / IN ** 2)).toBeLessThan(1e-15);
	});

	it('reads any number with any table unit as mathjs does', () => {
		const plain = entries.filter(([kind, unit]) => mathjsSpelling(unit, kind) === unit);
		fc.assert(
			fc.property(
				fc.constantFrom(...plain),
				fc.double({ min: 1e-4, max: 1e8, noNaN: true }),
				([kind, unit], x) => {
					const fromMathjs = mathjs(`${x} ${unit}`, unitTargetFor(kind))!;
					expect(rel(parseQuantity(`${x} ${unit}`, kind), fromMathjs)).toBeLessThan(1e-12);
				}
			)
		);
	});

	it('falls back to mathjs for a unit outside the table once it is registered', () => {
		expect(hasFullUnitParser()).toBe(true);
		expect(parseQuantity('2 bar', 'pressure')).toBeCloseTo(2e5, 6); // B.8: bar, 1.0 E+05 Pa
		expect(parseQuantity('3 dyn', 'force')).toBeCloseTo(3e-5, 15); // B.8: dyne, 1.0 E-05 N
		expect(() => parseQuantity('2 bar', 'force')).toThrow(/force such as/);
	});
});
