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
}

export interface ShelfMaterial {
	id: string;
	name: string;
	kind: 'solid' | 'panel';
	/** modulus of elasticity in bending with the (face) grain along the span, Pa */
	modulusAlongPa: number;
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
	'derived: specific gravity (Wood Handbook Table 5-3a, 12% MC; from memory where marked) × 1.12 × 1000 kg/m³ (oven-dry weight plus 12% water)';
const SHEAR_RULE = 'G ≈ E/16, a common assumption for wood products (see REFERENCES.md)';
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
		modulusAcrossPa: null,
		ruptureAlongPa: ruptureKPa * 1000,
		ruptureAcrossPa: null,
		densityKgM3: densityFromSG(specificGravity),
		shearModulusPa: (modulusMPa * MPa) / 16, // G ≈ E/16, common assumption
		creep: CREEP_SOLID, // Eurocode 5 Table 3.2, solid timber
		thicknesses,
		sources: {
			...sources,
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: solid timber 0.60 / 0.80 / 2.00`,
			thicknesses: SOLID_STOCK
		}
	};
}

// --- solid wood -----------------------------------------------------------------------------

const HANDBOOK = { modulus: WOOD_HANDBOOK, rupture: WOOD_HANDBOOK, density: DENSITY_FROM_SG };

export const solidWoods: ShelfMaterial[] = [
	// Wood Handbook Table 5-3a: northern red oak MOE 12,500 MPa, MOR 99,000 kPa; SG 0.63 (from memory)
	solid('red-oak', 'Red oak (northern), solid', 12500, 99000, 0.63, HANDBOOK),
	// Wood Handbook Table 5-3a: white oak MOE 12,300 MPa, MOR 105,000 kPa; SG 0.68 (from memory)
	solid('white-oak', 'White oak, solid', 12300, 105000, 0.68, HANDBOOK),
	// Wood Handbook Table 5-3a: sugar (hard) maple MOE 12,600 MPa, MOR 109,000 kPa; SG 0.63 (from memory)
	solid('hard-maple', 'Hard maple (sugar maple), solid', 12600, 109000, 0.63, HANDBOOK),
	// Wood Handbook Table 5-3a: black cherry MOE 10,300 MPa, MOR 85,000 kPa; SG 0.50 (from memory)
	solid('cherry', 'Cherry (black cherry), solid', 10300, 85000, 0.5, HANDBOOK),
	// USDA FPL tech sheet, black walnut (dry): MOE 11.6 GPa, MOR 100.7 MPa, SG 0.55
	solid('walnut', 'Walnut (black walnut), solid', 11600, 100700, 0.55, {
		modulus: 'USDA FPL tech sheet, black walnut, dry: MOE 11.6 GPa',
		rupture: 'USDA FPL tech sheet, black walnut, dry: MOR 100.7 MPa',
		density: `${DENSITY_FROM_SG}; SG 0.55 from the same tech sheet`
	}),
	// Wood Handbook Table 5-3a: yellow-poplar MOE 10,900 MPa, MOR 70,000 kPa; SG 0.42 (from memory)
	solid('yellow-poplar', 'Yellow-poplar, solid', 10900, 70000, 0.42, HANDBOOK),
	// Wood Handbook Table 5-3a: white ash MOE 12,000 MPa, MOR 103,000 kPa (REFERENCES.md gives
	// 103,000–106,000; the lower is used); SG 0.60 (from memory)
	solid('ash', 'Ash (white ash), solid', 12000, 103000, 0.6, HANDBOOK),
	// Yellow birch MOE 13,900 MPa, MOR 114,000 kPa, SG 0.62: Wood Handbook Table 5-3a figures as
	// reprinted in a hardwood lumber seller's species sheet (secondary source)
	solid('birch', 'Birch (yellow birch), solid', 13900, 114000, 0.62, {
		modulus: `${WOOD_HANDBOOK} (yellow birch, read from a secondary reprint)`,
		rupture: `${WOOD_HANDBOOK} (yellow birch, read from a secondary reprint)`,
		density: `${DENSITY_FROM_SG}; SG 0.62 from the same reprint`
	}),
	// Wood Handbook Table 5-3a: coast Douglas-fir MOE 13,400 MPa, MOR 85,000 kPa; SG 0.48 (from memory)
	solid(
		'douglas-fir',
		'Douglas-fir (coast), solid',
		13400,
		85000,
		0.48,
		HANDBOOK,
		SOFTWOOD_BOARD_THICKNESSES
	),
	// Eastern white pine MOE 8,500 MPa, MOR 59,000 kPa, SG 0.35: Wood Handbook Table 5-3a (from memory)
	solid(
		'eastern-white-pine',
		'Eastern white pine, solid',
		8500,
		59000,
		0.35,
		{
			modulus: `${WOOD_HANDBOOK} (from memory)`,
			rupture: `${WOOD_HANDBOOK} (from memory)`,
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

// AWC ASD/LRFD Manual Table M9.2-1 (same data as the APA Panel Design Specification), EI per foot
// of width, strength axis parallel: 32/16 = 125,000; 40/20 = 250,000; 48/24 = 440,000 lb·in²/ft.
// Span ratings matched to 15/32", 19/32", 23/32" (from memory).
// Perpendicular, 48/24 5-ply: 91,500 lb·in²/ft (same table). For 32/16 and 40/20 the perpendicular
// value is derived from the parallel one by the APA Plyform Class I ratio of I (perpendicular /
// parallel: 1/2" 0.024/0.077, 5/8" 0.038/0.130; Peurifoy & Oberlender, Formwork for Concrete Structures).
const PLY_15_32 = 15 / 32;
const PLY_19_32 = 19 / 32;
const PLY_23_32 = 23 / 32;
const SOFTWOOD_PLY_THICKNESSES: StockThickness[] = [
	{
		label: '1/2" (15/32")',
		actualM: inches(PLY_15_32),
		modulusAlongPa: modulusFromEIPerFoot(125000, PLY_15_32),
		modulusAcrossPa: modulusFromEIPerFoot((125000 * 0.024) / 0.077, PLY_15_32)
	},
	{
		label: '5/8" (19/32")',
		actualM: inches(PLY_19_32),
		modulusAlongPa: modulusFromEIPerFoot(250000, PLY_19_32),
		modulusAcrossPa: modulusFromEIPerFoot((250000 * 0.038) / 0.13, PLY_19_32)
	},
	{
		label: '3/4" (23/32")',
		actualM: inches(PLY_23_32),
		modulusAlongPa: modulusFromEIPerFoot(440000, PLY_23_32),
		modulusAcrossPa: modulusFromEIPerFoot(91500, PLY_23_32)
	}
];
const SOFTWOOD_PLY_MODULUS = {
	along: SOFTWOOD_PLY_THICKNESSES[2].modulusAlongPa!,
	across: SOFTWOOD_PLY_THICKNESSES[2].modulusAcrossPa!
};
const PLY_STIFFNESS_SOURCE =
	'AWC ASD/LRFD Manual Table M9.2-1, EI per foot of width (32/16, 40/20, 48/24), divided by t³; perpendicular 1/2" and 5/8" derived with the APA Plyform Class I ratio of I';
const PLY_RUPTURE_SOURCE =
	'from memory: about 40 MPa along and 20 MPa across for sheathing-grade softwood plywood (approximate)';

export const plywoods: ShelfMaterial[] = [
	{
		id: 'softwood-plywood',
		name: 'Softwood plywood (sheathing grade)',
		kind: 'panel',
		modulusAlongPa: SOFTWOOD_PLY_MODULUS.along,
		modulusAcrossPa: SOFTWOOD_PLY_MODULUS.across,
		ruptureAlongPa: 40 * MPa, // from memory, approximate
		ruptureAcrossPa: 20 * MPa, // from memory, approximate
		densityKgM3: 500, // from memory: about 31 lb/ft³
		shearModulusPa: SOFTWOOD_PLY_MODULUS.along / 16, // G ≈ E/16, common assumption
		creep: CREEP_PLYWOOD_EXTERIOR, // Eurocode 5 Table 3.2, EN 636-3
		thicknesses: SOFTWOOD_PLY_THICKNESSES,
		sources: {
			modulus: PLY_STIFFNESS_SOURCE,
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
		modulusAcrossPa: SOFTWOOD_PLY_MODULUS.across,
		ruptureAlongPa: 40 * MPa, // from memory, approximate (as softwood plywood)
		ruptureAcrossPa: 20 * MPa, // from memory, approximate
		densityKgM3: 560, // from memory: plywood plus the resin-fibre overlay
		shearModulusPa: SOFTWOOD_PLY_MODULUS.along / 16, // G ≈ E/16, common assumption
		creep: CREEP_PLYWOOD_EXTERIOR, // Eurocode 5 Table 3.2, EN 636-3 (exterior glue)
		thicknesses: SOFTWOOD_PLY_THICKNESSES,
		sources: {
			modulus: `no separate table was found: treated as softwood plywood of the same construction (${PLY_STIFFNESS_SOURCE})`,
			rupture: PLY_RUPTURE_SOURCE,
			density: 'from memory: about 560 kg/m³',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: plywood EN 636-3 0.80 / 1.00 / 2.50`,
			thicknesses: 'common practice, no source: as softwood plywood'
		},
		note: 'The overlay adds little stiffness; the panel is computed as plywood of its construction.'
	},
	(() => {
		// Architectural Woodwork Standards (2009) §4.4.14.10.12: veneer-core (Douglas-fir) plywood
		// with hardwood veneer on two sides, MOE 1,800,000 psi.
		const along = 1.8e6 * PSI;
		// derived: across = along × APA Plyform Class I I-ratio for 3/4" (0.092 / 0.199)
		const across = (along * 0.092) / 0.199;
		return {
			id: 'hardwood-plywood-veneer-core',
			name: 'Hardwood plywood, veneer core',
			kind: 'panel',
			modulusAlongPa: along,
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
				modulus:
					'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §4.4.14.10.12: 1,800,000 psi; across derived with the APA Plyform Class I ratio of I for 3/4" (0.092/0.199)',
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
		// 0.082 of that across (Wood Handbook Table 5-1, E_T/E_L for northern red oak, from memory).
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
			modulusAcrossPa: across,
			ruptureAlongPa: 34.5 * MPa, // the core's (ANSI A208.2 grade 155, from memory); faces ignored
			ruptureAcrossPa: 34.5 * MPa,
			densityKgM3: 750, // from memory: as the MDF core
			shearModulusPa: core / 16, // G ≈ E/16 of the core, common assumption
			creep: CREEP_MDF_LA, // Eurocode 5 Table 3.2, MDF.LA: the core governs creep (own judgement)
			thicknesses: [stock('1/2"', 0.5), stock('3/4"', 0.75)],
			sources: {
				modulus:
					'derived: transformed section of an MDF core (ANSI A208.2 grade 155, 3,450 MPa, from memory) and two 0.6 mm red oak faces (Wood Handbook Table 5-3a; E_T/E_L 0.082 from Table 5-1, from memory)',
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
		modulusAcrossPa: 6200 * MPa, // from memory: same panel across the face grain
		ruptureAlongPa: 60 * MPa, // from memory, approximate
		ruptureAcrossPa: 45 * MPa, // from memory, approximate
		densityKgM3: 680, // from memory
		shearModulusPa: (8600 * MPa) / 16, // G ≈ E/16, common assumption
		creep: CREEP_PLYWOOD_HUMID, // Eurocode 5 Table 3.2, EN 636-2 (own judgement of the glue class)
		thicknesses: [stock('12 mm', 12 / 25.4), stock('15 mm', 15 / 25.4), stock('18 mm', 18 / 25.4)],
		sources: {
			modulus: 'from memory: about 8,600 MPa along and 6,200 MPa across for 18 mm (13 plies)',
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
	m: Omit<ShelfMaterial, 'kind' | 'modulusAcrossPa' | 'ruptureAcrossPa' | 'shearModulusPa'> & {
		shearSource?: string;
	}
): ShelfMaterial {
	const { shearSource: _s, ...rest } = m;
	return {
		...rest,
		kind: 'panel',
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
		densityKgM3: 740, // from memory: about 720–750 kg/m³
		creep: CREEP_MDF_LA, // Eurocode 5 Table 3.2, MDF.LA 2.25
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus: 'European MDF industry guide (mdf-info.eu), shelf examples: E = 2,500 N/mm²',
			rupture: 'IS 12406: MOR ≥ 28 N/mm² (minimum)',
			density: 'from memory: about 740 kg/m³',
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
		densityKgM3: 700, // from memory: ANSI A208.1 medium-density class about 640–800 kg/m³
		creep: CREEP_PARTICLEBOARD_P4, // Eurocode 5 Table 3.2, P4 2.25 (nearest EN 312 class; own judgement)
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus: 'ANSI A208.1 grade M-2: MOE 2,250 MPa (read from a secondary source)',
			rupture: 'ANSI A208.1 grade M-2: MOR 14.5 MPa (read from a secondary source)',
			density: 'from memory: about 700 kg/m³',
			shearModulus: SHEAR_RULE,
			creep: `${EC5}: particleboard P4 2.25 (nearest class; service class 1 only)`,
			thicknesses: PANEL_STOCK
		}
	}),
	isotropicPanel({
		id: 'particleboard-m3',
		name: 'Particleboard, grade M-3',
		modulusAlongPa: 2750 * MPa, // ANSI A208.1 grade M-3: about 2,750 MPa (from memory)
		ruptureAlongPa: 16.5 * MPa, // ANSI A208.1 grade M-3: about 16.5 MPa (from memory)
		densityKgM3: 720, // from memory
		creep: CREEP_PARTICLEBOARD_P4, // Eurocode 5 Table 3.2, P4 2.25 (own judgement)
		thicknesses: PANEL_THICKNESSES,
		sources: {
			modulus: 'ANSI A208.1 grade M-3: about 2,750 MPa (from memory)',
			rupture: 'ANSI A208.1 grade M-3: about 16.5 MPa (from memory)',
			density: 'from memory: about 720 kg/m³',
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
