import { z } from 'zod';
import { timestamp } from './common';

/** A project document as the API answers it (the file itself is fetched separately). */
export const documentSchema = z
	.object({
		id: z.string(),
		projectId: z.string(),
		analysisId: z.string().nullable(),
		name: z.string().meta({ description: 'The uploaded file’s own name, cleaned' }),
		caption: z.string(),
		contentType: z.enum(['image/jpeg', 'image/png', 'image/webp', 'application/pdf']),
		bytes: z.number().int().min(0),
		width: z.number().int().nullable(),
		height: z.number().int().nullable(),
		inRecord: z.boolean().meta({ description: 'Shown in the client’s record' }),
		createdAt: timestamp,
		createdByName: z.string().nullable(),
		hasThumbnail: z.boolean()
	})
	.meta({ id: 'Document' });

export const documentListSchema = z.object({ items: z.array(documentSchema) });
export const documentDeletedSchema = z.object({ undoUntil: timestamp });
