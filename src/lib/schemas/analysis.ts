/**
 * Saved analyses: the shapes of their API bodies and queries, and the comparison request (one
 * shelf, several materials and thicknesses). The input of each kind is validated by that kind's
 * schema in the registry (src/lib/kinds/registry.ts), so here it is `unknown`.
 */
import { z } from 'zod';
import { edgeSchema, materialSchema, shelfRequestSchema } from './shelf';
import { lengthField } from './quantity';
import { ANALYSIS_KINDS as analysisKinds } from '../kinds/names';

const analysisName = z
	.string()
	.trim()
	.min(1, 'Give the analysis a name.')
	.max(120, 'Keep the name under 120 characters.');

// ---- comparison: one shelf, 2–8 candidates of material and thickness ----
const {
	material: _material,
	thickness: _thickness,
	...shelfWithoutStock
} = shelfRequestSchema.shape;
void _material;
void _thickness;

const comparisonCandidateSchema = z.object({
	material: materialSchema,
	thickness: lengthField({
		bound: 'positive',
		max: 0.3,
		description: 'actual thickness of the panel'
	}),
	/** strips for this candidate; when absent the shelf's own edges apply */
	edges: z.array(edgeSchema).max(3).optional(),
	/** how the chart and table name it, e.g. '3/4" birch ply + 1 1/2" nosing' */
	label: z.string().trim().max(80).optional()
});

/**
 * Every candidate, put into the shelf, must be a valid shelf request: its issues are reported at
 * the candidate (`candidates.1.thickness`), those of the shared shelf once, at `shelf.…`.
 */
export const comparisonRequestSchema = z
	.object({
		shelf: z.object(shelfWithoutStock),
		candidates: z
			.array(comparisonCandidateSchema)
			.min(2, 'Compare at least two candidates.')
			.max(8, 'Compare at most eight candidates.')
	})
	.superRefine((value, ctx) => {
		const seen = new Set<string>();
		value.candidates.forEach((candidate, i) => {
			const parsed = shelfRequestSchema.safeParse(comparisonShelf(value, i));
			if (parsed.success) return;
			for (const issue of parsed.error.issues) {
				const [head, ...rest] = issue.path as (string | number)[];
				const own =
					head === 'material' || head === 'thickness' || (head === 'edges' && candidate.edges);
				const path = own ? ['candidates', i, head, ...rest] : ['shelf', ...issue.path];
				const key = path.join('.') + issue.message;
				if (seen.has(key)) continue;
				seen.add(key);
				ctx.addIssue({ code: 'custom', path: path as (string | number)[], message: issue.message });
			}
		});
	});

export type ComparisonRequest = z.input<typeof comparisonRequestSchema>;
export type ComparisonInput = z.output<typeof comparisonRequestSchema>;

/** The shelf request of candidate i: the shared shelf with this candidate's stock and edges (for a
 * comparison as sent or as parsed). */
export function comparisonShelf<
	Shelf extends { edges?: unknown },
	Candidate extends { material: unknown; thickness: unknown; edges?: Shelf['edges'] }
>(
	input: { shelf: Shelf; candidates: Candidate[] },
	i: number
): Shelf & Pick<Candidate, 'material' | 'thickness'> {
	const c = input.candidates[i];
	return {
		...input.shelf,
		material: c.material,
		thickness: c.thickness,
		edges: c.edges ?? input.shelf.edges
	};
}

// ---- API bodies ----
export const analysisCreateSchema = z.object({
	kind: z.enum(analysisKinds, { error: `Expected one of ${analysisKinds.join(', ')}.` }),
	name: analysisName,
	/** the request of this kind's engine; any `result` sent alongside is ignored */
	input: z.unknown().refine((v) => v !== undefined, 'Send the input of the analysis.')
});

/** Optimistic concurrency: the version the client last read, from the body or If-Match. */
const versionField = z.coerce.number().int().min(1, 'Versions start at 1.');

export const analysisPatchSchema = z
	.object({
		name: analysisName.optional(),
		input: z.unknown().optional(),
		version: versionField.optional()
	})
	.refine((v) => v.name !== undefined || v.input !== undefined, {
		message: 'Send a new name or a new input.',
		path: ['input']
	});

export const analysisPutSchema = z.object({
	name: analysisName,
	input: z.unknown().refine((v) => v !== undefined, 'Send the input of the analysis.'),
	version: versionField.optional()
});

export const analysisDuplicateSchema = z.object({ name: analysisName.optional() });
export const analysisMoveSchema = z.object({
	projectId: z.string().min(1, 'Name the project to move it to (its id).')
});
export const analysisRestoreSchema = z.object({ version: versionField.optional() });

export const ANALYSIS_SORTS = ['updated', 'name', 'kind', 'created', 'pass'] as const;
export const analysisListQuerySchema = z.object({
	q: z.string().trim().max(120).default(''),
	kind: z.enum(analysisKinds).optional(),
	pass: z.enum(['pass', 'fail']).optional(),
	sort: z.enum(ANALYSIS_SORTS).default('updated'),
	dir: z.enum(['asc', 'desc']).default('desc'),
	page: z.coerce.number().int().min(1).default(1),
	perPage: z.coerce.number().int().min(1).max(100).default(20)
});
export type AnalysisListQuery = z.output<typeof analysisListQuerySchema>;
