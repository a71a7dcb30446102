/**
 * Tip-over of a case standing on the floor. Coordinates: x from the case front towards the wall,
 * z up from the floor; the case tips forward about its front support line (the front feet or plinth,
 * `base.setbackM` behind the front face). SI units throughout.
 */

/** A part of the case whose weight counts: by its mass, or by size and density. */
interface WeighedPart {
	name?: string;
	massKg?: number;
	/** with densityKgPerM3: the panel's three dimensions */
	lengthM?: number;
	widthM?: number;
	thicknessM?: number;
	densityKgPerM3?: number;
	centreHeightM: number;
	centreFromFrontM: number;
}

export type Construction =
	{ massKg: number; centreHeightM?: number; centreFromFrontM?: number } | { parts: WeighedPart[] };

interface ShelfContents {
	massKg: number;
	/** height of the shelf surface above the floor */
	heightM: number;
	/** height of the items themselves; their centre sits half of it above the shelf (default 0) */
	itemHeightM?: number;
	/** default: the middle of the case depth */
	centreFromFrontM?: number;
}

export interface Drawer {
	/** height of the drawer's bottom above the floor */
	heightM: number;
	massKg: number;
	contentsKg?: number;
	/** how far it opens beyond the case front (default: 2/3 of the case depth) */
	extensionM?: number;
	/** its centre (box and front) behind the case front when shut (default: half the case depth) */
	centreFromFrontM?: number;
}

interface Door {
	massKg: number;
	widthM: number;
	centreHeightM: number;
}

export type AnchorKind = 'none' | 'strap' | 'bracket' | 'screws-through-back';

interface Anchoring {
	kind: AnchorKind;
	/** the restraint's height above the floor (default: the case top) */
	heightM?: number;
	intoStuds?: boolean;
}

export interface StabilityRequest {
	heightM: number;
	widthM: number;
	depthM: number;
	construction: Construction;
	contents?: ShelfContents[];
	drawers?: Drawer[];
	doors?: Door[];
	/** the front support line behind the case front (a set-back plinth or feet), m */
	base?: { setbackM?: number };
	/** forward tilt of the floor or a thick carpet, degrees */
	floorTiltDeg?: number;
	anchoring?: Anchoring;
	/** the site is in a seismic region (FEMA E-74) */
	seismicRegion?: boolean;
}

interface CentreOfGravity {
	massKg: number;
	heightM: number;
	fromFrontM: number;
}

export interface FrontEdgeLoad {
	where: string;
	heightM: number;
	/** how far in front of the tipping line the load sits, m */
	leverM: number;
	/** the vertical load on that front edge that tips the case, empty and loaded; null where a load
	 * there cannot tip it (it sits behind the tipping line) */
	tipLoadEmptyN: number | null;
	tipLoadLoadedN: number | null;
	/** the lesser tip load over the ASTM F2057-23 test weight (60 lb) */
	marginToF2057: number | null;
	passF2057: boolean;
}

export interface StandardComparison {
	name: string;
	applies: boolean;
	note: string;
	/** restoring moment over the moment of the test forces (≥ 1 stays upright); null where the test
	 * forces have no lever to tip it */
	margin: number | null;
	pass: boolean;
}

export interface StabilityResult {
	estimate: true;
	centreOfGravity: { empty: CentreOfGravity; loaded: CentreOfGravity };
	/** horizontal force at the top front edge that tips the case, drawers shut */
	tipForceAtTopN: { empty: number; loaded: number; contentsLow: number; contentsHigh: number };
	/** steady sideways acceleration (in g) that tips it: why heavy items belong low */
	tipAccelerationG: { empty: number; loaded: number; contentsLow: number; contentsHigh: number };
	tipsUnaided: boolean;
	frontEdgeLoads: FrontEdgeLoad[];
	standards: StandardComparison[];
	restraint: {
		/** pull the wall restraint must hold in the worst case checked (never negative) */
		requiredN: number;
		scenario: string;
		f3096TestN: { edition2014: number; edition2023: number };
		/** at least the required pull and the current F3096 test pull */
		recommendedRatingN: number;
		anchored: boolean;
		adequate: boolean;
	};
	anchoring: { required: boolean; recommendations: string[] };
	warnings: string[];
	cautions: string[];
	sources: string[];
}
