/**
 * How well each stock holds fasteners: the figures the joinery engine needs that the shelf materials
 * do not carry (specific gravity for the NDS equations, panel screw-holding, bearing across the grain).
 * Every figure names its source; "from memory" marks a figure recalled rather than read from a copy.
 */

export type StockKind = 'hardwood' | 'softwood' | 'plywood' | 'mdf' | 'particleboard';

export interface StockHolding {
	id: string;
	name: string;
	kind: StockKind;
	/** specific gravity used in the NDS / Wood Handbook screw equations */
	specificGravity: number;
	specificGravitySource: string;
	/** panels: minimum screw-holding from the panel standard, N (ASTM D1037 test screw) */
	screwHoldingFaceN?: number;
	screwHoldingEdgeN?: number;
	screwHoldingSource?: string;
	/** solid wood: compression perpendicular to grain, fibre stress at proportional limit, Pa */
	compressionPerpPa?: number;
	compressionPerpSource?: string;
}

/**
 * Wood Handbook Table 5-3a (12% moisture content): specific gravity and compression perpendicular to
 * grain (fibre stress at proportional limit). These specific gravities sit on the 12% volume basis,
 * a little below the oven-dry basis of NDS Table 12.3.3A, so they err on the safe side.
 * Checked against stored reprints of the handbook's figures (each named below); where a reprint gave
 * a lower compression figure than the one recalled, the lower is used. Figures no stored copy
 * confirmed say "from memory".
 */
const WH = 'Wood Handbook Table 5-3a, 12% MC';
const REPRINT_US =
	'a stored reprint of the Wood Handbook inch-pound table (species strength properties)';
const REPRINT_AHEC =
	'a stored hardwood-lumber seller reprint of the American hardwood species table';
const REPRINT_DB = 'a stored engineering-data reprint of the Wood Handbook (sugar maple, 12%)';
const PSI_PA = 6894.757293168;

/** ASTM D1037 screw-withdrawal test: #10 type AB screw driven 17 mm (from memory). */
export const PANEL_TEST_SCREW_DIAMETER_IN = 0.19;
export const PANEL_TEST_PENETRATION_IN = 0.67;

/** NDS 2018 Table 12.3.3B: plywood specific gravity, Structural I 0.50, all other grades 0.42
 * (from memory). */
const NDS_PLY = 'NDS 2018 Table 12.3.3B (from memory)';

/** Panel screw-holding figures a stored copy bears out. A stored trade summary gives ANSI A208.1
 * M-3 as 9.8% (face) and 11.4% (edge) above M-2, as 1,100 / 1,000 N are above 1,000 / 900 N; the
 * M-2 figures themselves are recalled. */
const HOLDING_CHECK: Record<string, string> = {
	'particleboard-m3':
		'from memory; the step from M-2 (+9.8% face, +11.4% edge) read in a stored trade summary'
};

