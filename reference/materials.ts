/**
 * Shelf materials: stiffness, strength, density, shear modulus, creep and stocked thicknesses.
 * Every figure names its source beside it. "from memory" marks a value recalled rather than read
 * from a copy of the source; "common practice, no source" marks a trade habit; "derived" marks a
 * figure computed here from cited ones (the method is in the comment). All values SI:
 * Pa, kg/m³, m. Clear-wood figures are averages of small clear specimens: real boards vary.
 */

const MPa = 1e6;
const PSI = 6894.757293168; // 1 lbf/in² in Pa (exact from the 1959 inch and pound)
const INCH = 0.0254;

/** Eurocode 5 (EN 1995-1-1:2004) Table 3.2, k_def for service class 1 / 2 / 3 (null: not allowed). */
export type CreepClasses = readonly [number, number | null, number | null];

export interface StockThickness {
	/** how the trade names it, e.g. `3/4"` */
	label: string;
	/** what it measures, m */
	actualM: number;
	/** effective modulus for this thickness (plywood layups), Pa; else the material's */
	modulusAlongPa?: number;
	modulusAcrossPa?: number;
	/** plywood: the published stiffness across the strength axis for each construction, Pa; the
	 * engine does not know the ply count, so `modulusAcrossPa` is the lowest of these */
	modulusAcrossByPliesPa?: { plies: 3 | 4 | 5; pa: number }[];
}

export interface ShelfMaterial {
	id: string;
	name: string;
	kind: 'solid' | 'panel';
	/** modulus of elasticity in bending with the (face) grain along the span, Pa, as published */
	modulusAlongPa: number;
	/** the same free of shear deflection, Pa: what a model that adds shear deflection itself starts
	 * from. Clear-wood figures from a centre-loaded bending test include shear (Wood Handbook Table
	 * 5-3a footnote: about 10% higher without it); panel figures are used as published. */
	bendingOnlyModulusAlongPa: number;
	/** with the (face) grain across the span, Pa; null for solid wood (a board is not used so) */
	modulusAcrossPa: number | null;
	/** modulus of rupture along / across, Pa */
	ruptureAlongPa: number;
	ruptureAcrossPa: number | null;
	densityKgM3: number;
	shearModulusPa: number;
	creep: CreepClasses;
	thicknesses: StockThickness[];
	/** source of each figure, in the same words as the comments */
	sources: {
		modulus: string;
		/** how the bending-only modulus was found */
		bendingOnlyModulus: string;
		rupture: string;
		density: string;
		shearModulus: string;
		creep: string;
		thicknesses: string;
	};
	note?: string;
}

// --- shared sources -------------------------------------------------------------------------

const WOOD_HANDBOOK =
	'USDA FPL Wood Handbook (FPL-GTR-282, 2021), Table 5-3a, clear wood at 12% moisture content';
const DENSITY_FROM_SG =
	'derived: specific gravity (Wood Handbook Table 5-3a, 12% MC, read for each species in a stored reprint named in reference/stock-holding.ts) × 1.12 × 1000 kg/m³ (oven-dry weight plus 12% water)';
const SHEAR_RULE = 'G ≈ E/16, a common assumption for wood products (see REFERENCES.md)';

/** Wood Handbook Table 5-3a, footnote c to the modulus of elasticity: "measured from a simply
 * supported, center-loaded beam, on a span depth ratio of 14/1. To correct for shear deflection,
 * the modulus can be increased by 10%" (read in a stored hardwood-producer reprint of the table,
 * reprinted from the Hardwood Manufacturers Association). */
export const HANDBOOK_SHEAR_FREE_FACTOR = 1.1;
const SHEAR_FREE_SOURCE =
	'Wood Handbook Table 5-3a footnote c: the tabulated modulus comes from a centre-loaded beam at span–depth 14 and includes shear deflection; "to correct for shear deflection, the modulus can be increased by 10%" (read in a stored reprint of the table), so × 1.10';
/** Panels: the figure is used as published, and the engine adds shear deflection on top of it (an
 * overestimate of the sag where the published figure already includes shear: on the safe side). */
const PANEL_AS_PUBLISHED =
	'as published: no shear correction applied to a panel figure (errs on the safe side when the engine adds shear)';

const EC5 =
	'Eurocode 5 (EN 1995-1-1) Table 3.2, k_def; long-term sag = instant × (1 + k_def) (§2.3.2.2)';
const SOLID_STOCK =
	'common practice, no source: surfaced 4/4 at 3/4" and 13/16", 5/4 at 1" and 1-1/16", 8/4 at 1-3/4"';

