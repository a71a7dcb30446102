/**
 * Tip-over tests and anchoring guidance the stability engine compares against. None of these
 * standards covers bookcases or open shelving as such: they are cited as the nearest published tests.
 */

const LBF_N = 4.4482216152605;

/** ASTM F2057-23 (clothing storage units ≥ 27" tall; excludes bookcases and shelving): a 60 lb test
 * weight on an open drawer (raised from 50 lb). Adopted by CPSC as 16 CFR 1261, effective
 * 1 Sep 2023 (REFERENCES.md). */
export const F2057_TEST_WEIGHT_N = 60 * LBF_N;
export const F2057_MIN_HEIGHT_M = 27 * 0.0254;

/** ASTM F2057-23's test conditions for drawers, as far as public summaries of the standard show
 * them (the standard itself was not read):
 * - its introduction: the tests simulate "a clothing storage unit on carpet, loaded drawers,
 *   multiple open drawers, and a dynamic force" (the first page of F2057-23, as stored by a
 *   document-sharing site);
 * - all drawers loaded with 8.5 lb per cubic foot (SGS SafeGuardS 04/23, "US Enacts STURDY Act
 *   for Clothing Storage Units", January 2023, describing the revision then expected);
 * - a test block 10.9 mm thick under the rear of the unit simulates carpet; without interlocks
 *   several drawers are opened at once; the 60 lb weight hangs on the front edge of a drawer (a test
 *   laboratory's explanation of F2057-23, "US Dresser ASTM F2057-23 Furniture Tip Over Test").
 * From memory, unverified: drawers open to their stops; the block tilts the unit about 1.5°. */
export const F2057_FILL_KG_PER_M3 = (8.5 * 0.45359237) / 0.3048 ** 3;
export const F2057_CARPET_BLOCK_M = 0.0109;

/** ASTM F3096-14: the tip restraint holds a 50 lbf pull; F3096-23 raised the test to 60 lb
 * (REFERENCES.md; unverified). */
export const F3096_14_PULL_N = 50 * LBF_N;
export const F3096_23_PULL_N = 60 * LBF_N;

/** EN 14749:2016 stability of domestic storage units ≥ 650 mm tall (from a test-lab report; clause
 * numbers unverified): units over 1000 mm, 350 N vertical plus 50 N outward horizontal; open and
 * unloaded, 100 N vertical overturning load. */
export const EN14749_MIN_HEIGHT_M = 0.65;
export const EN14749_TALL_HEIGHT_M = 1.0;
export const EN14749_VERTICAL_N = 350;
export const EN14749_HORIZONTAL_N = 50;
export const EN14749_OPEN_UNLOADED_VERTICAL_N = 100;

/** FEMA "Anchor Tall Bookcases and File Cabinets" (2008): L-brackets or screws through the back into
 * studs with at least 2" embedment; drywall alone pulls out; thin backs may not carry the load. */
export const FEMA_MIN_STUD_EMBEDMENT_M = 2 * 0.0254;

/** FEMA E-74 §6.5.2: bookshelves over 6 ft fall under ASCE/SEI 7 ch. 13 in seismic design
 * categories C–F. */
export const FEMA_E74_TALL_BOOKCASE_M = 6 * 0.3048;

/** Cases wider than 24" get at least two restraints into two different studs (common practice,
 * no source). */
export const TWO_RESTRAINTS_ABOVE_WIDTH_M = 0.6096;

/** CPSC counts 234 tip-over deaths Jan 2000 – Apr 2022, 199 of them children (REFERENCES.md). */
export const CPSC_TIPOVER_DEATHS = { deaths: 234, children: 199, period: 'Jan 2000 – Apr 2022' };
