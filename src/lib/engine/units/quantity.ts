/**
 * Forces, pressures, line loads, moduli, densities and moments as unit strings (`40 lbf/ft^2`,
 * `1.9 kPa`, `1.8e6 psi`). Read once at the edge; the numeric core sees SI numbers.
 *
 * The units the trade writes come from an exact table (unit-table.ts) with no unit library, so the
 * browser never loads one. Anything else goes to a full parser (mathjs, in quantity-full.ts) only
 * where one has been registered: the server registers it at start (hooks.server.ts); tests and
 * Node scripts import quantity-full.ts when they need unusual units.
 */
import { METRES_PER_INCH, QuantityError, parseLength } from './length';
import { NEWTONS_PER_LBF, STANDARD_GRAVITY } from './si';
import { readFromTable } from './unit-table';

/** What the kind's value is in SI, as a unit string a full parser understands. */
export interface UnitTarget {
	si: string;
	/** the mass-based unit whose weight is meant (`50 kg` of books is a force of 50·g) */
	massBased?: string;
}

/** Reads a normalised quantity text to SI for the target, or undefined if it cannot. */
type FullUnitParser = (text: string, target: UnitTarget) => number | undefined;

let fullParser: FullUnitParser | undefined;

/** Register the full unit parser (quantity-full.ts does, on import). */
export function useFullUnitParser(parse: FullUnitParser): void {
	fullParser = parse;
}

/** Whether a full unit parser is registered (units beyond the table can be read). */
export function hasFullUnitParser(): boolean {
	return fullParser !== undefined;
}

export { NEWTONS_PER_LBF, STANDARD_GRAVITY };
/** 1 psi = 1 lbf/in² = 6894.757293168 Pa. */
export const PASCALS_PER_PSI = NEWTONS_PER_LBF / METRES_PER_INCH ** 2;
export const PASCALS_PER_PSF = PASCALS_PER_PSI / 144;
export const NEWTONS_PER_METRE_PER_PLF = NEWTONS_PER_LBF / 0.3048;
export const KG_PER_M3_PER_PCF = 0.45359237 / 0.3048 ** 3;

export type QuantityKind =
	'length' | 'force' | 'pressure' | 'lineLoad' | 'modulus' | 'density' | 'moment';

interface KindInfo extends UnitTarget {
	expected: string;
}

const KINDS: Record<Exclude<QuantityKind, 'length'>, KindInfo> = {
	force: { si: 'N', massBased: 'kg', expected: 'a force such as 200 lbf, 450 N or 20 kg' },
	pressure: {
		si: 'Pa',
		massBased: 'kg/m^2',
		expected: 'an area load such as 40 lbf/ft^2, 40 psf or 1.9 kPa'
	},
	lineLoad: {
		si: 'N/m',
		massBased: 'kg/m',
		expected: 'a load along the shelf such as 20 lbf/ft, 20 plf or 300 N/m'
	},
	modulus: { si: 'Pa', expected: 'a stiffness or strength such as 1.8e6 psi, 12 GPa or 12400 MPa' },
	density: { si: 'kg/m^3', expected: 'a density such as 700 kg/m^3 or 40 lb/ft^3' },
	moment: { si: 'N m', expected: 'a moment such as 500 lbf in or 60 N m' }
};

/** The SI unit (and the mass-based unit meant as a weight) a full parser reads the kind in. */
export function unitTargetFor(kind: Exclude<QuantityKind, 'length'>): UnitTarget {
	const { si, massBased } = KINDS[kind];
	return massBased ? { si, massBased } : { si };
}

export function expectedFor(kind: QuantityKind): string {
	return kind === 'length' ? 'a length such as 35 1/2", 900 mm or 0.9 m' : KINDS[kind].expected;
}

