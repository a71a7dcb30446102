export { analyzeInput, safely, spanOverSag } from './analyze';
export {
	DEFLECTION_LIMITS,
	deflectionLimit,
	type DeflectionLimit,
	type NamedDeflectionLimit
} from './limits';
export {
	maxSpanInput,
	minThicknessInput,
	minEdgeInput,
	maxLoadInput,
	type MaxSpanResult,
	type MinThicknessResult,
	type MinEdgeResult,
	type MaxLoadResult,
	type ThicknessTrial
} from './solvers';
export { bracketedRoot, rootNear, type RootSearch } from './root';
export { DEFAULT_SHELF_OPTIONS } from './types';
export type * from './types';
export { centreSpans, geometryIssues, shelfLength, type GeometryView } from './validate';
