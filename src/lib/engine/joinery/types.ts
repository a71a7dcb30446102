import type { StockKind } from '../../../../reference/stock-holding';

/** The joints the planner knows, named once (the request schema reads this list). */
export const JOINT_KINDS = [
	'shelf-to-side',
	'top-to-side',
	'bottom-to-side',
	'rail-to-stile',
	'frame-to-case',
	'divider-to-shelf'
] as const;
export type JointKind = (typeof JOINT_KINDS)[number];

export const FASTENER_KINDS = ['biscuit', 'pocket-screw', 'screw', 'shelf-pin', 'dado'] as const;
export type FastenerKind = (typeof FASTENER_KINDS)[number];

/** A stock by its id in reference/stock-holding.ts, or given by its kind and specific gravity. */
export type StockMaterial = string | { name?: string; kind: StockKind; specificGravity: number };

interface JointStock {
	material: StockMaterial;
	thicknessM: number;
}

/** What the joint must carry, from the shelf analysis: the reaction at this end and, for a shelf
 * taken as fixed, the end moment. */
interface JointDemand {
	shearN?: number;
	momentNM?: number;
}

interface JointOptions {
	/** fix the number of fasteners instead of planning it */
	count?: number;
	screwGauge?: number;
	screwLengthM?: number;
	pinDiameterM?: number;
	dadoDepthM?: number;
}

/** SI numbers in; the API and forms parse quantity strings into this shape first. */
export interface JointRequest {
	kind: JointKind;
	fastener: FastenerKind;
	/** the joint's length along the meeting line (usually the shelf depth), m */
	lengthM: number;
	/** the piece whose end or edge meets the other: shelf, top, bottom, rail, divider */
	endPiece: JointStock;
	/** the piece whose face or edge receives it: case side, stile, the shelf under a divider */
	facePiece: JointStock;
	demand?: JointDemand;
	options?: JointOptions;
}

/** A fastener's place for a drawing: along the joint from its front end, and across the end piece's
 * thickness from its top (or outer) face. */
export interface FastenerPosition {
	alongM: number;
	acrossM: number;
	row: number;
}

export interface CapacityCheck {
	what: string;
	unit: 'N' | 'N·m' | 'Pa';
	demand: number;
	/** allowable (design-level) capacity of the whole joint */
	design: number;
	/** estimated failure level of the whole joint, where a source gives one */
	ultimate: number | null;
	/** demand / design */
	utilisation: number;
	/** ultimate / demand; null where there is no demand or no cited ultimate */
	safetyFactor: number | null;
	pass: boolean;
	basis: string;
}

export interface JointPlan {
	estimate: true;
	kind: JointKind;
	fastener: FastenerKind;
	/** e.g. "biscuit #20", "pocket screw #8 × 1-1/4\" coarse thread" */
	description: string;
	count: number;
	positions: FastenerPosition[];
	/** fastener dimensions the plan settled on, m */
	spec: Record<string, number | string>;
	perFastener: { withdrawalN: number | null; lateralN: number | null; momentNM: number | null };
	demand: { shearN: number; momentNM: number };
	checks: CapacityCheck[];
	/** the highest utilisation of the checks (0 with no demand) */
	utilisation: number;
	pass: boolean;
	notes: string[];
	warnings: string[];
	cautions: string[];
	sources: string[];
}
