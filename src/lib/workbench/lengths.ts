/**
 * Lengths on the user's own grid: the step of their unit (1/16", 1/32", 1/64", 0.001", 1 mm) and
 * rounding to it in the safe direction, so a suggested span that is written down still passes.
 */
import { METRES_PER_INCH, formatLengthExact, type LengthUnit } from '../engine/units/length';

/** The unit people choose in their preferences (src/lib/schemas/preferences.ts). */
export type UserLengthUnit = Exclude<LengthUnit, 'm'>;

/** The smallest step the user's unit writes, in metres. */
export function unitStepM(unit: UserLengthUnit): number {
	switch (unit) {
		case 'frac16':
			return METRES_PER_INCH / 16;
		case 'frac32':
			return METRES_PER_INCH / 32;
		case 'frac64':
			return METRES_PER_INCH / 64;
		case 'decimal-in':
			return METRES_PER_INCH / 1000;
		case 'mm':
			return 0.001;
	}
}

// a hair of tolerance so a value already on the grid is not pushed to the next step
const GRID_TOLERANCE = 1e-9;

/** Round down to a multiple of `stepM` (a span that must not exceed a maximum). */
export function floorTo(metres: number, stepM: number): number {
	return Math.floor(metres / stepM + GRID_TOLERANCE) * stepM;
}

/** Round up to a multiple of `stepM` (a thickness or strip that must reach a minimum). */
export function ceilTo(metres: number, stepM: number): number {
	return Math.ceil(metres / stepM - GRID_TOLERANCE) * stepM;
}

/**
 * A length for a field the user can edit: exact, so that reading the text back gives the same
 * metres (23/32" stays 23/32" at a 1/16" display precision; feet are not used in fields).
 */
export function lengthText(metres: number, unit: UserLengthUnit): string {
	return formatLengthExact(metres, unit);
}

/** The pressure, line load and force units that go with the chosen length unit. */
export function loadUnitsFor(unit: UserLengthUnit) {
	return unit === 'mm'
		? ({ pressure: 'kPa', lineLoad: 'N/m', force: 'N' } as const)
		: ({ pressure: 'lbf/ft²', lineLoad: 'lbf/ft', force: 'lbf' } as const);
}
