/**
 * Exact conversion constants the numeric core needs, apart from the unit parser (quantity.ts and
 * its table, unit-table.ts; mathjs only through quantity-full.ts, which the server registers):
 * the model and the analysis import these without pulling in any unit library.
 */

/** Standard acceleration of gravity, exact by definition (3rd CGPM, 1901): 9.80665 m/s². */
export const STANDARD_GRAVITY = 9.80665;
/** 1 lbf = 4.4482216152605 N (exact, from the pound and standard gravity). */
export const NEWTONS_PER_LBF = 4.4482216152605;
