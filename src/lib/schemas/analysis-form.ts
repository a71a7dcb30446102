/**
 * The save form of an analysis screen (superforms, sent as JSON): the name, the screen's live input
 * and the version it was opened at. The input is validated once, by its kind's schema in the
 * registry (src/lib/kinds/registry.ts), when the data module computes it.
 */
import { z } from 'zod';
import { analysisCreateSchema } from './analysis';

export const analysisSaveSchema = z.object({
	name: analysisCreateSchema.shape.name,
	input: z.unknown(),
	version: z.number().int().min(1).optional()
});
export type AnalysisSave = z.infer<typeof analysisSaveSchema>;

/** What a save says back: "Saved." or why it was refused. */
export interface SaveMessage {
	text: string;
	ok: boolean;
}
