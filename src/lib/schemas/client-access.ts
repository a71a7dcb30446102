import { z } from 'zod';
import { emailField } from './account';

/** Invite a client (or an installer) to read one project. */
export const clientInviteSchema = z.object({ email: emailField });

/** Revoke a client's access, or withdraw an invitation, by its id. */
export const accessIdSchema = z.object({ id: z.string().min(1).max(64) });

/** A read-only link to the project's record (or one analysis's), open for a number of days. */
export const shareLinkSchema = z.object({
	days: z.coerce
		.number({ error: 'Say for how many days the link works.' })
		.int('A whole number of days.')
		.min(1, 'At least 1 day.')
		.max(90, 'At most 90 days; make a new link after that.')
		.default(30),
	analysisId: z.string().max(64).optional()
});

/** Send the record to the client by e-mail, with a short message of the editor's own. */
export const recordMailSchema = z.object({
	to: emailField,
	message: z.string().trim().max(2000, 'Keep the message under 2000 characters.').default(''),
	analysisId: z.string().max(64).optional()
});
