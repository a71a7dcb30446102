/** Conversions used at the lines where published US-customary formulas meet the SI engine. */
export const M_PER_IN = 0.0254;
export const N_PER_LBF = 4.4482216152605;
export const PA_PER_PSI = 6894.757293168;
export const G_M_PER_S2 = 9.80665;

export const inches = (m: number) => m / M_PER_IN;
export const metres = (inch: number) => inch * M_PER_IN;
