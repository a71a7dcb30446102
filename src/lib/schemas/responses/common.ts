import { z } from 'zod';

/** Every refusal of the API: a plain message and the fields to fix (empty when none). */
export const problemSchema = z
	.object({
		error: z.string().meta({ description: 'What went wrong, in plain words' }),
		issues: z.array(
			z.object({
				path: z.array(z.union([z.string(), z.number()])),
				message: z.string()
			})
		)
	})
	.meta({ id: 'Problem', description: 'A refusal: a plain message and the fields to fix' });

/** A time as JSON writes it (ISO 8601, UTC). */
export const timestamp = z.iso.datetime();

/** One page of a list. */
export function pageOf<T extends z.ZodType>(item: T) {
	return z.object({
		items: z.array(item),
		total: z.number().int().min(0),
		page: z.number().int().min(1),
		perPage: z.number().int().min(1)
	});
}

export const roleSchema = z.enum(['owner', 'editor', 'student', 'viewer']);
/** a role in one project: a workshop role, or a client invited to that project alone */
export const projectRoleSchema = z.enum([...roleSchema.options, 'client']);
