import { z } from 'zod';
import { LENGTH_UNITS } from './preferences';

/**
 * An e-mail address as people type it: spaces around it dropped and lower-cased before the check,
 * so " Ana@Shop.example " signs in as the same person as "ana@shop.example".
 */
export const emailField = z
	.string()
	.trim()
	.toLowerCase()
	.max(254, 'That address is too long for e-mail.')
	.check(z.email('Enter an e-mail address such as name@example.com.'));

// Long passphrases are welcome; the upper bound only keeps hashing cheap for the server.
const newPasswordField = z
	.string()
	.min(10, 'That is shorter than 10 characters.')
	.max(200, 'Keep the password under 200 characters.');

const passwordField = z
	.string()
	.min(1, 'Enter your password.')
	.max(200, 'That password is too long.');

export const signUpSchema = z.object({
	name: z
		.string()
		.trim()
		.min(1, 'Tell us what to call you.')
		.max(80, 'Keep the name under 80 characters.'),
	email: emailField,
	password: newPasswordField,
	// where the confirmation link lands (e.g. back at an invitation); only paths on this site
	redirectTo: z.string().max(500).default('')
});

export const signInSchema = z.object({
	email: emailField,
	password: passwordField,
	// where to go after signing in; only paths on this site are honoured (see safeRedirectPath in return-path.ts)
	redirectTo: z.string().max(500).default('')
});

export const signInLinkSchema = z.object({
	email: emailField,
	redirectTo: z.string().max(500).default('')
});

export const resetRequestSchema = z.object({ email: emailField });

export const resetPasswordSchema = z
	.object({ password: newPasswordField, confirm: z.string().max(200) })
	.refine((v) => v.password === v.confirm, {
		message: 'The two passwords differ; type the same one twice.',
		path: ['confirm']
	});

export const profileSchema = z.object({
	name: z
		.string()
		.trim()
		.min(1, 'Tell us what to call you.')
		.max(80, 'Keep the name under 80 characters.'),
	lengthUnit: z.enum(LENGTH_UNITS)
});
export type ProfileInput = z.infer<typeof profileSchema>;

export const apiTokenCreateSchema = z.object({
	name: z
		.string()
		.trim()
		.min(1, 'Name the token after the script or machine that will use it.')
		.max(60, 'Keep the name under 60 characters.')
});
export type ApiTokenCreateInput = z.infer<typeof apiTokenCreateSchema>;

export const apiTokenRevokeSchema = z.object({ id: z.string().min(1).max(64) });

/** "Sign out everywhere": whether the API tokens are revoked too (the form offers it, ticked). */
export const signOutEverywhereSchema = z.object({ revokeTokens: z.boolean().default(false) });
