import { z } from 'zod';
import { patchOf } from './patch';

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
export const projectPatchSchema = patchOf(projectSchema);

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