/** Eurocode 5 Table 3.2: solid timber, service class 1 / 2 / 3. */
const CREEP_SOLID: CreepClasses = [0.6, 0.8, 2.0];
/** Eurocode 5 Table 3.2: plywood EN 636-3 (exterior), service class 1 / 2 / 3. */
const CREEP_PLYWOOD_EXTERIOR: CreepClasses = [0.8, 1.0, 2.5];
/** Eurocode 5 Table 3.2: plywood EN 636-2 (humid), service class 1 / 2. */
const CREEP_PLYWOOD_HUMID: CreepClasses = [0.8, 1.0, null];
/** Eurocode 5 Table 3.2: particleboard EN 312 P4, service class 1 only. */
const CREEP_PARTICLEBOARD_P4: CreepClasses = [2.25, null, null];
/** Eurocode 5 Table 3.2: MDF EN 622-5 MDF.LA, service class 1 only. */
const CREEP_MDF_LA: CreepClasses = [2.25, null, null];

const inches = (n: number) => n * INCH;
const stock = (label: string, actualIn: number): StockThickness => ({
	label,
	actualM: inches(actualIn)
});
const SOLID_THICKNESSES = [
	stock('3/4"', 0.75),
	stock('13/16"', 13 / 16),
	stock('1"', 1),
	stock('1-1/16"', 17 / 16),
	stock('1-3/4"', 1.75)
];
const SOFTWOOD_BOARD_THICKNESSES = [
	stock('3/4" (1x)', 0.75),
	stock('1" (5/4)', 1),
	stock('1-1/2" (2x)', 1.5)
];

/** Density at 12% MC from specific gravity (oven-dry weight, volume at 12% MC). */
const densityFromSG = (sg: number) => sg * 1.12 * 1000;

