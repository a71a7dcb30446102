/**
 * What the designer's quantity fields show beside their text (the value read, in the user's unit)
 * for the fields the plain length reader does not cover: a length that may be left blank (then it
 * is the sides'), a length that may be zero (a flush base), and a spread load.
 */
import { readLengthText, readLoadText, type Reading } from '../components/quantity-input/reading';
import { formatLengthExact } from '../engine/units/length';
import type { UserLengthUnit } from '../workbench/lengths';

/** Blank means "as the sides" (or whatever `blankWords` says). */
export function optionalLength(unit: UserLengthUnit, blankWords: string) {
	return (text: string): Reading =>
		text.trim() === '' ? { ok: true, value: 0, shown: blankWords } : readLengthText(text, unit);
}

/** Zero is allowed: a base flush with the floor, a support line at the very front. */
export function lengthOrZero(unit: UserLengthUnit) {
	return (text: string): Reading => {
		if (/^\s*0+(\.0*)?\s*(mm|"|in)?\s*$/.test(text))
			return { ok: true, value: 0, shown: formatLengthExact(0, unit) };
		return readLengthText(text, unit);
	};
}

/** A load spread over the shelf; blank is the shelf alone. */
export function spreadLoad(unit: UserLengthUnit) {
	return (text: string): Reading => {
		if (text.trim() === '') return { ok: true, value: 0, shown: 'none' };
		return readLoadText(text, 'pressure', unit);
	};
}
