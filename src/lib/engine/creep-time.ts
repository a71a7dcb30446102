/**
 * How creep grows with the time a load stays on a shelf, between the instant sag (the moment the
 * load goes on) and the long-term sag the engine reports (after a year under the same load).
 *
 * Creep of wood and wood panels under constant load follows a power of time: it grows fast in the
 * first hours and days, then ever more slowly (Tong, Brown, Corr and Cusatis, "Wood creep data
 * collection and unbiased parameter identification of compliance functions", Holzforschung 74(11),
 * 2020: a power law fits the collected test curves best). The exponent is an estimate: 1/4 is a
 * typical value for wood in bending (from memory; the fitted values scatter widely).
 */

/** the exponent n in creep(t) ∝ tⁿ (from memory, see above) */
export const CREEP_TIME_EXPONENT = 0.25;
/** the time the engine's long-term sag stands for */
export const LONG_TERM_DAYS = 365;

/**
 * Share of the long-term creep reached after `days` under load: 0 at the instant of loading, 1
 * after a year, growing as (days / 365)ⁿ and held at 1 beyond a year (the engine does not reach
 * past its long-term figure).
 */
export function creepShare(days: number): number {
	if (!(days > 0)) return 0;
	return Math.min(1, (days / LONG_TERM_DAYS) ** CREEP_TIME_EXPONENT);
}

/** Sag after `days` under load, between the instant and the long-term sag (m in, m out). */
export function sagAfter(instantM: number, longTermM: number, days: number): number {
	return instantM + creepShare(days) * (longTermM - instantM);
}
