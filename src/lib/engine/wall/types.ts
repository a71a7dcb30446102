/**
 * A wall: several cases standing side by side, left to right, each with its own sizes, shelves,
 * vertical dividers, drawers and doors. SI numbers throughout (metres, newtons); the schema in
 * src/lib/schemas/wall.ts parses what a user types into this shape.
 */
import type { CaseDesign, CaseJoint, CaseMargin, CaseShelf, CaseSuggestion } from '../case/types';
import type { StabilityResult } from '../stability/types';
import type { DividerCheck } from './dividers';

export type Material = CaseDesign['sides']['material'];
export type CaseJointKind = CaseDesign['shelves'][number]['joint'];
type CaseShelfDesign = CaseDesign['shelves'][number];

/** A shelf of a wall case: in one bay between a side and a divider (or two dividers), or across
 * the whole case when `bay` is left out (resting on any divider whose top meets its underside). */
interface WallShelfDesign extends CaseShelfDesign {
	bay?: number;
}

/** A vertical panel inside the case, between the bottom and the top unless told otherwise. */
export interface DividerDesign {
	name?: string;
	/** its centre, from the case's outside left face */
	at: number;
	thickness?: number;
	material?: Material;
	/** height of its lower end above the floor (default: on the bottom panel) */
	bottom?: number;
	/** height of its upper end (default: under the top panel) */
	top?: number;
	joint: CaseJointKind;
}

interface DrawerBoxDesign {
	material: Material;
	thickness: number;
	bottom: { material: Material; thickness: number };
	/** depth of the groove the bottom sits in (in sides, front and back) */
	grooveDepth: number;
	/** corners: sides overlap the front and back (butt), or front and back sit in a rabbet half
	 * the side's thickness deep */
	corners: 'butt' | 'rabbet';
	/** box height below its front's height */
	heightClearance: number;
}

interface SlideDesign {
	/** room for the slide on each side, as the slide maker states it (1/2" is usual) */
	sideClearance: number;
	/** slide length; the box is made this deep */
	length: number;
	extension: 'full' | 'three-quarter';
}

interface FrontDesign {
	material: Material;
	thickness: number;
	mount: 'overlay' | 'inset';
	/** overlay on each edge of the opening (overlay mount) */
	overlay: number;
	/** gap between fronts, and around an inset front */
	gap: number;
}

/** A stack of drawers in one opening. */
export interface DrawerOpeningDesign {
	name?: string;
	bay?: number;
	/** height of the opening's bottom above the floor */
	bottom: number;
	/** each drawer's front height, lowest first */
	heights: number[];
	box: DrawerBoxDesign;
	slide: SlideDesign;
	front: FrontDesign;
	/** what each drawer holds, as a force (weight) */
	contentsWeight?: number;
}

export interface DoorOpeningDesign {
	name?: string;
	bay?: number;
	bottom: number;
	/** height of the opening */
	height: number;
	/** leaves in the opening: one, or a pair */
	count: 1 | 2;
	/** a single leaf's hinged side (a pair is hinged on both) */
	hinge: 'left' | 'right';
	front: FrontDesign;
}

interface BaseDesign {
	height: number;
	setback: number;
	/** a separate plinth the box stands on (the sides stop at the base), or sides that run to the
	 * floor with a toe kick between them */
	kind: 'plinth' | 'sides-to-floor';
	material?: Material;
	thickness?: number;
}

export interface WallCaseDesign extends Omit<CaseDesign, 'shelves' | 'drawers' | 'doors' | 'base'> {
	shelves: WallShelfDesign[];
	dividers: DividerDesign[];
	drawers: DrawerOpeningDesign[];
	doors: DoorOpeningDesign[];
	base?: BaseDesign;
}

