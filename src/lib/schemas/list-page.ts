// What a list page's address may hold (?q=…&sort=…&page=…), read leniently: a bookmark with an
// unknown sort or a page typed by hand falls back to the default instead of an error page.
import { z } from 'zod';
import { ANALYSIS_KINDS } from '../kinds/names';
import { PROJECT_SORTS } from './project';

const dir = z.enum(['asc', 'desc']).catch('desc');
const page = z.coerce.number().int().min(1).max(100_000).catch(1);
const q = z.string().trim().max(120).catch('');

export const projectPageQuerySchema = z.object({
	q,
	sort: z.enum(PROJECT_SORTS).catch('updated'),
	dir,
	page
});
export type ProjectPageQuery = z.output<typeof projectPageQuerySchema>;

const ANALYSIS_PAGE_SORTS = ['updated', 'name', 'kind', 'pass'] as const;
export const analysisPageQuerySchema = z.object({
	q,
	kind: z.enum(ANALYSIS_KINDS).optional().catch(undefined),
	pass: z.enum(['pass', 'fail']).optional().catch(undefined),
	sort: z.enum(ANALYSIS_PAGE_SORTS).catch('updated'),
	dir,
	page
});
export type AnalysisPageQuery = z.output<typeof analysisPageQuerySchema>;

/** A row action of the analyses table (duplicate, delete, undo): which analysis. */
export const analysisRowSchema = z.object({
	analysisId: z.string().min(1, 'Choose an analysis.'),
	confirm: z.literal('yes').optional().catch(undefined)
});
export const analysisRowMoveSchema = z.object({
	analysisId: z.string().min(1, 'Choose an analysis.'),
	projectId: z.string().min(1, 'Choose the project to move it to.')
});
