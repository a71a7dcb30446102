/**
 * The conversions the joinery formulas use where published US-customary figures meet the SI
 * engine: the engine's one set of constants (units/), under the short names these files use.
 */
import { METRES_PER_INCH } from '../units/length';
import { NEWTONS_PER_LBF, STANDARD_GRAVITY } from '../units/quantity';

export {
	METRES_PER_INCH as M_PER_IN,
	NEWTONS_PER_LBF as N_PER_LBF,
	STANDARD_GRAVITY as G_M_PER_S2
};

export const inches = (m: number) => m / METRES_PER_INCH;
export const metres = (inch: number) => inch * METRES_PER_INCH;
