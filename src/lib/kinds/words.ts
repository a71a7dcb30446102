/**
 * Small pieces every kind's sentences share: a count with its noun, a share as a percent, and
 * two lengths written finely enough that the reader can see which is larger.
 */
import { formatLength, type LengthUnit } from '../engine/units/length';

/** The unit people choose in their preferences (src/lib/schemas/preferences.ts). */
export type ReaderUnit = Exclude<LengthUnit, 'm'>;

/** "1 check", "3 checks", "1 shelf pin"; `many` when the plural is not just an s. */
export function count(n: number, one: string, many = `${one}s`): string {
	return `${n} ${n === 1 ? one : many}`;
}

export function percent(share: number): string {
	return `${Math.round(share * 100)}%`;
}

/** Steps from the reader's unit to finer ones, coarsest first (decimal inches for fractions). */
function finer(unit: ReaderUnit): { unit: ReaderUnit; digits?: number }[] {
	if (unit === 'mm')
		return [{ unit }, { unit, digits: 1 }, { unit, digits: 2 }, { unit, digits: 3 }];
	const decimals = [3, 4, 5].map((digits) => ({ unit: 'decimal-in' as const, digits }));
	return unit === 'decimal-in' ? [{ unit }, ...decimals] : [{ unit }, ...decimals];
}

/**
 * Two lengths in the reader's unit; when they would read the same there (a sag of 0.251" and an
 * allowance of 0.250" both read 1/4"), both in the first finer figure that tells them apart, so a
 * sentence never calls one "more than" the other while printing the same number.
 */
export function apart(a: number, b: number, unit: ReaderUnit): [string, string] {
	const steps = finer(unit);
	for (const step of steps) {
		const pair: [string, string] = [formatLength(a, step), formatLength(b, step)];
		if (pair[0] !== pair[1] || a === b) return pair;
	}
	const last = steps[steps.length - 1];
	return [formatLength(a, last), formatLength(b, last)];
}