export interface WallDesign {
	name?: string;
	/** left to right, as they stand */
	cases: WallCaseDesign[];
	/** one face frame across the run (a shared stile where two cases meet) */
	sharedFaceFrame: boolean;
	/** one toe-kick board across the run in front of the plinths */
	sharedToeKick: boolean;
	/** added to each finished dimension for the rough (first) cut */
	roughAllowance: number;
	/** share added to the banding length for trimming and waste, e.g. 0.1 */
	bandingWaste: number;
}

export type PartRole =
	| 'side'
	| 'top'
	| 'bottom'
	| 'fixed shelf'
	| 'adjustable shelf'
	| 'nosing'
	| 'divider'
	| 'back'
	| 'face-frame stile'
	| 'face-frame rail'
	| 'toe kick'
	| 'plinth back'
	| 'plinth end'
	| 'anchor strip'
	| 'drawer side'
	| 'drawer box front'
	| 'drawer box back'
	| 'drawer bottom'
	| 'drawer front'
	| 'door';

/** One piece of the wall, where it stands and what the shop does to it. */
export interface WallPart {
	/** index of the case it belongs to; null for a run-wide part (a shared toe kick) */
	caseIndex: number | null;
	role: PartRole;
	/** e.g. "side", "drawer 2 front", "shelf 3 (bay 1)" */
	name: string;
	/** the design element it comes from, for linking a margin or a fix */
	path: (string | number)[];
	lengthM: number;
	widthM: number;
	thicknessM: number;
	material: Material;
	materialName: string;
	/** the grain must run along the part's length (strength or looks), or either way */
	grain: 'length' | 'any';
	/** why the grain direction is fixed, where it is */
	grainReason?: 'strength' | 'looks';
	/** banded edges: how many long edges and how many short edges */
	banding: { long: number; short: number };
	/** rabbets, dados and grooves it needs, in words */
	machining: string[];
	/** a side whose outer face touches a neighbouring case: it needs no finished face */
	touches?: 'left' | 'right';
	/** its outline on the front elevation (x from the run's left, z up from the floor), where seen */
	elevation?: { x: number; z: number; w: number; h: number };
	/** its centre of mass: height above the floor and distance behind the case front */
	centre: { heightM: number; fromFrontM: number };
	/** mass from size and density, kg */
	massKg: number;
	/** moves with a drawer or door (weighed there, not in the carcass) */
	moving?: { drawer?: number; door?: number };
}

export interface WallShelfCheck extends CaseShelf {
	bay: number | null;
	/** spans between supports, left to right (one for a shelf in a bay) */
	spansM: number[];
	/** x of its left end on the elevation */
	xM: number;
}

export interface WallCaseCheck {
	index: number;
	name: string;
	/** x of its left face on the elevation */
	xM: number;
	widthM: number;
	heightM: number;
	depthM: number;
	pass: boolean;
	shelves: WallShelfCheck[];
	joints: CaseJoint[];
	stability: StabilityResult;
	margins: CaseMargin[];
	suggestions: CaseSuggestion[];
	warnings: string[];
	/** each divider as a column under the shelves on both sides of it */
	dividers: DividerCheck[];
	/** the sides that touch a neighbour */
	touches: { left: boolean; right: boolean };
	/** bays: x of each bay's left inside face (relative to the case) and its clear width */
	bays: { xM: number; widthM: number }[];
	drawers: { opening: number; index: number; xM: number; zM: number; wM: number; hM: number }[];
	doors: {
		opening: number;
		leaf: number;
		hinge: 'left' | 'right';
		xM: number;
		zM: number;
		wM: number;
		hM: number;
	}[];
}

export interface WallResult {
	estimate: true;
	engineVersion: string;
	name: string | null;
	pass: boolean;
	widthM: number;
	cases: WallCaseCheck[];
	/** every margin of every case, worst first, keyed `cases.<i>.<case key>` */
	margins: (CaseMargin & { caseIndex: number })[];
	suggestions: (CaseSuggestion & { caseIndex: number })[];
	summary: { failures: number; worst: (CaseMargin & { caseIndex: number })[] };
	parts: WallPart[];
	warnings: string[];
	cautions: string[];
}
