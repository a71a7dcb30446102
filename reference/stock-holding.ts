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
}

/** Wood Handbook (FPL-GTR-282, 2021) Table 5-3a: specific gravity at 12% moisture content and
 * compression perpendicular to grain (kPa, proportional limit), both from memory. These specific
 * gravities sit on the 12% volume basis, a little below the oven-dry basis of NDS Table 12.3.3A, so
 * they err on the safe side. */
const WH = 'Wood Handbook FPL-GTR-282 Table 5-3a, 12% MC (from memory)';

/** ASTM D1037 screw-withdrawal test: #10 type AB screw driven 17 mm (from memory). */
export const PANEL_TEST_SCREW_DIAMETER_IN = 0.19;
export const PANEL_TEST_PENETRATION_IN = 0.67;

/** NDS 2018 Table 12.3.3B: plywood specific gravity, Structural I 0.50, all other grades 0.42
 * (from memory). */
const NDS_PLY = 'NDS 2018 Table 12.3.3B (from memory)';

export const STOCK_HOLDING: StockHolding[] = [
	solid('red-oak', 'Northern red oak', 'hardwood', 0.63, 7.0e6),
	solid('white-oak', 'White oak', 'hardwood', 0.68, 7.4e6),
	solid('hard-maple', 'Hard (sugar) maple', 'hardwood', 0.63, 10.1e6),
	solid('cherry', 'Black cherry', 'hardwood', 0.5, 4.8e6),
	solid('walnut', 'Black walnut', 'hardwood', 0.55, 7.0e6),
	solid('ash', 'White ash', 'hardwood', 0.6, 8.0e6),
	solid('birch', 'Yellow birch', 'hardwood', 0.62, 6.7e6),
	solid('yellow-poplar', 'Yellow-poplar', 'hardwood', 0.42, 3.4e6),
	solid('douglas-fir', 'Douglas-fir (coast)', 'softwood', 0.48, 5.5e6),
	solid('eastern-white-pine', 'Eastern white pine', 'softwood', 0.35, 3.0e6),
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
	cPerpPa: number
): StockHolding {
	return {
		id,
		name,
		kind,
		specificGravity: g,
		specificGravitySource: WH,
		compressionPerpPa: cPerpPa
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
		screwHoldingSource: `${standard} minimum screw-holding, face ${faceN} N, edge ${edgeN} N (from memory)`
	};
}

export function findStockHolding(id: string): StockHolding | undefined {
	return STOCK_HOLDING.find((s) => s.id === id);
}
