import type { JointPlan } from '../joinery/types';
import type { LimitInput, LoadInput, ShelfMaterialInput, ShelfResult } from '../shelf/types';
import type { AnchorKind } from '../stability/types';
import type { StabilityResult } from '../stability/types';

/**
 * A whole case, SI (metres, newtons): what src/lib/schemas/case.ts reads a design into. Keys are
 * those the user's design has, so a suggested change (a path and an SI value) can be written
 * straight back into it. Weights of drawers and doors are forces (N), as typed.
 */
export type CaseJointKind = 'biscuit' | 'pocket-screw' | 'screw' | 'dado';

interface CasePanel {
	material: ShelfMaterialInput;
	thickness: number;
}

interface CaseEndPanel {
	/** default: the sides' material and thickness */
	material?: ShelfMaterialInput;
	thickness?: number;
	joint: CaseJointKind;
	/** fasteners per end instead of the planned number */
	jointCount?: number;
	/** what it carries, as on a shelf (none by default) */
	loads: LoadInput[];
}

export interface CaseNosing {
	material: ShelfMaterialInput;
	/** vertical size of the strip */
	height: number;
	/** front-to-back size of the strip */
	thickness: number;
}

export interface CaseShelfDesign {
	name?: string;
	/** height of the shelf's top face above the floor */
	height: number;
	kind: 'fixed' | 'adjustable';
	material?: ShelfMaterialInput;
	thickness?: number;
	/** fixed shelves: how it is joined to the sides */
	joint: CaseJointKind;
	jointCount?: number;
	/** fixed shelves: take the ends as fixed (the joint must then carry the end moment) */
	ends: 'simple' | 'fixed';
	loads: LoadInput[];
	nosing?: CaseNosing;
	/** height of what stands on it, for the centre of gravity */
	itemHeight?: number;
}

interface CaseFaceFrame {
	material: ShelfMaterialInput;
	thickness: number;
	stileWidth: number;
	railWidth: number;
	/** how rails meet stiles */
	joint: 'pocket-screw' | 'biscuit';
	/** how the frame meets the case front */
	attach: 'biscuit' | 'pocket-screw';
}

interface CaseDrawer {
	/** height of the drawer above the floor */
	height: number;
	/** weight of the empty drawer, N */
	weight: number;
	contentsWeight?: number;
	/** how far it opens beyond the front */
	extension?: number;
}

interface CaseDoor {
	weight: number;
	width: number;
	centreHeight: number;
}

export interface CaseDesign {
	name?: string;
	/** overall outside sizes; the depth includes the back and any face frame */
	width: number;
	height: number;
	depth: number;
	sides: CasePanel;
	top: CaseEndPanel;
	bottom: CaseEndPanel;
	/** a back fitted in a rabbet in the sides, or applied over the back edges */
	back?: CasePanel & { fitted: 'rabbet' | 'applied' };
	shelves: CaseShelfDesign[];
	faceFrame?: CaseFaceFrame;
	/** a plinth or feet: the bottom sits at `height`, the front support line is `setback` behind */
	base?: { height?: number; setback?: number };
	drawers?: CaseDrawer[];
	doors?: CaseDoor[];
	floorTiltDeg?: number;
	anchoring?: { kind: AnchorKind; height?: number; intoStuds?: boolean };
	seismicRegion?: boolean;
	limit: LimitInput;
	service: 'dry' | 'humid' | 'wet';
}

/** A path into the design object, e.g. `['shelves', 2, 'thickness']`. */
export type DesignPath = (string | number)[];

/** One change to the design: set the value at the path (SI numbers, as the schema accepts). */
export interface DesignChange {
	path: DesignPath;
	value: unknown;
}

export interface CaseShelf {
	/** where it sits in the design: `['shelves', 2]`, `['top']`, `['bottom']` */
	path: DesignPath;
	name: string;
	kind: 'fixed' | 'adjustable' | 'top' | 'bottom';
	heightM: number;
	spanM: number;
	depthM: number;
	thicknessM: number;
	analysis: ShelfResult;
	pass: boolean;
}

export interface CaseJoint {
	id: string;
	/** the design element whose joint this is */
	path: DesignPath;
	where: string;
	/** how many identical joints of this plan the case has (both ends, both stiles) */
	joints: number;
	plan: JointPlan;
}

export interface CasePart {
	name: string;
	count: number;
	lengthM: number;
	widthM: number;
	thicknessM: number;
	material: string;
}

export interface CaseMargin {
	key: string;
	what: string;
	path: DesignPath;
	/** share to spare: 0.25 = a quarter in hand, negative = over by that share; null for a failure
	 * that is not a number (a tall case with no anchoring) */
	margin: number | null;
	pass: boolean;
}

export interface CaseSuggestion {
	title: string;
	detail: string;
	/** the margins (by key) this change fixes */
	fixes: string[];
	changes: DesignChange[];
	/** the change was re-checked here and clears the failure */
	verified: boolean;
}

export interface CaseResult {
	estimate: true;
	engineVersion: string;
	name: string | null;
	pass: boolean;
	summary: { failures: number; worst: CaseMargin[] };
	shelves: CaseShelf[];
	joints: CaseJoint[];
	stability: StabilityResult;
	parts: CasePart[];
	/** every margin, worst first */
	margins: CaseMargin[];
	suggestions: CaseSuggestion[];
	warnings: string[];
	cautions: string[];
}
