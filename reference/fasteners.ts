/**
 * Fastener and joint figures the joinery engine reads. Every published figure names its source
 * beside it; figures recalled rather than read from a copy of the source say "from memory", and
 * trade habits without a publisher say "common practice, no source".
 * Units: inches and pounds where the source states them (converted at the point of use), else SI.
 */

/** NDS 2018 §12.2.1, Eq. 12.2-2: wood-screw reference withdrawal W = 2850·G²·D, lb per inch of thread
 * penetration into side grain (allowable, normal load duration, before adjustment factors). */
export const NDS_WOOD_SCREW_WITHDRAWAL_COEFF = 2850;

/** USDA FPL Wood Handbook (FPL-GTR-282, 2021) ch. 8, ultimate wood-screw withdrawal p = 15,700·G²·D·L
 * (lb, in) for side grain (from memory). */
export const WOOD_HANDBOOK_SCREW_WITHDRAWAL_ULTIMATE_COEFF = 15700;

/** Ratio between the handbook's ultimate and the NDS allowable withdrawal (15,700 / 2,850 ≈ 5.5).
 * Used to bring test-based ultimate figures (panels, biscuits) to the same allowable basis. */
export const ULTIMATE_TO_ALLOWABLE =
	NDS_WOOD_SCREW_WITHDRAWAL_COEFF / WOOD_HANDBOOK_SCREW_WITHDRAWAL_ULTIMATE_COEFF;

/** NDS 2018 §12.2.1: wood screws are not loaded in withdrawal from end grain. */
export const END_GRAIN_WITHDRAWAL_ALLOWED = false;

/** NDS 2018 §12.5.2: lateral design values into end grain are multiplied by C_eg = 0.67. */
export const END_GRAIN_LATERAL_FACTOR = 0.67;

/** NDS 2018 Table 2.3.2: load duration factor C_D = 0.9 for permanent load (shelf contents left in
 * place for years are treated as permanent; from memory). */
export const LOAD_DURATION_PERMANENT = 0.9;

/** NDS 2018 Table 12.3.3 footnote: dowel bearing strength for D < 1/4", Fe = 16,600·G^1.84 psi,
 * parallel and perpendicular to grain alike. */
export const DOWEL_BEARING_COEFF_PSI = 16600;
export const DOWEL_BEARING_EXPONENT = 1.84;

/** NDS 2018 Table 12.3.1B reduction term for D ≤ 0.17": Rd = 2.2 (all yield modes); for
 * 0.17" < D < 0.25": Rd = 10·D + 0.5 (read in a stored transcription of the table in a public
 * structural-design library's NDS 2018 dowel-fastener module). */
export function reductionTermRd(diameterIn: number): number {
	return diameterIn <= 0.17 ? 2.2 : 10 * diameterIn + 0.5;
}

/** Fastener bending yield strength Fyb of wood screws by shank diameter, NDS 2018 Table 12L
 * footnote (from memory; verify): up to #7 100,000 psi, #8–#10 90,000 psi, #12–#14 80,000 psi. */
export function screwBendingYieldPsi(diameterIn: number): number {
	if (diameterIn < 0.16) return 100000;
	if (diameterIn < 0.2) return 90000;
	return 80000;
}

/** Nominal shank diameter of a numbered wood screw, ASME B18.6.1: D = 0.060" + 0.013"·gauge
 * (from memory). #8 → 0.164", #10 → 0.190". */
export function screwShankDiameterIn(gauge: number): number {
	return 0.06 + 0.013 * gauge;
}

/** Panel edge holding: "resistance to withdrawal from the edge is 75 to 80 percent of resistance to
 * withdrawal from the face" (McNatt, USDA FPL, Screw-holding, internal bond, and related properties
 * of composite board products, a survey of the literature). The lower bound is used. */
export const PANEL_EDGE_TO_FACE_WITHDRAWAL = 0.75;

/** mdf-info.eu (European MDF industry guide): face screws at least 12 mm from edges and 25 mm from
 * corners; edge screws at least 70 mm from corners; pilot hole 85–95% of core diameter. */
export const PANEL_FACE_SCREW_EDGE_DISTANCE_M = 0.012;
export const PANEL_FACE_SCREW_CORNER_DISTANCE_M = 0.025;
export const PANEL_EDGE_SCREW_CORNER_DISTANCE_M = 0.07;
export const PANEL_PILOT_FRACTION = { min: 0.85, max: 0.95 };

/** Biscuit sizes, length × width × thickness in mm. #10 and #20 from Wikipedia, "Biscuit joiner",
 * standard biscuit sizes (53 × 19 × 4, 56 × 23 × 4); #0 47 × 15 × 4 as in REFERENCES.md (joiner
 * manuals differ by a few mm). */
export const BISCUITS = [
	{ size: '#0', lengthMm: 47, widthMm: 15, thicknessMm: 4 },
	{ size: '#10', lengthMm: 53, widthMm: 19, thicknessMm: 4 },
	{ size: '#20', lengthMm: 56, widthMm: 23, thicknessMm: 4 }
] as const;
export type BiscuitSize = (typeof BISCUITS)[number]['size'];

/** Joiner manuals: #20 unless the stock is 1/2" or thinner (REFERENCES.md, joiner manuals).
 * Below 3/8" a #0 (common practice, no source). */
