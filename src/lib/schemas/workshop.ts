import { z } from 'zod';
import { emailField } from './account';

export const roleSchema = z.enum(['viewer', 'editor', 'owner']);

export const workshopNameSchema = z.object({
	name: z.string().trim().min(2, 'Give the workshop a name of at least 2 characters.').max(80)
});

export const invitationSchema = z.object({
	email: emailField,
	role: roleSchema.default('viewer')
});

export const memberRoleSchema = z.object({
	userId: z.string().min(1),
	role: roleSchema
});

export const memberRemoveSchema = z.object({ userId: z.string().min(1) });

export const invitationRevokeSchema = z.object({ id: z.string().min(1, 'Choose an invitation.') });

/** Deleting the workshop: sent again with confirm=yes once the owner has said so. */
export const confirmSchema = z.object({ confirm: z.literal('yes').optional().catch(undefined) });
