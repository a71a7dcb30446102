import { formatLengthExact, tryParseLength, type LengthUnit } from '../../engine/units/length';
import {
	formatNumber,
	formatQuantityExact,
	parseQuantity,
	tryParseQuantity
} from '../../engine/units/quantity';

/**
 * What a quantity field shows beside its text: the value read, or why it could not be read. What is
 * shown is exactly what was read (23/32", not the 3/4" of a 1/16" display), never a rounded value.
 */
export type Reading = { ok: true; value: number; shown: string } | { ok: false; message: string };

/**
 * Read a length as typed. A bare number means inches to a woodworker ("3/4", "35.5") and
 * millimetres to someone working in mm, never metres (the engine's convention for numbers). The
 * echo is exact: the fraction when there is one, else the digits it takes (formatLengthExact).
 */
export function readLengthText(text: string, unit: LengthUnit): Reading {
	const trimmed = text.trim();
	if (trimmed === '') return { ok: false, message: 'Enter a length.' };
	const read = tryParseLength(withUnitMark(trimmed, unit));
	if (!read.ok) return { ok: false, message: `Could not read this. Expected ${read.expected}.` };
	if (!(read.value > 0)) return { ok: false, message: 'Must be greater than zero.' };
	return { ok: true, value: read.value, shown: formatLengthExact(read.value, unit) };
}

const BARE = /^(?:\d+(?:\.\d*)?|\.\d+|\d+[\s-]+\d+\/\d+|\d+\/\d+)$/;

/** "3/4" → `3/4"`, "35 1/2" → `35 1/2"`, "900" → `900 mm` (for mm users); anything else as typed. */
export function withUnitMark(text: string, unit: string): string {
	const t = text.trim();
	if (!BARE.test(t)) return t;
	if (unit === 'mm') return t.includes('/') ? `${t}"` : `${t} mm`;
	return `${t}"`;
}

/** The load kinds a field can hold, and the unit a bare number means in each unit system. */
export type LoadQuantity = 'pressure' | 'lineLoad' | 'force';
const BARE_LOAD_UNIT: Record<'inch' | 'metric', Record<LoadQuantity, string>> = {
	inch: { pressure: 'lbf/ft²', lineLoad: 'lbf/ft', force: 'lbf' },
	metric: { pressure: 'kPa', lineLoad: 'N/m', force: 'N' }
};

/** The units a bare load number is read in for the user's length unit (mm users are metric). */
export function bareLoadUnits(unit: string): Record<LoadQuantity, string> {
	return BARE_LOAD_UNIT[unit === 'mm' || unit === 'm' ? 'metric' : 'inch'];
}

const BARE_NUMBER = /^(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/**
 * A bare number in a load field means the user's own unit system, never SI: `40` over the shelf is
 * 40 lbf/ft² to an inch user and 40 kPa to a metric one; `50` at a point is 50 lbf or 50 N. Text
 * with a unit is left as typed.
 */
export function withLoadUnit(text: string, kind: LoadQuantity, unit: string): string {
	const t = text.trim();
	return BARE_NUMBER.test(t) ? `${t} ${bareLoadUnits(unit)[kind]}` : t;
}

/**
 * Read a load as typed (a bare number in the user's own system) and echo it exactly in their unit:
 * the fewest digits that read back as the same value (42.37 lbf/ft², not 42.4), never rounded.
 */
export function readLoadText(text: string, kind: LoadQuantity, unit: string): Reading {
	const r = tryParseQuantity(withLoadUnit(text, kind, unit), kind);
	if (!r.ok) return { ok: false, message: `Could not read this. Expected ${r.expected}.` };
	return { ok: true, value: r.value, shown: exactLoadText(r.value, kind, unit) };
}

/**
 * A load in SI written exactly in the user's unit system (what a field echoes or reopens with):
 * the fewest digits (three at least) that read back as the same value. A figure typed in the other
 * system (40 psf to a metric user) has no short exact form in theirs, so it is written in the unit
 * it was typed in; only what neither writes shortly falls back to every digit.
 */
export function exactLoadText(si: number, kind: LoadQuantity, unit: string): string {
	const mine = bareLoadUnits(unit)[kind];
	const other = bareLoadUnits(unit === 'mm' || unit === 'm' ? 'in' : 'mm')[kind];
	for (const symbol of [mine, other])
		for (let digits = 3; digits <= 8; digits++) {
			const text = `${formatNumber(si / parseQuantity(`1 ${symbol}`, kind), digits)} ${symbol}`;
			if (parseQuantity(text, kind) === si) return text;
		}
	return kind === 'pressure'
		? formatQuantityExact(si, 'pressure', mine as 'kPa' | 'lbf/ft²')
		: kind === 'lineLoad'
			? formatQuantityExact(si, 'lineLoad', mine as 'N/m' | 'lbf/ft')
			: formatQuantityExact(si, 'force', mine as 'N' | 'lbf');
}
