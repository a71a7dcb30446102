/**
 * The shelf engine's public face. Framework-free: any TypeScript runner can import this file.
 * Requests are plain JSON (quantity strings or SI numbers); results are SI numbers.
 */
export * from './units';
export { ShelfInputError } from './errors';
export type {
	Reaction,
	SafeResult,
	ShelfIssue,
	ShelfResult,
	ShelfWarning,
	SpanCheck,
	WarningCode
} from './types';
export type {
	CustomMaterial,
	EdgeInput,
	LimitInput,
	LoadInput,
	MaterialInput,
	MaxLoadRequest,
	MaxSpanRequest,
	MinEdgeRequest,
	MinThicknessRequest,
	ShelfInput,
	ShelfRequest,
	SupportInput
} from '../schemas/shelf';
export { analyzeShelf, analyzeInput, safeAnalyzeShelf, safely } from './analyze';
export { ENGINE_VERSION } from './version';
export { deflectionLimit, type DeflectionLimit } from './limits';
export {
	materials,
	materialIds,
	findMaterial,
	type ShelfMaterial,
	type StockThickness
} from '../../../reference/materials';
export {
	shelfRequestSchema,
	maxSpanRequestSchema,
	minThicknessRequestSchema,
	minEdgeRequestSchema,
	maxLoadRequestSchema
} from '../schemas/shelf';
export {
	maxSpan,
	minThickness,
	minEdge,
	maxLoad,
	maxSpanInput,
	minThicknessInput,
	minEdgeInput,
	maxLoadInput,
	safeMaxSpan,
	safeMinThickness,
	safeMinEdge,
	safeMaxLoad,
	bracketedRoot,
	type MaxSpanResult,
	type MinThicknessResult,
	type MinEdgeResult,
	type MaxLoadResult,
	type ThicknessTrial
} from './solvers';

// Joinery, stability and the whole-case check (issue 4)
export { planJoint, planJointSI, JoineryInputError, type InputIssue } from './joinery';
export type {
	JointRequest,
	JointPlan,
	JointKind,
	FastenerKind,
	FastenerPosition,
	CapacityCheck,
	StockMaterial
} from './joinery';
export { checkStability, checkStabilitySI } from './stability';
export type { StabilityRequest, StabilityResult, FrontEdgeLoad } from './stability';
export { checkCase, checkCaseSI } from './case';
export type {
	CaseResult,
	CaseShelf,
	CaseJoint,
	CasePart,
	CaseMargin,
	CaseSuggestion,
	DesignChange,
	DesignPath
} from './case';
export type { JointInput } from '../schemas/joinery';
export type { StabilityInput } from '../schemas/stability';
export type { CaseDesign, CaseDesignInput } from '../schemas/case';
export { loadPresets, type LoadPreset } from '../../../reference/load-presets';
