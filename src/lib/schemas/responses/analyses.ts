import { z } from 'zod';
import { ANALYSIS_KINDS as analysisKinds } from '../../kinds/names';
import { pageOf, projectRoleSchema, timestamp } from './common';

const base = {
	id: z.string(),
	projectId: z.string(),
	kind: z.enum(analysisKinds),
	name: z.string(),
	summary: z.string().meta({ description: "One sentence, in the reader's length unit" }),
	pass: z.boolean().nullable(),
	version: z.number().int().min(1),
	engineVersion: z.string(),
	createdAt: timestamp,
	updatedAt: timestamp,
	createdByName: z.string().nullable(),
	updatedByName: z.string().nullable()
};

const analysisListItemSchema = z.object(base).meta({ id: 'AnalysisListItem' });

export const analysisSchema = z
	.object({
		...base,
		input: z
			.record(z.string(), z.unknown())
			.meta({ description: 'The engine request of its kind, stored in SI units' }),
		result: z
			.record(z.string(), z.unknown())
			.meta({ description: "The engine's result of its kind (SI units), computed on the server" })
	})
	.meta({ id: 'Analysis' });

export const analysisWithRoleSchema = analysisSchema.extend({ role: projectRoleSchema });

export const analysisPageSchema = pageOf(analysisListItemSchema);

export const analysisDeletedSchema = z.object({
	id: z.string(),
	projectId: z.string(),
	deletedAt: timestamp,
	undoUntil: timestamp
});

export const revisionListSchema = z.object({
	items: z.array(
		z.object({
			version: z.number().int(),
			name: z.string(),
			engineVersion: z.string(),
			createdAt: timestamp,
			changedByName: z.string().nullable(),
			summary: z.string(),
			current: z.boolean()
		})
	)
});

export const revisionSchema = z.looseObject({
	version: z.number().int(),
	name: z.string(),
	input: z.record(z.string(), z.unknown()),
	result: z.record(z.string(), z.unknown()),
	summary: z.string()
});
