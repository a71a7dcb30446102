import { z } from 'zod';
import { LENGTH_UNITS } from '../preferences';
import { pageOf, projectRoleSchema, roleSchema, timestamp } from './common';

export const healthSchema = z.object({ status: z.literal('ok'), version: z.string() });

const workshopSummarySchema = z
	.object({
		id: z.string(),
		name: z.string(),
		personal: z.boolean(),
		isClass: z.boolean(),
		role: roleSchema
	})
	.meta({ id: 'WorkshopSummary' });

export const workshopSchema = z
	.object({
		id: z.string(),
		name: z.string(),
		personal: z.boolean(),
		isClass: z.boolean().meta({ description: 'A class: members may be students' }),
		createdBy: z.string().nullable(),
		createdAt: timestamp
	})
	.meta({ id: 'Workshop' });

export const workshopWithRoleSchema = workshopSchema.extend({ role: roleSchema });

export const workshopDetailSchema = workshopWithRoleSchema.extend({
	members: z.array(
		z.object({
			userId: z.string(),
			name: z.string().nullable(),
			email: z.string().nullable(),
			role: roleSchema
		})
	)
});

export const workshopListSchema = z.object({ items: z.array(workshopSummarySchema) });

export const projectSchema = z
	.object({
		id: z.string(),
		workshopId: z.string(),
		name: z.string(),
		client: z.string(),
		siteNotes: z.string(),
		createdBy: z.string().nullable(),
		createdAt: timestamp,
		updatedAt: timestamp
	})
	.meta({ id: 'Project' });

export const projectWithRoleSchema = projectSchema.extend({ role: projectRoleSchema });

export const projectPageSchema = pageOf(
	projectSchema.omit({ createdBy: true }).extend({ createdByName: z.string().nullable() })
);

export const meSchema = z.object({
	id: z.string(),
	email: z.string(),
	name: z.string().nullable(),
	via: z.enum(['session', 'token']),
	lengthUnit: z.enum(LENGTH_UNITS),
	workshops: z.array(workshopSummarySchema)
});

const apiTokenSchema = z
	.object({
		id: z.string(),
		name: z.string(),
		prefix: z
			.string()
			.meta({ description: 'The first characters of the secret, to tell tokens apart' }),
		createdAt: timestamp,
		lastUsedAt: timestamp.nullable()
	})
	.meta({ id: 'ApiToken' });

export const apiTokenListSchema = z.object({ items: z.array(apiTokenSchema) });

export const apiTokenCreatedSchema = apiTokenSchema.extend({
	secret: z.string().meta({ description: 'The token itself; shown in this answer only' })
});