/** Trade shorthands mathjs does not know, and typographic marks. */
export function normalise(text: string): string {
	return (
		text
			.trim()
			.replace(/²/g, '^2')
			.replace(/³/g, '^3')
			.replace(/[·×*]/g, ' ')
			.replace(/(\d),(\d{3})/g, '$1$2')
			.replace(/\bpsf\b/g, 'lbf/ft^2')
			.replace(/\bplf\b/g, 'lbf/ft')
			.replace(/\bpcf\b/g, 'lb/ft^3')
			.replace(/\bksi\b/g, 'kip/in^2')
			.replace(/\blbs\b/g, 'lb')
			.replace(/\bpounds?\b/g, 'lb')
			// the shop's `50#` is 50 lb; `lb/ft2` is lb/ft²
			.replace(/(\d)\s*#/g, '$1 lb')
			.replace(/\b(ft|in|m|mm|cm)([23])\b/g, '$1^$2')
	);
}

/**
 * Parse a quantity of the given kind to SI (N, Pa, N/m, Pa, kg/m³, N·m, m). A number is taken as
 * already SI. `lb` and `kg` in a force-like quantity mean their weight under standard gravity.
 * A unit outside the table is read only if a full parser is registered (useFullUnitParser).
 * Throws QuantityError naming what was expected.
 */
export function parseQuantity(input: string | number, kind: QuantityKind): number {
	if (kind === 'length') return parseLength(input);
	const info = KINDS[kind];
	if (typeof input === 'number') {
		if (Number.isFinite(input)) return input;
		throw new QuantityError(input, info.expected);
	}
	if (typeof input !== 'string' || input.trim() === '')
		throw new QuantityError(input, info.expected);
	const text = normalise(input);
	if (/^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i.test(text)) return Number(text);
	const value = readFromTable(text, kind) ?? fullParser?.(text, info);
	if (value === undefined || !Number.isFinite(value)) throw new QuantityError(input, info.expected);
	return value;
}

/** parseQuantity without a throw. */
export function tryParseQuantity(
	input: string | number,
	kind: QuantityKind
): { ok: true; value: number } | { ok: false; expected: string } {
	try {
		return { ok: true, value: parseQuantity(input, kind) };
	} catch {
		return { ok: false, expected: expectedFor(kind) };
	}
}

// One formatter for every number written: toLocaleString builds a new one on each call, which was
// a quarter of the shelf screen's start-up in a profile.
const PLAIN = new Intl.NumberFormat('en-US', { maximumFractionDigits: 12, useGrouping: false });

/** Round to significant digits and write without exponent: 1820000, 40, 1.9, 0.0123. */
export function formatNumber(value: number, significant = 3): string {
	if (!Number.isFinite(value)) return '—';
	if (value === 0) return '0';
	return PLAIN.format(Number(value.toPrecision(significant)));
}

const FORCE_UNITS = { lbf: NEWTONS_PER_LBF, N: 1, kN: 1000 } as const;
const PRESSURE_UNITS = {
	'lbf/ft²': PASCALS_PER_PSF,
	psi: PASCALS_PER_PSI,
	Pa: 1,
	kPa: 1e3,
	MPa: 1e6,
	GPa: 1e9
} as const;
const LINE_LOAD_UNITS = { 'lbf/ft': NEWTONS_PER_METRE_PER_PLF, 'N/m': 1, 'kN/m': 1000 } as const;
const MOMENT_UNITS = {
	'lbf·in': NEWTONS_PER_LBF * METRES_PER_INCH,
	'lbf·ft': NEWTONS_PER_LBF * 0.3048,
	'N·m': 1
} as const;
const DENSITY_UNITS = { 'kg/m³': 1, 'lb/ft³': KG_PER_M3_PER_PCF } as const;

export type ForceUnit = keyof typeof FORCE_UNITS;
export type PressureUnit = keyof typeof PRESSURE_UNITS;
export type LineLoadUnit = keyof typeof LINE_LOAD_UNITS;
export type MomentUnit = keyof typeof MOMENT_UNITS;
export type DensityUnit = keyof typeof DENSITY_UNITS;

interface Format<U> {
	unit?: U;
	/** significant digits (default 3) */
	digits?: number;
}

function formatIn(si: number, factor: number, unit: string, digits = 3): string {
	return `${formatNumber(si / factor, digits)} ${unit}`;
}

/** `200 lbf`, `890 N`, `0.89 kN` (from newtons). */
export function formatForce(newtons: number, f: Format<ForceUnit> = {}): string {
	const unit = f.unit ?? 'lbf';
	return formatIn(newtons, FORCE_UNITS[unit], unit, f.digits);
}
/** `40 lbf/ft²`, `1.92 kPa`, `1820000 psi`, `12.5 GPa` (from pascals; also for moduli). */
export function formatPressure(pascals: number, f: Format<PressureUnit> = {}): string {
	const unit = f.unit ?? 'lbf/ft²';
	return formatIn(pascals, PRESSURE_UNITS[unit], unit, f.digits);
}
/** `20 lbf/ft`, `292 N/m` (from N/m). */
export function formatLineLoad(newtonsPerMetre: number, f: Format<LineLoadUnit> = {}): string {
	const unit = f.unit ?? 'lbf/ft';
	return formatIn(newtonsPerMetre, LINE_LOAD_UNITS[unit], unit, f.digits);
}
/** `550 lbf·in`, `62.1 N·m` (from N·m). */
export function formatMoment(newtonMetres: number, f: Format<MomentUnit> = {}): string {
	const unit = f.unit ?? 'lbf·in';
	return formatIn(newtonMetres, MOMENT_UNITS[unit], unit, f.digits);
}
/** `700 kg/m³`, `43.7 lb/ft³` (from kg/m³). */
export function formatDensity(kgPerM3: number, f: Format<DensityUnit> = {}): string {
	const unit = f.unit ?? 'kg/m³';
	return formatIn(kgPerM3, DENSITY_UNITS[unit], unit, f.digits);
}

const FIELD_UNITS = {
	force: FORCE_UNITS,
	pressure: PRESSURE_UNITS,
	lineLoad: LINE_LOAD_UNITS
} as const;
const SI_SYMBOL = { force: 'N', pressure: 'Pa', lineLoad: 'N/m' } as const;

/**
 * A force, area load or line load written for a field the user edits: in their unit, with the
 * fewest significant digits (three at least) that read back as exactly the same SI value, so
 * display precision never becomes input. Falls back to the SI unit when no decimal in theirs is
 * exact.
 */
export function formatQuantityExact<K extends keyof typeof FIELD_UNITS>(
	si: number,
	kind: K,
	unit: keyof (typeof FIELD_UNITS)[K]
): string {
	if (!Number.isFinite(si)) return '—';
	const factor = (FIELD_UNITS[kind] as Record<string, number>)[unit as string];
	for (let digits = 3; digits <= 17; digits++) {
		const text = formatIn(si, factor, unit as string, digits);
		if (tryParseQuantity(text, kind).ok && parseQuantity(text, kind) === si) return text;
	}
	return `${si} ${SI_SYMBOL[kind]}`;
}