function solid(
	id: string,
	name: string,
	modulusMPa: number,
	ruptureKPa: number,
	specificGravity: number,
	sources: { modulus: string; rupture: string; density: string },
	thicknesses = SOLID_THICKNESSES
): ShelfMaterial {
	return {
		id,
		name,
		kind: 'solid',
		modulusAlongPa: modulusMPa * MPa,
		bendingOnlyModulusAlongPa: modulusMPa * MPa * HANDBOOK_SHEAR_FREE_FACTOR,
		modulusAcrossPa: null,
		ruptureAlongPa: ruptureKPa * 1000,
		ruptureAcrossPa: null,
		densityKgM3: densityFromSG(specificGravity),
		shearModulusPa: (modulusMPa * MPa) / 16, // G ≈ E/16, common assumption
		creep: CREEP_SOLID, // Eurocode 5 Table 3.2, solid timber
		thicknesses,
		sources: {
			...sources,
			bendingOnlyModulus: SHEAR_FREE_SOURCE,
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: solid timber 0.60 / 0.80 / 2.00`,
			thicknesses: SOLID_STOCK
		}
	};
}

// --- solid wood -----------------------------------------------------------------------------

const HANDBOOK = { modulus: WOOD_HANDBOOK, rupture: WOOD_HANDBOOK, density: DENSITY_FROM_SG };

export const solidWoods: ShelfMaterial[] = [
	// Wood Handbook Table 5-3a: northern red oak MOE 12,500 MPa, MOR 99,000 kPa; SG 0.63 (a stored reprint, see
	// reference/stock-holding.ts)
	solid('red-oak', 'Red oak (northern), solid', 12500, 99000, 0.63, HANDBOOK),
	// Wood Handbook Table 5-3a: white oak MOE 12,300 MPa, MOR 105,000 kPa; SG 0.68; MOE 1.78e6 psi,
	// MOR 15,200 psi and SG 0.68 read in a stored hardwood-seller reprint of the table
	solid('white-oak', 'White oak, solid', 12300, 105000, 0.68, HANDBOOK),
	// Wood Handbook Table 5-3a: sugar (hard) maple MOE 12,600 MPa, MOR 109,000 kPa; SG 0.63 (all three read
	// in a stored engineering-data reprint of the handbook)
	solid('hard-maple', 'Hard maple (sugar maple), solid', 12600, 109000, 0.63, HANDBOOK),
	// Wood Handbook Table 5-3a: black cherry MOE 10,300 MPa, MOR 85,000 kPa; SG 0.50 (MOE 1.49e6
	// psi and SG read in a stored reprint of the handbook's inch-pound table)
	solid('cherry', 'Cherry (black cherry), solid', 10300, 85000, 0.5, HANDBOOK),
	// USDA FPL tech sheet, black walnut (dry): MOE 11.6 GPa, MOR 100.7 MPa, SG 0.55
	solid('walnut', 'Walnut (black walnut), solid', 11600, 100700, 0.55, {
		modulus: 'USDA FPL tech sheet, black walnut, dry: MOE 11.6 GPa',
		rupture: 'USDA FPL tech sheet, black walnut, dry: MOR 100.7 MPa',
		density: `${DENSITY_FROM_SG}; SG 0.55 from the same tech sheet`
	}),
	// Wood Handbook Table 5-3a: yellow-poplar MOE 10,900 MPa, MOR 70,000 kPa; SG 0.42 (MOE 1.58e6
	// psi, MOR 10,100 psi, SG 0.42 read in a stored hardwood-seller reprint)
	solid('yellow-poplar', 'Yellow-poplar, solid', 10900, 70000, 0.42, HANDBOOK),
	// Wood Handbook Table 5-3a: white ash MOE 12,000 MPa, MOR 103,000 kPa (REFERENCES.md gives
	// 103,000–106,000; the lower is used); SG 0.60 and MOE 1.74e6 psi read in a stored reprint of
	// the handbook's inch-pound table
	solid('ash', 'Ash (white ash), solid', 12000, 103000, 0.6, HANDBOOK),
	// Yellow birch MOE 13,900 MPa, MOR 114,000 kPa, SG 0.62: Wood Handbook Table 5-3a figures as
	// reprinted in a hardwood lumber seller's species sheet (secondary source)
	solid('birch', 'Birch (yellow birch), solid', 13900, 114000, 0.62, {
		modulus: `${WOOD_HANDBOOK} (yellow birch, read from a secondary reprint)`,
		rupture: `${WOOD_HANDBOOK} (yellow birch, read from a secondary reprint)`,
		density: `${DENSITY_FROM_SG}; SG 0.62 from the same reprint`
	}),
	// Wood Handbook Table 5-3a: coast Douglas-fir MOE 13,400 MPa, MOR 85,000 kPa; SG 0.48 (all three
	// read in a stored university table citing the handbook: 0.48, 12,400 psi, 1.95e6 psi)
	solid(
		'douglas-fir',
		'Douglas-fir (coast), solid',
		13400,
		85000,
		0.48,
		HANDBOOK,
		SOFTWOOD_BOARD_THICKNESSES
	),
	// Eastern white pine MOE 8,500 MPa, MOR 59,000 kPa, SG 0.35: Wood Handbook Table 5-3a; a stored
	// materials datasheet for the species gives flexural modulus 8.30–8.56 GPa, MOR 59 MPa, 0.35
	solid(
		'eastern-white-pine',
		'Eastern white pine, solid',
		8500,
		59000,
		0.35,
		{
			modulus: `${WOOD_HANDBOOK}: 8,500 MPa (a stored species datasheet gives 8.30–8.56 GPa)`,
			rupture: `${WOOD_HANDBOOK}: 59,000 kPa (the same datasheet gives 59 MPa)`,
			density: `${DENSITY_FROM_SG}`
		},
		SOFTWOOD_BOARD_THICKNESSES
	)
];

// --- plywood --------------------------------------------------------------------------------

/** Effective modulus of a panel from its bending stiffness per foot of width: E = EI / (12" · t³/12). */
function modulusFromEIPerFoot(eiLbIn2PerFt: number, thicknessIn: number): number {
	return (eiLbIn2PerFt / thicknessIn ** 3) * PSI;
}

/**
 * Softwood plywood bending stiffness EI, lb·in²/ft of width, by span rating: AWC ASD/LRFD Manual
 * Table M9.2-1 (the same data as the APA Panel Design Specification's plywood stiffness table).
 * Parallel to the strength axis one figure; perpendicular to it one figure per construction, because
 * a 3-ply panel has far less wood across the strength axis than a 5-ply one. The APA table's footnote
 * (read in a stored summary of the design capacities): "5-ply applies to plywood with 5 or more
 * layers; for 5-ply/3-layer plywood, use values for 4-ply plywood".
 * The 48/24 row (440,000; 29,500 / 65,000 / 91,500) is the one REFERENCES.md read from a stored copy.
 * The 32/16 and 40/20 perpendicular figures are recalled (from memory); as a check, each 3-ply figure
 * is also worked out from its parallel figure with the 48/24 row's 3-ply share (29,500 / 440,000) and
 * the lower of the two is used. Span ratings matched to 15/32", 19/32", 23/32" (from memory).
 */
const PLY_ROWS = [
	{ label: '1/2" (15/32")', tIn: 15 / 32, parallel: 125000, perp: { 3: 8100, 4: 18000, 5: 25000 } },
	{
		label: '5/8" (19/32")',
		tIn: 19 / 32,
		parallel: 250000,
		perp: { 3: 18000, 4: 39500, 5: 56000 }
	},
	{ label: '3/4" (23/32")', tIn: 23 / 32, parallel: 440000, perp: { 3: 29500, 4: 65000, 5: 91500 } }
] as const;
/** 3-ply share of the parallel stiffness in the 48/24 row of Table M9.2-1 (29,500 / 440,000). */
export const PLY_THREE_PLY_SHARE_48_24 = 29500 / 440000;

const SOFTWOOD_PLY_THICKNESSES: StockThickness[] = PLY_ROWS.map((r) => {
	const threePly = Math.min(r.perp[3], r.parallel * PLY_THREE_PLY_SHARE_48_24);
	const byPlies = [
		{ plies: 3 as const, pa: modulusFromEIPerFoot(threePly, r.tIn) },
		{ plies: 4 as const, pa: modulusFromEIPerFoot(r.perp[4], r.tIn) },
		{ plies: 5 as const, pa: modulusFromEIPerFoot(r.perp[5], r.tIn) }
	];
	return {
		label: r.label,
		actualM: inches(r.tIn),
		modulusAlongPa: modulusFromEIPerFoot(r.parallel, r.tIn),
		// the ply count is not known: the lowest published construction (3-ply)
		modulusAcrossPa: Math.min(...byPlies.map((b) => b.pa)),
		modulusAcrossByPliesPa: byPlies
	};
});
/** Panel figures for a thickness off the stock list: the lowest of the stocked ones each way. */
const SOFTWOOD_PLY_MODULUS = {
	along: Math.min(...SOFTWOOD_PLY_THICKNESSES.map((t) => t.modulusAlongPa!)),
	across: Math.min(...SOFTWOOD_PLY_THICKNESSES.map((t) => t.modulusAcrossPa!))
};
const PLY_STIFFNESS_SOURCE =
	'AWC ASD/LRFD Manual Table M9.2-1 (APA Panel Design Specification data), EI per foot of width for span ratings 32/16, 40/20, 48/24, divided by t³; across the strength axis the 3-ply figure (the lowest construction: the ply count is not known); 48/24 row read from a stored copy, the 32/16 and 40/20 perpendicular figures from memory, checked against the 48/24 3-ply share and the lower used';
const PLY_RUPTURE_SOURCE =
	'from memory: about 40 MPa along and 20 MPa across for sheathing-grade softwood plywood (approximate)';

/**
 * Hardwood plywood, veneer core: a panel figure worked out here by the transformed section of its
 * plies, because the figure the Architectural Woodwork Standards give is not a panel property.
 *
 * What the standard says (re-read in a stored copy of AWS 1st ed. 2009, §4.4.14.10.12): "Veneer
 * core, (Douglas Fir) plywood, 1,800,000 MOE, with hardwood veneer on two sides" — the modulus of
 * clear wood along the grain (its §4.4.14.10.13 gives solid red oak 1,820,000), while §4.4.14.10.11
 * gives the same core without the hardwood faces 950,000. Two veneers under 1 mm thick cannot double
 * a panel's stiffness, and in a cross-banded panel the plies across the span carry next to nothing,
 * so the standard's figure is not used.
 *
 * Method (USDA FPL Research Note FPL-059, "Bending strength and stiffness of plywood", 1964: the
 * panel's stiffness is the sum of each ply's E·I about the panel's centre; a ply across the span
 * is given E = 0 here, a little below the Wood Handbook's E_T/E_L of about 0.05, from memory).
 * Plies along the span: Douglas-fir, the core named by the standard, 13,400 MPa (Wood Handbook
 * Table 5-3a, as published: shear is added by the engine on top, on the safe side).
 * Constructions considered, both 23/32" (the ply count of a panel is not known):
 *  - 7 plies: faces 1/42" (about 0.6 mm, from memory), five inner plies of equal thickness;
 *  - 5 plies of equal thickness.
 * Each way the lower of the two is used (7-ply along, 5-ply across).
 */
export interface Ply {
	/** thickness, in any unit shared by the stack */
	t: number;
	/** true where the ply's grain runs along the span */
	along: boolean;
}
/** Share of a solid panel's stiffness that a stack of plies keeps when only the plies along the
 * span carry bending (FPL-059 method with E = 0 across): Σ I of the along plies / (t³/12). */
export function plyStackStiffnessShare(plies: readonly Ply[]): number {
	const total = plies.reduce((a, p) => a + p.t, 0);
	let z = -total / 2;
	let sum = 0;
	for (const p of plies) {
		const top = z;
		const bottom = z + p.t;
		if (p.along) sum += (bottom ** 3 - top ** 3) / 3;
		z = bottom;
	}
	return sum / (total ** 3 / 12);
}
const flip = (plies: readonly Ply[]): Ply[] => plies.map((p) => ({ ...p, along: !p.along }));
const VENEER_CORE_T_IN = 23 / 32;
const FACE_IN = 1 / 42;
const innerSeven = (VENEER_CORE_T_IN - 2 * FACE_IN) / 5;
/** 7 plies: face, then alternating across / along, face. */
export const VENEER_CORE_SEVEN_PLY: Ply[] = [
	{ t: FACE_IN, along: true },
	...[false, true, false, true, false].map((along) => ({ t: innerSeven, along })),
	{ t: FACE_IN, along: true }
];
/** 5 equal plies: along, across, along, across, along. */
export const VENEER_CORE_FIVE_PLY: Ply[] = [true, false, true, false, true].map((along) => ({
	t: VENEER_CORE_T_IN / 5,
	along
}));
const VENEER_CORE_PLY_MODULUS = 13400 * MPa; // Wood Handbook Table 5-3a, coast Douglas-fir
export const VENEER_CORE_SHARE = {
	along: Math.min(
		plyStackStiffnessShare(VENEER_CORE_SEVEN_PLY),
		plyStackStiffnessShare(VENEER_CORE_FIVE_PLY)
	),
	across: Math.min(
		plyStackStiffnessShare(flip(VENEER_CORE_SEVEN_PLY)),
		plyStackStiffnessShare(flip(VENEER_CORE_FIVE_PLY))
	)
};

export const plywoods: ShelfMaterial[] = [
	{
		id: 'softwood-plywood',
		name: 'Softwood plywood (sheathing grade)',
		kind: 'panel',
		modulusAlongPa: SOFTWOOD_PLY_MODULUS.along,
		bendingOnlyModulusAlongPa: SOFTWOOD_PLY_MODULUS.along,
		modulusAcrossPa: SOFTWOOD_PLY_MODULUS.across,
		ruptureAlongPa: 40 * MPa, // from memory, approximate
		ruptureAcrossPa: 20 * MPa, // from memory, approximate
		densityKgM3: 500, // from memory: about 31 lb/ft³
		shearModulusPa: SOFTWOOD_PLY_MODULUS.along / 16, // G ≈ E/16, common assumption
		creep: CREEP_PLYWOOD_EXTERIOR, // Eurocode 5 Table 3.2, EN 636-3
		thicknesses: SOFTWOOD_PLY_THICKNESSES,
		sources: {
			modulus: PLY_STIFFNESS_SOURCE,
			bendingOnlyModulus:
				'AWC / APA panel EI is a bending stiffness; shear deflection is computed separately, as the engine does',
			rupture: PLY_RUPTURE_SOURCE,
			density: 'from memory: about 500 kg/m³ (31 lb/ft³)',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: plywood EN 636-3 0.80 / 1.00 / 2.50`,
			thicknesses:
				'common practice, no source: nominal 1/2", 5/8", 3/4" measure 15/32", 19/32", 23/32"'
		}
	},
	{
		id: 'mdo',
		name: 'MDO (medium density overlay plywood)',
		kind: 'panel',
		modulusAlongPa: SOFTWOOD_PLY_MODULUS.along,
		bendingOnlyModulusAlongPa: SOFTWOOD_PLY_MODULUS.along,
		modulusAcrossPa: SOFTWOOD_PLY_MODULUS.across,
		ruptureAlongPa: 40 * MPa, // from memory, approximate (as softwood plywood)
		ruptureAcrossPa: 20 * MPa, // from memory, approximate
		densityKgM3: 560, // from memory: plywood plus the resin-fibre overlay
		shearModulusPa: SOFTWOOD_PLY_MODULUS.along / 16, // G ≈ E/16, common assumption
		creep: CREEP_PLYWOOD_EXTERIOR, // Eurocode 5 Table 3.2, EN 636-3 (exterior glue)
		thicknesses: SOFTWOOD_PLY_THICKNESSES,
		sources: {
			modulus: `no separate table was found: treated as softwood plywood of the same construction (${PLY_STIFFNESS_SOURCE})`,
			bendingOnlyModulus: 'as softwood plywood: a bending stiffness, shear computed separately',
			rupture: PLY_RUPTURE_SOURCE,
			density: 'from memory: about 560 kg/m³',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: plywood EN 636-3 0.80 / 1.00 / 2.50`,
			thicknesses: 'common practice, no source: as softwood plywood'
		},
		note: 'The overlay adds little stiffness; the panel is computed as plywood of its construction.'
	},
	(() => {
		const along = VENEER_CORE_PLY_MODULUS * VENEER_CORE_SHARE.along;
		const across = VENEER_CORE_PLY_MODULUS * VENEER_CORE_SHARE.across;
		return {
			id: 'hardwood-plywood-veneer-core',
			name: 'Hardwood plywood, veneer core',
			kind: 'panel',
			modulusAlongPa: along,
			bendingOnlyModulusAlongPa: along,
			modulusAcrossPa: across,
			ruptureAlongPa: 45 * MPa, // from memory, approximate
			ruptureAcrossPa: 25 * MPa, // from memory, approximate
			densityKgM3: 600, // from memory
			shearModulusPa: along / 16, // G ≈ E/16, common assumption
			creep: CREEP_PLYWOOD_HUMID, // Eurocode 5 Table 3.2, EN 636-2 (interior-grade glue assumed)
			thicknesses: [
				stock('1/4" (7/32")', 7 / 32),
				stock('1/2" (15/32")', 15 / 32),
				stock('3/4" (23/32")', 23 / 32),
				stock('3/4" (full)', 0.75),
				stock('1"', 1)
			],
			sources: {
				modulus: `derived: transformed section of the plies (USDA FPL Research Note FPL-059 method), plies along the span Douglas-fir 13,400 MPa (Wood Handbook Table 5-3a), plies across taken as carrying nothing; the lower of a 7-ply (1/42" faces) and a 5-ply (equal plies) 23/32" panel each way: ${(100 * VENEER_CORE_SHARE.along).toFixed(0)}% along, ${(100 * VENEER_CORE_SHARE.across).toFixed(0)}% across. The Architectural Woodwork Standards (2009) §4.4.14.10.12 figure of 1,800,000 psi is the clear-wood modulus, not a panel figure, and is not used`,
				bendingOnlyModulus: PANEL_AS_PUBLISHED,
				rupture: 'from memory: about 45 MPa along, 25 MPa across (approximate)',
				density: 'from memory: about 600 kg/m³',
				shearModulus: SHEAR_RULE,
				creep: `${EC5}: plywood EN 636-2 0.80 / 1.00`,
				thicknesses:
					'common practice, no source: nominal 1/4", 1/2", 3/4" often 7/32", 15/32", 23/32"'
			}
		} satisfies ShelfMaterial;
	})(),
	(() => {
		// derived by the transformed-section method: a core with a hardwood veneer on each face.
		// Core: MDF of ANSI A208.2 grade 155, 3,450 MPa (from memory). Faces: 0.6 mm veneer (about
		// 1/42", from memory) of red oak, 12,500 MPa along (Wood Handbook Table 5-3a) and about
		// 0.082 of that across (Wood Handbook Table 5-1, E_T/E_L of the red oaks, read in a stored
		// engineering-data reprint of the handbook).
		const t = inches(0.75);
		const face = 0.0006;
		const coreShare = ((t - 2 * face) / t) ** 3;
		const core = 3450 * MPa;
		const along = core * coreShare + 12500 * MPa * (1 - coreShare);
		const across = core * coreShare + 12500 * 0.082 * MPa * (1 - coreShare);
		return {
			id: 'hardwood-plywood-mdf-core',
			name: 'Hardwood plywood, MDF core',
			kind: 'panel',
			modulusAlongPa: along,
			bendingOnlyModulusAlongPa: along,
			modulusAcrossPa: across,
			ruptureAlongPa: 34.5 * MPa, // the core's (ANSI A208.2 grade 155, from memory); faces ignored
			ruptureAcrossPa: 34.5 * MPa,
			densityKgM3: 750, // from memory: as the MDF core
			shearModulusPa: core / 16, // G ≈ E/16 of the core, common assumption
			creep: CREEP_MDF_LA, // Eurocode 5 Table 3.2, MDF.LA: the core governs creep (own judgement)
			thicknesses: [stock('1/2"', 0.5), stock('3/4"', 0.75)],
			sources: {
				modulus:
					'derived: transformed section of an MDF core (ANSI A208.2 grade 155, 3,450 MPa, from memory) and two 0.6 mm red oak faces (Wood Handbook Table 5-3a; E_T/E_L 0.082 from Table 5-1, read in a stored reprint)',
				bendingOnlyModulus: PANEL_AS_PUBLISHED,
				rupture: 'the MDF core alone: ANSI A208.2 grade 155, 34.5 MPa (from memory)',
				density: 'from memory: as MDF, about 750 kg/m³',
				shearModulus: `${SHEAR_RULE}, of the core`,
				creep: `${EC5}: MDF.LA 2.25 (the core governs; own judgement)`,
				thicknesses: 'common practice, no source'
			}
		} satisfies ShelfMaterial;
	})(),
	{
		id: 'birch-multiply',
		name: 'Birch multi-ply (all-birch plywood, many thin plies)',
		kind: 'panel',
		modulusAlongPa: 8600 * MPa, // from memory: 18 mm, 13 plies, bending with the face grain
		bendingOnlyModulusAlongPa: 8600 * MPa,
		modulusAcrossPa: 6200 * MPa, // from memory: same panel across the face grain
		ruptureAlongPa: 60 * MPa, // from memory, approximate
		ruptureAcrossPa: 45 * MPa, // from memory, approximate
		densityKgM3: 680, // from memory
		shearModulusPa: (8600 * MPa) / 16, // G ≈ E/16, common assumption
		creep: CREEP_PLYWOOD_HUMID, // Eurocode 5 Table 3.2, EN 636-2 (own judgement of the glue class)
		thicknesses: [stock('12 mm', 12 / 25.4), stock('15 mm', 15 / 25.4), stock('18 mm', 18 / 25.4)],
		sources: {
			modulus: 'from memory: about 8,600 MPa along and 6,200 MPa across for 18 mm (13 plies)',
			bendingOnlyModulus: PANEL_AS_PUBLISHED,
			rupture: 'from memory: about 60 MPa along, 45 MPa across (approximate)',
			density: 'from memory: about 680 kg/m³',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: plywood EN 636-2 0.80 / 1.00`,
			thicknesses: 'common practice, no source: 12, 15, 18 mm'
		}
	}
];

// --- fibre and particle panels ---------------------------------------------------------------

function isotropicPanel(
	m: Omit<
		ShelfMaterial,
		| 'kind'
		| 'modulusAcrossPa'
		| 'ruptureAcrossPa'
		| 'shearModulusPa'
		| 'bendingOnlyModulusAlongPa'
		| 'sources'
	> & {
		sources: Omit<ShelfMaterial['sources'], 'bendingOnlyModulus'>;
	}
): ShelfMaterial {
	return {
		...m,
		sources: { ...m.sources, bendingOnlyModulus: PANEL_AS_PUBLISHED },
		kind: 'panel',
		bendingOnlyModulusAlongPa: m.modulusAlongPa,
		modulusAcrossPa: m.modulusAlongPa, // no grain: the same both ways
		ruptureAcrossPa: m.ruptureAlongPa,
		shearModulusPa: m.modulusAlongPa / 16 // G ≈ E/16, common assumption
	};
}

const PANEL_STOCK = 'common practice, no source: 1/2", 5/8", 3/4", 1" (actual as named)';
const PANEL_THICKNESSES = [
	stock('1/2"', 0.5),
	stock('5/8"', 0.625),
	stock('3/4"', 0.75),
	stock('1"', 1)
];

export const panels: ShelfMaterial[] = [
	isotropicPanel({
		id: 'mdf',
		name: 'MDF (medium density fibreboard), general grade',
		modulusAlongPa: 2500 * MPa, // European MDF industry guide (mdf-info.eu), shelf examples: 2,500 N/mm²
		ruptureAlongPa: 28 * MPa, // IS 12406: MOR at least 28 N/mm² (a minimum, not an average)
		densityKgM3: 740, // a stored IS 12406 board datasheet: 680–720 kg/m³ at 17–18 mm; the heavier kept
		creep: CREEP_MDF_LA, // Eurocode 5 Table 3.2, MDF.LA 2.25
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus: 'European MDF industry guide (mdf-info.eu), shelf examples: E = 2,500 N/mm²',
			rupture:
				'IS 12406: MOR ≥ 28 N/mm² up to 20 mm (minimum; read in a stored board datasheet quoting the standard, which also gives MOE ≥ 2,800 N/mm²)',
			density:
				'740 kg/m³: a stored IS 12406 board datasheet gives 680–720 kg/m³ for 17–18 mm boards; the heavier figure is kept (more self-weight errs on the safe side)',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: MDF.LA 2.25 (service class 1 only)`,
			thicknesses: PANEL_STOCK
		}
	}),
	isotropicPanel({
		id: 'mdf-high-density',
		name: 'MDF, high-density grade',
		modulusAlongPa: 3450 * MPa, // ANSI A208.2 grade 155: about 3,450 MPa (from memory)
		ruptureAlongPa: 34.5 * MPa, // ANSI A208.2 grade 155: about 34.5 MPa (from memory)
		densityKgM3: 850, // from memory
		creep: CREEP_MDF_LA, // Eurocode 5 Table 3.2, MDF.LA 2.25
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus: 'ANSI A208.2 grade 155: about 3,450 MPa (from memory)',
			rupture: 'ANSI A208.2 grade 155: about 34.5 MPa (from memory)',
			density: 'from memory: about 850 kg/m³',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: MDF.LA 2.25 (service class 1 only)`,
			thicknesses: PANEL_STOCK
		}
	}),
	isotropicPanel({
		id: 'particleboard-m2',
		name: 'Particleboard, grade M-2',
		modulusAlongPa: 2250 * MPa, // ANSI A208.1 grade M-2: MOE 2,250 MPa (secondary source)
		ruptureAlongPa: 14.5 * MPa, // ANSI A208.1 grade M-2: MOR 14.5 MPa (secondary source)
		densityKgM3: 700, // ANSI A208.1 "M" (medium density) 37–50 lb/ft³ (590–800 kg/m³), read in a stored trade summary
		creep: CREEP_PARTICLEBOARD_P4, // Eurocode 5 Table 3.2, P4 2.25 (nearest EN 312 class; own judgement)
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus: 'ANSI A208.1 grade M-2: MOE 2,250 MPa (read from a secondary source)',
			rupture: 'ANSI A208.1 grade M-2: MOR 14.5 MPa (read from a secondary source)',
			density:
				'700 kg/m³, inside the ANSI A208.1 medium-density class of 37–50 lb/ft³ (590–800 kg/m³; read in a stored trade summary)',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: particleboard P4 2.25 (nearest class; service class 1 only)`,
			thicknesses: PANEL_STOCK
		}
	}),
	isotropicPanel({
		id: 'particleboard-m3',
		name: 'Particleboard, grade M-3',
		// ANSI A208.1 grade M-3, recalled as 2,750 MPa and 16.5 MPa; a stored trade summary gives M-3 as
		// 22% stiffer and 13.7% stronger than M-2 (2,250 × 1.22 = 2,745; 14.5 × 1.137 = 16.5): the
		// lower stiffness, 2,745 MPa, is used
		modulusAlongPa: 2745 * MPa,
		ruptureAlongPa: 16.5 * MPa,
		densityKgM3: 720, // inside the A208.1 medium-density class (see M-2)
		creep: CREEP_PARTICLEBOARD_P4, // Eurocode 5 Table 3.2, P4 2.25 (own judgement)
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus:
				'ANSI A208.1 grade M-3: 2,745 MPa, M-2 (2,250 MPa, secondary source) × 1.22, the ratio a stored trade summary gives between the grades',
			rupture:
				'ANSI A208.1 grade M-3: 16.5 MPa, M-2 (14.5 MPa, secondary source) × 1.137, the ratio a stored trade summary gives between the grades',
			density:
				'720 kg/m³, inside the ANSI A208.1 medium-density class of 37–50 lb/ft³ (590–800 kg/m³; read in a stored trade summary)',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: particleboard P4 2.25 (nearest class; service class 1 only)`,
			thicknesses: PANEL_STOCK
		}
	}),
	isotropicPanel({
		id: 'melamine-particleboard',
		name: 'Melamine-faced particleboard',
		modulusAlongPa: 2250 * MPa, // as its core, particleboard M-2 (secondary source); the paper faces add little
		ruptureAlongPa: 14.5 * MPa, // as its core, particleboard M-2 (secondary source)
		densityKgM3: 720, // from memory
		creep: CREEP_PARTICLEBOARD_P4, // Eurocode 5 Table 3.2, P4 2.25 (own judgement)
		thicknesses: [stock('5/8"', 0.625), stock('3/4"', 0.75), stock('1"', 1)],
		sources: {
			modulus:
				'as its particleboard core, ANSI A208.1 grade M-2: 2,250 MPa (secondary source); the thin decor faces are ignored',
			rupture: 'as its core, ANSI A208.1 grade M-2: 14.5 MPa (secondary source)',
			density: 'from memory: about 720 kg/m³',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: particleboard P4 2.25 (service class 1 only)`,
			thicknesses: 'common practice, no source: 5/8", 3/4", 1"'
		}
	})
];

export const materials: ShelfMaterial[] = [...solidWoods, ...plywoods, ...panels];

export const materialIds = materials.map((m) => m.id);

export function findMaterial(id: string): ShelfMaterial | undefined {
	return materials.find((m) => m.id === id);
}

/** Default creep factor for a material given only by its figures: 2.0, the NDS §3.5.2 long-term
 * factor for unseasoned lumber and wood structural panels in dry service (from memory); cautious. */
export const CUSTOM_CREEP_FACTOR = 2.0;

/** Architectural Woodwork Standards (2009) §1.2.21: 50 lb/ft² for school, hospital and library
 * shelving, 40 lb/ft² for all other shelving, never more than 200 lb on one shelf. */
export const AWS_DESIGN_LOAD_LIBRARY_PSF = 50;
export const AWS_DESIGN_LOAD_GENERAL_PSF = 40;
export const AWS_MAX_LOAD_PER_SHELF_LB = 200;
