export { analyzeInput, safely, spanOverSag } from './analyze';
export { ShelfInputError } from './errors';
export { deflectionLimit, type DeflectionLimit } from './limits';
export {
	maxSpanInput,
	minThicknessInput,
	minEdgeInput,
	maxLoadInput,
	bracketedRoot,
	type MaxSpanResult,
	type MinThicknessResult,
	type MinEdgeResult,
	type MaxLoadResult,
	type ThicknessTrial
} from './solvers';
export { NAMED_LIMITS, DEFAULT_SHELF_OPTIONS } from './types';
export type * from './types';
export { geometryIssues, type GeometryView } from './validate';
