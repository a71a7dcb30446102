import { z } from 'zod';
import { emailField } from './account';

// a student: only in a workshop that is a class (see src/lib/server/access.ts)
export const roleSchema = z.enum(['viewer', 'student', 'editor', 'owner']);

export const workshopNameSchema = z.object({
	name: z.string().trim().min(2, 'Give the workshop a name of at least 2 characters.').max(80)
});

/** Changing a workshop (owner): its name, or whether it is a class; at least one of them. */
export const workshopPatchSchema = z
	.object({
		name: workshopNameSchema.shape.name.optional(),
		isClass: z.boolean().optional()
	})
	.refine((v) => v.name !== undefined || v.isClass !== undefined, {
		message: 'Send a new name, or whether the workshop is a class.'
	});

/** The workshop switcher in the app's header: which of the person's workshops to work in. */
export const workshopSwitchSchema = z.object({
	workshopId: z.string().trim().min(1, 'Choose a workshop.')
});

/** The class switch on the workshop page (a checkbox: absent means off). */
export const classModeSchema = z.object({ isClass: z.boolean().default(false) });

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
