/**
 * The engine's public face. Framework-free: any TypeScript runner can import this file, and it
 * imports nothing outside src/lib/engine and reference/. Inputs are typed SI values (see
 * shelf/types.ts, joinery/types.ts, stability/types.ts, case/types.ts); results are SI numbers.
 * Reading what people and programs send (quantity strings, defaults) is src/lib/schemas' work, and
 * src/lib/compute.ts parses, then calls these.
 */
export { InputError, type InputIssue } from './errors';
export * from './units';
export * from './shelf';
export { ENGINE_VERSION } from './version';
export {
	materials,
	materialIds,
	findMaterial,
	type ShelfMaterial,
	type StockThickness
} from '../../../reference/materials';

// Joinery, stability and the whole-case check (issue 4)
export { planJointSI } from './joinery';
export type {
	JointRequest,
	JointPlan,
	JointKind,
	FastenerKind,
	FastenerPosition,
	CapacityCheck,
	StockMaterial
} from './joinery';
export { checkStabilitySI } from './stability';
export type { StabilityRequest, StabilityResult, FrontEdgeLoad } from './stability';
export { checkCaseSI } from './case';
export type {
	CaseDesign,
	CaseResult,
	CaseShelf,
	CaseJoint,
	CasePart,
	CaseMargin,
	CaseSuggestion,
	DesignChange,
	DesignPath
} from './case';
export { loadPresets, type LoadPreset } from '../../../reference/load-presets';
export { CREEP_TIME_EXPONENT, LONG_TERM_DAYS, creepShare, sagAfter } from './creep-time';
