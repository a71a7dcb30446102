import type { CaseDesign, CaseDesignInput } from '../../schemas/case';
import type { JointPlan } from '../joinery/types';
import type { StabilityResult } from '../stability/types';
import type { ShelfResult } from '../types';

export type { CaseDesign, CaseDesignInput };

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
