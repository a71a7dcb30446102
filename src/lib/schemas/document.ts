import { z } from 'zod';

/** What an upload carries beside the file itself (multipart fields). */
export const documentFieldsSchema = z.object({
	caption: z.string().trim().max(300, 'A caption is at most 300 characters.').default(''),
	analysisId: z
		.string()
		.trim()
		.transform((s) => s || null)
		.pipe(z.uuid('Choose one of this project’s analyses.').nullable())
		.default(null)
});
export type DocumentFields = z.infer<typeof documentFieldsSchema>;

/** A change to a document: every field optional, and none given means none changed. */
export const documentPatchSchema = z
	.object({
		caption: z.string().trim().max(300, 'A caption is at most 300 characters.'),
		inRecord: z.boolean(),
		analysisId: z.uuid('Choose one of this project’s analyses.').nullable()
	})
	.partial()
	.strict();
export type DocumentPatch = z.infer<typeof documentPatchSchema>;

/** The form on a document's page (checkbox and select as a browser sends them). */
export const documentFormSchema = z.object({
	caption: z.string().trim().max(300, 'A caption is at most 300 characters.'),
	inRecord: z.boolean().default(false),
	// '' for none: a select's empty choice
	analysisId: z.union([z.literal(''), z.uuid('Choose one of this project’s analyses.')]).default('')
});
