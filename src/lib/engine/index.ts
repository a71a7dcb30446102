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
