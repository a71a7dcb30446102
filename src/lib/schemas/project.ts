import { z } from 'zod';

export const projectSchema = z.object({
	name: z
		.string()
		.trim()
		.min(1, 'Give the project a name.')
		.max(120, 'Keep the name under 120 characters.'),
	client: z.string().trim().max(120, 'Keep the client under 120 characters.').default(''),
	siteNotes: z.string().trim().max(4000, 'Keep the site notes under 4000 characters.').default('')
});
export type ProjectInput = z.infer<typeof projectSchema>;

// only the fields sent are changed: a PATCH with a name alone keeps the client and the site notes
// (every field optional and without its default: zod 4's `.partial()` still applies a default)
export const projectPatchSchema = z.object({
	name: projectSchema.shape.name.optional(),
	client: projectSchema.shape.client.unwrap().optional(),
	siteNotes: projectSchema.shape.siteNotes.unwrap().optional()
});

export const PROJECT_SORTS = ['updated', 'name', 'client', 'created'] as const;

export const projectListQuerySchema = z.object({
	workshop: z.string().min(1, 'Name the workshop (its id).'),
	q: z.string().trim().max(120).default(''),
	sort: z.enum(PROJECT_SORTS).default('updated'),
	dir: z.enum(['asc', 'desc']).default('desc'),
	page: z.coerce.number().int().min(1).default(1),
	perPage: z.coerce.number().int().min(1).max(100).default(20)
});
export type ProjectListQuery = z.infer<typeof projectListQuerySchema>;

export const projectCreateSchema = projectSchema.extend({
	workshopId: z.string().min(1, 'Name the workshop (its id).')
});