export const STOCK_HOLDING: StockHolding[] = [
	solid('red-oak', 'Northern red oak', 'hardwood', 0.63, 7.0e6, {
		g: `${WH}: SG 0.63, read in ${REPRINT_AHEC} (12% m.c.: 0.63; MOR 99,000 kPa; MOE 12,500 MPa)`,
		c: `${WH}: 7.0 MPa (from memory)`
	}),
	solid('white-oak', 'White oak', 'hardwood', 0.68, 1070 * PSI_PA, {
		g: `${WH}: SG 0.68, read in ${REPRINT_AHEC} (green 0.60, 12% 0.68)`,
		c: `${WH}: 1,070 psi (7.38 MPa), read in the same reprint`
	}),
	solid('hard-maple', 'Hard (sugar) maple', 'hardwood', 0.63, 10.1e6, {
		g: `${WH}: SG 0.63, read in ${REPRINT_DB}`,
		c: `${WH}: 10,100 kPa, read in ${REPRINT_DB}`
	}),
	solid('cherry', 'Black cherry', 'hardwood', 0.5, 690 * PSI_PA, {
		g: `${WH}: SG 0.50, read in ${REPRINT_US}`,
		c: `${WH}: 690 psi (4.76 MPa), read in ${REPRINT_US}`
	}),
	solid('walnut', 'Black walnut', 'hardwood', 0.55, 7.0e6, {
		g: `${WH}: SG 0.55, read in ${REPRINT_AHEC} (12% m.c.)`,
		c: `${WH}: 7.0 MPa (from memory)`
	}),
	solid('ash', 'White ash', 'hardwood', 0.6, 1160 * PSI_PA, {
		g: `${WH}: SG 0.60, read in ${REPRINT_US}`,
		c: `${WH}: 1,160 psi (8.0 MPa), read in ${REPRINT_US}`
	}),
	solid('birch', 'Yellow birch', 'hardwood', 0.62, 970 * PSI_PA, {
		g: `${WH}: SG 0.62, read in ${REPRINT_US}`,
		c: `${WH}: 970 psi (6.69 MPa), read in ${REPRINT_US}`
	}),
	solid('yellow-poplar', 'Yellow-poplar', 'hardwood', 0.42, 500 * PSI_PA, {
		g: `${WH}: SG 0.42, read in ${REPRINT_AHEC} (green 0.40, 12% 0.42)`,
		c: `${WH}: 500 psi (3.45 MPa), read in the same reprint`
	}),
	solid('douglas-fir', 'Douglas-fir (coast)', 'softwood', 0.48, 5.5e6, {
		g: `${WH}: SG 0.48, read in a stored university wood-products table (Oregon State University, physical properties at 12% MC, citing the Wood Handbook)`,
		c: `${WH}: 5.5 MPa (from memory)`
	}),
	solid('eastern-white-pine', 'Eastern white pine', 'softwood', 0.35, 3.0e6, {
		g: `${WH}: SG 0.35, read in a stored materials datasheet (American eastern white pine, air dry 0.35)`,
		c: `${WH}: 3.0 MPa (from memory); the same datasheet gives 3.5 MPa, the lower is kept`
	}),
	{
		id: 'softwood-plywood',
		name: 'Softwood plywood',
		kind: 'plywood',
		specificGravity: 0.42,
		specificGravitySource: NDS_PLY + ', grades other than Structural I'
	},
	{
		id: 'hardwood-plywood-veneer-core',
		name: 'Hardwood plywood, veneer core',
		kind: 'plywood',
		specificGravity: 0.42,
		specificGravitySource: NDS_PLY + ', grades other than Structural I'
	},
	{
		id: 'birch-multiply',
		name: 'Birch multi-ply',
		kind: 'plywood',
		specificGravity: 0.5,
		specificGravitySource: NDS_PLY + ', Structural I, taken for all-hardwood-veneer panels'
	},
	{
		id: 'mdo',
		name: 'MDO (medium density overlay) plywood',
		kind: 'plywood',
		specificGravity: 0.42,
		specificGravitySource: NDS_PLY + '; MDO treated as plywood of its construction'
	},
	panel(
		'particleboard-m2',
		'Particleboard, grade M-2',
		'particleboard',
		1000,
		900,
		'ANSI A208.1 M-2'
	),
	panel(
		'particleboard-m3',
		'Particleboard, grade M-3',
		'particleboard',
		1100,
		1000,
		'ANSI A208.1 M-3'
	),
	panel(
		'melamine-particleboard',
		'Melamine-faced particleboard',
		'particleboard',
		1000,
		900,
		'ANSI A208.1 M-2 core'
	),
	panel('mdf', 'MDF', 'mdf', 1300, 1100, 'ANSI A208.2 grade 130'),
	panel('mdf-high-density', 'MDF, high density', 'mdf', 1500, 1350, 'ANSI A208.2 grade 155'),
	panel(
		'hardwood-plywood-mdf-core',
		'Hardwood plywood, MDF core',
		'mdf',
		1300,
		1100,
		'ANSI A208.2 grade 130, for the core'
	)
];

function solid(
	id: string,
	name: string,
	kind: StockKind,
	g: number,
	cPerpPa: number,
	source: { g: string; c: string }
): StockHolding {
	return {
		id,
		name,
		kind,
		specificGravity: g,
		specificGravitySource: source.g,
		compressionPerpPa: cPerpPa,
		compressionPerpSource: source.c
	};
}

/**
 * Panels: the standard gives a minimum screw-holding, not a specific gravity. For the NDS lateral
 * equations an equivalent G is back-calculated from the face figure through the Wood Handbook
 * ultimate withdrawal p = 15,700·G²·D·L (a method of this tool, stated in each result).
 */
function panel(
	id: string,
	name: string,
	kind: StockKind,
	faceN: number,
	edgeN: number,
	standard: string
): StockHolding {
	const faceLb = faceN / 4.4482216;
	const g = Math.sqrt(faceLb / (15700 * PANEL_TEST_SCREW_DIAMETER_IN * PANEL_TEST_PENETRATION_IN));
	return {
		id,
		name,
		kind,
		specificGravity: g,
		specificGravitySource: `equivalent G back-calculated from the ${standard} face screw-holding (${faceN} N) through the Wood Handbook withdrawal equation`,
		screwHoldingFaceN: faceN,
		screwHoldingEdgeN: edgeN,
		screwHoldingSource: `${standard} minimum screw-holding, face ${faceN} N, edge ${edgeN} N (${HOLDING_CHECK[id] ?? 'from memory'})`
	};
}

export function findStockHolding(id: string): StockHolding | undefined {
	return STOCK_HOLDING.find((s) => s.id === id);
}
