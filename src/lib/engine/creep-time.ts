/**
 * How creep grows with the time a load stays on a shelf, between the instant sag (the moment the
 * load goes on) and the long-term sag the engine reports (after a year under the same load).
 *
 * Creep of wood and wood panels under constant load follows a power of time: it grows fast in the
 * first hours and days, then ever more slowly. Tong, Brown, Corr and Cusatis, "Wood creep data
 * collection and unbiased parameter identification of compliance functions", Holzforschung 74(11),
 * 2020, collected published creep curves into one database, fitted several compliance functions to
 * each, and report that "a power law trend in wood creep, with lognormal parameter distribution,
 * was confirmed" (abstract, checked against a stored copy of the publisher's page). That abstract
 * gives no exponent, and no stored copy of the Wood Handbook's creep section or of a panel creep
 * model gave one either: 1/4 is a typical value for wood in bending (from memory; fitted values
 * scatter widely between boards and climates).
 *
 * What the exponent can change is bounded: the share is 0 when loaded and 1 after a year, so the
 * lab never shows more than the engine's long-term sag, which is the figure every check uses (NDS
 * §3.5.2 and EN 1995-1-1 Table 3.2 give only that end value, see the material library). Between
 * the two a smaller exponent would show more of the creep early; the lab says "an estimate".
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
