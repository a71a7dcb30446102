/**
 * Parse, then compute: the one place where a request as people and programs write it (quantity
 * strings, defaults left out) is read by its shared schema (src/lib/schemas) and handed to the
 * engine's typed functions (src/lib/engine). Routes, screens, the API and tests call these; the
 * engine itself never parses. Each throws the engine's input error naming every bad field.
 */
import {
	analyzeInput,
	checkCaseSI,
	checkStabilitySI,
	maxLoadInput,
	maxSpanInput,
	minEdgeInput,
	minThicknessInput,
	planJointSI,
	safely,
	type CaseDesign,
	type CaseResult,
	type JointPlan,
	type JointRequest,
	type MaxLoadInput,
	type MaxLoadResult,
	type MaxSpanInput,
	type MaxSpanResult,
	type MinEdgeInput,
	type MinEdgeResult,
	type MinThicknessInput,
	type MinThicknessResult,
	type ShelfInput,
	type ShelfResult,
	type StabilityRequest,
	type StabilityResult
} from './engine';
import { caseDesignSchema, type CaseDesignInput } from './schemas/case';
import { jointRequestSchema, type JointInput } from './schemas/joinery';
import { parseRequest } from './schemas/parse';
import {
	maxLoadRequestSchema,
	maxSpanRequestSchema,
	minEdgeRequestSchema,
	minThicknessRequestSchema,
	shelfRequestSchema,
	type MaxLoadRequest,
	type MaxSpanRequest,
	type MinEdgeRequest,
	type MinThicknessRequest,
	type ShelfRequest
} from './schemas/shelf';
import { stabilityRequestSchema, type StabilityInput } from './schemas/stability';

export type {
	CaseDesignInput,
	JointInput,
	MaxLoadRequest,
	MaxSpanRequest,
	MinEdgeRequest,
	MinThicknessRequest,
	ShelfRequest,
	StabilityInput
};

/** Analyse a shelf: sags, checks, strength, reactions, curve and cautions. */
export function analyzeShelf(request: ShelfRequest): ShelfResult {
	const input: ShelfInput = parseRequest(shelfRequestSchema, request);
	return analyzeInput(input);
}

/** The longest span that meets the limit (for several spans: their common scale). */
export function maxSpan(request: MaxSpanRequest): MaxSpanResult {
	const input: MaxSpanInput = parseRequest(maxSpanRequestSchema, request);
	return maxSpanInput(input);
}

/** The thinnest stocked (or given) thickness that meets the limit. */
export function minThickness(request: MinThicknessRequest): MinThicknessResult {
	const input: MinThicknessInput = parseRequest(minThicknessRequestSchema, request);
	return minThicknessInput(input);
}

/** The smallest height of a strip (of given material and thickness) that makes the shelf meet it. */
export function minEdge(request: MinEdgeRequest): MinEdgeResult {
	const input: MinEdgeInput = parseRequest(minEdgeRequestSchema, request);
	return minEdgeInput(input);
}

/** The largest magnitude of one load of a given shape that the shelf carries within the limit. */
export function maxLoad(request: MaxLoadRequest): MaxLoadResult {
	const input: MaxLoadInput = parseRequest(maxLoadRequestSchema, request);
	return maxLoadInput(input);
}

/** Plan one joint: fasteners, where they go, what each holds and what the joint must carry. */
export function planJoint(request: JointInput): JointPlan {
	const input: JointRequest = parseRequest(jointRequestSchema, request);
	return planJointSI(input);
}

/** Tip-over of a case standing on the floor. */
export function checkStability(request: StabilityInput): StabilityResult {
	const input: StabilityRequest = parseRequest(stabilityRequestSchema, request);
	return checkStabilitySI(input);
}

/** A whole case: shelves, joints, tip-over, cut list, margins and suggestions. */
export function checkCase(request: CaseDesignInput): CaseResult {
	const input: CaseDesign = parseRequest(caseDesignSchema, request);
	return checkCaseSI(input);
}

/** For the keystroke: never throw. */
export const safeAnalyzeShelf = safely(analyzeShelf);
export const safeMaxSpan = safely(maxSpan);
export const safeMinThickness = safely(minThickness);
export const safeMinEdge = safely(minEdge);
export const safeMaxLoad = safely(maxLoad);
