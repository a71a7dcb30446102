/**
 * The units the trade writes, read without a unit library: one exact factor to SI per spelling and
 * quantity kind. Anything not listed here goes to the full unit parser (quantity-full.ts, mathjs)
 * where one is registered. Keys are canonical: after quantity.ts's `normalise` (², ³, ·, *, psf,
 * plf, pcf, ksi, lbs, pounds) and `canonicalUnit` below (single spaces, none around `/` or `^`).
 */
import { METRES_PER_FOOT, METRES_PER_INCH } from './length';
import { NEWTONS_PER_LBF, STANDARD_GRAVITY } from './si';

/** The quantity kinds this table reads (lengths have their own parser, length.ts). */
export type TableKind = 'force' | 'pressure' | 'lineLoad' | 'modulus' | 'density' | 'moment';

// Sources: the exact definitions of the international inch, foot and avoirdupois pound (1959) and
// of standard gravity (3rd CGPM, 1901); the rounded factors quoted beside them are those of
// NIST SP 811 (2008 ed.), Appendix B.8, "Factors for units listed alphabetically" (from memory).

/** 1 lb = 0.45359237 kg, exact (international avoirdupois pound, 1959). */
const KG_PER_LB = 0.45359237;
/** 1 kip = 1000 lbf = 4448.2216152605 N (NIST SP 811 B.8: kip, 4.448 222 E+03 N). */
const NEWTONS_PER_KIP = 1000 * NEWTONS_PER_LBF;
/** 1 kgf = 9.80665 N, exact from standard gravity (NIST SP 811 B.8: kilogram-force). */
const NEWTONS_PER_KGF = STANDARD_GRAVITY;

const IN = METRES_PER_INCH; // 0.0254 m, exact (international inch, 1959)
const FT = METRES_PER_FOOT; // 0.3048 m, exact (international foot, 1959)
const LBF = NEWTONS_PER_LBF; // 4.4482216152605 N, exact: 1 lb × standard gravity (si.ts)
/** a pound of mass meant as its weight under standard gravity (as `lb` in a force or load) */
const LB_WEIGHT = KG_PER_LB * STANDARD_GRAVITY;

/** psi = lbf/in² = 6894.757293168 Pa (NIST SP 811 B.8: 6.894 757 E+03 Pa). */
const PSI = LBF / IN ** 2;
/** psf = lbf/ft² = 47.88025898 Pa (NIST SP 811 B.8: 4.788 026 E+01 Pa). */
const PSF = LBF / FT ** 2;

const FORCE: Record<string, number> = {
	N: 1,
	kN: 1e3,
	lbf: LBF,
	kip: NEWTONS_PER_KIP,
	kgf: NEWTONS_PER_KGF,
	// a mass in a force field is its weight (`50 kg` of books), as quantity.ts has always read it
	lb: LB_WEIGHT,
	kg: STANDARD_GRAVITY
};

/** Stresses and stiffnesses: force over area only (a modulus is never a mass per area). */
const STRESS: Record<string, number> = {
	Pa: 1,
	kPa: 1e3,
	MPa: 1e6,
	GPa: 1e9,
	'N/m^2': 1,
	'kN/m^2': 1e3,
	'N/mm^2': 1 / 1e-3 ** 2,
	'kN/mm^2': 1e3 / 1e-3 ** 2,
	'MN/m^2': 1e6,
	'kgf/cm^2': NEWTONS_PER_KGF / 1e-2 ** 2,
	'lbf/ft^2': PSF,
	'lbf/in^2': PSI,
	psi: PSI,
	// 1 Mpsi = 10⁶ psi (stiffness is often quoted so, 1.8 Mpsi: common practice, no source)
	Mpsi: 1e6 * PSI,
	// ksi is rewritten to kip/in² by normalise (NIST SP 811 B.8: ksi, 6.894 757 E+06 Pa)
	'kip/in^2': NEWTONS_PER_KIP / IN ** 2,
	'kip/ft^2': NEWTONS_PER_KIP / FT ** 2
};

const PRESSURE: Record<string, number> = {
	...STRESS,
	// a mass per area is its weight per area (lb/ft² of books)
	'lb/ft^2': LB_WEIGHT / FT ** 2,
	'lb/in^2': LB_WEIGHT / IN ** 2,
	'kg/m^2': STANDARD_GRAVITY,
	'kgf/m^2': NEWTONS_PER_KGF
};

const LINE_LOAD: Record<string, number> = {
	'N/m': 1,
	'kN/m': 1e3,
	'N/mm': 1 / 1e-3,
	'lbf/ft': LBF / FT,
	'lbf/in': LBF / IN,
	'kip/ft': NEWTONS_PER_KIP / FT,
	'lb/ft': LB_WEIGHT / FT,
	'lb/in': LB_WEIGHT / IN,
	'kg/m': STANDARD_GRAVITY,
	'kgf/m': NEWTONS_PER_KGF
};

const DENSITY: Record<string, number> = {
	'kg/m^3': 1,
	'g/cm^3': 1e-3 / 1e-2 ** 3,
	'lb/ft^3': KG_PER_LB / FT ** 3,
	'lb/in^3': KG_PER_LB / IN ** 3
};

/** Moments: both orders, with a space (from `·` or `*`) or, for the imperial ones, a hyphen. */
function bothWays(a: string, b: string, factor: number, hyphen: boolean): Record<string, number> {
	const out: Record<string, number> = { [`${a} ${b}`]: factor, [`${b} ${a}`]: factor };
	if (hyphen) Object.assign(out, { [`${a}-${b}`]: factor, [`${b}-${a}`]: factor });
	return out;
}

const MOMENT: Record<string, number> = {
	...bothWays('N', 'm', 1, false),
	...bothWays('kN', 'm', 1e3, false),
	...bothWays('N', 'mm', 1e-3, false),
	...bothWays('lbf', 'in', LBF * IN, true),
	...bothWays('lbf', 'ft', LBF * FT, true),
	// the trade's in-lb and ft-lb are pound-force moments
	...bothWays('lb', 'in', LB_WEIGHT * IN, true),
	...bothWays('lb', 'ft', LB_WEIGHT * FT, true)
};

/** Every spelling the table reads, by kind, with its factor to the kind's SI unit. */
export const UNIT_TABLE: Readonly<Record<TableKind, Readonly<Record<string, number>>>> = {
	force: FORCE,
	pressure: PRESSURE,
	lineLoad: LINE_LOAD,
	modulus: STRESS,
	density: DENSITY,
	moment: MOMENT
};

/** `lbf / ft ^2` → `lbf/ft^2`, `N   m` → `N m`. */
function canonicalUnit(unit: string): string {
	return unit
		.trim()
		.replace(/\s*([/^])\s*/g, '$1')
		.replace(/\s+/g, ' ');
}

const NUMBER_THEN_UNIT = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)\s*([^\d\s.+-].*)$/i;

/**
 * Read a normalised quantity (`40 lbf/ft^2`, `1.8e6 psi`) from the table, in SI. Undefined when
 * the unit is not in the table for this kind (the caller may try the full parser) or the number
 * is not finite.
 */
export function readFromTable(text: string, kind: TableKind): number | undefined {
	const m = NUMBER_THEN_UNIT.exec(text.trim());
	if (!m) return undefined;
	const table = UNIT_TABLE[kind];
	const unit = canonicalUnit(m[2]);
	if (!Object.hasOwn(table, unit)) return undefined;
	const factor = table[unit];
	const value = Number(m[1]) * factor;
	return Number.isFinite(value) ? value : undefined;
}