export const BISCUIT_20_MIN_STOCK_IN = 0.5;
export const BISCUIT_10_MIN_STOCK_IN = 0.375;

/** Joiner manuals: biscuits every 6–10" on centre, first 2–3" from each end (REFERENCES.md).
 * Turk J Agric For 28(5), 2004, corner joints in particleboard and MDF: spacing 10–15 cm made little
 * difference and 15 cm is recommended; 5 cm end distance gave the best result. */
export const BISCUIT_END_DISTANCE_M = 0.05; // Turk J Agric For 28(5) 2004; inside 2–3" of the manuals
export const BISCUIT_MAX_SPACING_M = 0.15; // Turk J Agric For 28(5) 2004; inside 6–10" of the manuals

/** A second row of biscuits once the stock is thick enough for two slots with wood between them:
 * 1-1/4" and over (common practice, no source). */
export const BISCUIT_DOUBLE_ROW_MIN_STOCK_IN = 1.25;

/** Face cover: wood left between the slot and each face. Less than 1/8" tends to show a bump
 * ("telegraphing") when the biscuit swells (common practice, no source). */
export const BISCUIT_MIN_FACE_COVER_IN = 0.125;

/** Maximum bending moment of biscuit corner joints (Hussein & Tangt as indexed, J. Institute of Wood
 * Science, doi 10.1179/002032009X12536100262033): particleboard 5.74 N·m in tension, 6.0 N·m in
 * compression; MDF 5.39 / 4.69 N·m. Taken as one biscuit per specimen (unverified). */
export const BISCUIT_JOINT_MOMENT_NM = {
	particleboard: { opening: 5.74, closing: 6.0 },
	mdf: { opening: 5.39, closing: 4.69 }
} as const;

/** Pocket screws (common practice, no source; no peer-reviewed strength study was found):
 * first hole about 2" from an edge, then about every 6" on centre; #8 screw; coarse thread for
 * softwood, plywood, MDF and particleboard, fine thread for hardwood. */
export const POCKET_FIRST_HOLE_M = 0.0508;
export const POCKET_MAX_SPACING_M = 0.1524;
export const POCKET_SCREW_GAUGE = 8;

/** Diameter of a pocket's bore (the step drill's larger part), 3/8" (common practice, no source).
 * Two pockets closer than this, centre to centre, would run into each other. */
export const POCKET_BORE_DIAMETER_M = 0.375 * 0.0254;

/**
 * Least spacing of laterally loaded screws of outer diameter d, along the grain, without
 * predrilled holes: d < 5 mm (5 + 5|cos α|)·d, so 10·d at α = 0; d ≥ 5 mm (5 + 7|cos α|)·d, so
 * 12·d. EN 1995-1-1:2004 (Eurocode 5) Table 8.2, nails (§8.7.1: screws of d ≤ 6 mm follow the nail
 * rules), read in a stored copy of LVL Handbook Europe (2025) Table 5.1, which reproduces it. The
 * largest spacing of the table's rows for these sizes is used (cautious: it holds whatever the grain
 * direction; predrilled holes allow less). Axially loaded screws need 7·d (EC5 Table 8.6, same copy).
 */
export function screwMinSpacingM(diameterM: number): number {
	return (diameterM < 0.005 ? 10 : 12) * diameterM;
}

/** Pocket screw length by stock thickness (common practice, no source): 1-1/4" in 3/4" stock is the
 * usual pairing (REFERENCES.md). Rows: stock up to `maxStockIn` takes `screwIn`. */
export const POCKET_SCREW_LENGTHS = [
	{ maxStockIn: 0.5625, screwIn: 1 },
	{ maxStockIn: 0.8125, screwIn: 1.25 },
	{ maxStockIn: 1.0625, screwIn: 1.5 },
	{ maxStockIn: 1.5625, screwIn: 2 },
	{ maxStockIn: Infinity, screwIn: 2.5 }
] as const;

/** Share of a pocket screw's length that stays inside the pocketed piece (head seat to exit) for a
 * 15° pocket: about 5/6 of the stock thickness (geometry of the common 15° pocket; common practice,
 * no source). */
export const POCKET_IN_PIECE_PER_STOCK = 0.84;

/** Screws through a case side into the shelf end: #8, spaced like pocket screws and at least 70 mm
 * from panel corners (see the mdf-info.eu figure above); length = side + 1" (common practice, no
 * source). */
export const THROUGH_SCREW_GAUGE = 8;
export const THROUGH_SCREW_EMBED_IN = 1;

/** Shelf pins: 5 mm or 1/4" steel, two per shelf end (common practice, no source); hole depth in the
 * side about 3/8" (common practice, no source). */
export const SHELF_PIN_DIAMETER_M = 0.005;
export const SHELF_PIN_EMBED_M = 0.0095;
export const SHELF_PINS_PER_END = 2;
/** Bending yield strength for a plain steel pin, taken as for the stoutest screws above (80,000 psi,
 * NDS Table 12L footnote, from memory). */
export const SHELF_PIN_FYB_PSI = 80000;

/** Dado: usual depth one third to one half of the side thickness (common practice, no source). */
export const DADO_DEPTH_PER_SIDE = 1 / 3;
