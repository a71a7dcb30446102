/** What a quantity field shows beside its text: the value read, or why it could not be read. */
export type Reading = { ok: true; value: number; shown: string } | { ok: false; message: string };

type TryParse = (text: string) => { ok: true; value: number } | { ok: false; expected: string };

/**
 * Read a length as typed. A bare number means inches to a woodworker ("3/4", "35.5") and
 * millimetres to someone working in mm, never metres (the engine's convention for numbers).
 */
export function readLengthText<U extends string>(
	text: string,
	unit: U,
	tryParse: TryParse,
	format: (metres: number, f: { unit: U }) => string
): Reading {
	const trimmed = text.trim();
	if (trimmed === '') return { ok: false, message: 'Enter a length.' };
	const read = tryParse(withUnitMark(trimmed, unit));
	if (!read.ok) return { ok: false, message: `Could not read this. Expected ${read.expected}.` };
	if (!(read.value > 0)) return { ok: false, message: 'Must be greater than zero.' };
	return { ok: true, value: read.value, shown: format(read.value, { unit }) };
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
