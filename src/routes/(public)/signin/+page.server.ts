import { fail, redirect } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { dev } from '$app/environment';
import { signInLinkSchema, signInSchema } from '$lib/schemas/account';
import { safeRedirectPath } from '$lib/schemas/return-path';
import { throttleMessage } from '$lib/server/accounts/throttle';
import { mailSignInLink, signInWithPassword } from '$lib/server/auth';
import { DEMO_ACCOUNTS } from '$lib/server/demo/accounts';
import { MAIL_UNAVAILABLE_MESSAGE, mailDown } from '$lib/server/mail';
import { linkMailedMessage } from '../link-mailed.server';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

const AFTER_SIGN_IN = '/projects';

// Auth.js sends people back here with ?error=… when a link or a sign-in went wrong.
const AUTH_ERRORS: Record<string, string> = {
	Verification: 'That sign-in link has expired or was already used. Ask for a new one below.',
	AccessDenied: 'That sign-in could not be completed. Try again, or sign in with your password.'
};

export const load: PageServerLoad = async ({ url, locals }) => {
	const next = safeRedirectPath(url.searchParams.get('next'), AFTER_SIGN_IN);
	if (locals.actor) redirect(303, next);
	const email = url.searchParams.get('email') ?? '';
	const [password, link] = await Promise.all([
		superValidate({ email, redirectTo: next }, zod4(signInSchema), {
			id: 'password',
			errors: false
		}),
		superValidate({ email, redirectTo: next }, zod4(signInLinkSchema), {
			id: 'link',
			errors: false
		})
	]);
	const error = url.searchParams.get('error');
	return {
		password,
		link,
		// ?sent=… after sign-up; type=email when Auth.js itself reports a link was sent
		sent:
			url.searchParams.get('sent') ?? (url.searchParams.get('type') === 'email' ? 'link' : null),
		notice: url.searchParams.get('notice'),
		authError: error
			? (AUTH_ERRORS[error] ?? 'Signing in did not work that time. Try again.')
			: null,
		demoAccounts: dev
			? DEMO_ACCOUNTS.map(({ email, password, role, note }) => ({ email, password, role, note }))
			: []
	};
};

export const actions: Actions = {
	password: async (event) => {
		const form = await superValidate(await readForm(event.request), zod4(signInSchema), {
			id: 'password'
		});
		if (!form.valid) return fail(400, { form });
		const redirectTo = safeRedirectPath(form.data.redirectTo, AFTER_SIGN_IN);
		const result = await signInWithPassword(event, { ...form.data, redirectTo });
		if (result.ok) redirect(303, redirectTo);
		form.data.password = '';
		if (result.status === 429) return message(form, result.message, { status: 429 });
		if (result.unconfirmed) {
			const mailed = await mailSignInLink(event, { email: form.data.email, redirectTo }).catch(
				mailDown
			);
			if (!mailed) return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
			if (!mailed.ok)
				return message(form, throttleMessage(mailed.retryAfterMinutes), { status: 429 });
			return message(form, result.message, { status: 400 });
		}
		return setError(form, 'password', result.message);
	},

	link: async (event) => {
		const form = await superValidate(await readForm(event.request), zod4(signInLinkSchema), {
			id: 'link'
		});
		if (!form.valid) return fail(400, { form });
		const redirectTo = safeRedirectPath(form.data.redirectTo, AFTER_SIGN_IN);
		const mailed = await mailSignInLink(event, { email: form.data.email, redirectTo }).catch(
			mailDown
		);
		return linkMailedMessage(
			form,
			mailed,
			`If ${form.data.email} has an account, a sign-in link is on its way. It works once, within an hour.`
		);
	}
};
