/**
 * The save form of an analysis screen: the name, the input as JSON (the screen's live state) and
 * the version it was opened at. The input is then checked by its kind's own schema.
 */
import { z } from 'zod';
import { analysisCreateSchema } from './analysis';

export const analysisFormSchema = z.object({
	name: analysisCreateSchema.shape.name,
	input: z
		.string()
		.max(200_000, 'The input is too large to save.')
		.transform((text, ctx) => {
			try {
				return JSON.parse(text) as unknown;
			} catch {
				ctx.addIssue({ code: 'custom', message: 'The input could not be read; reload the page.' });
				return z.NEVER;
			}
		}),
	version: z.coerce.number().int().min(1).optional()
});
