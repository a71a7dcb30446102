import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { signUpSchema } from '$lib/schemas/account';
import { safeRedirectPath } from '$lib/schemas/return-path';
import { hashPassword } from '$lib/server/accounts/passwords';
import { AccountExistsError, createUser, findUserByEmail } from '$lib/server/accounts/users';
import { mailSignInLink } from '$lib/server/auth';
import {
	linkOrigin,
	mailDown,
	mailReady,
	sendAccountExistsNotice,
	sendLater
} from '$lib/server/mail';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async ({ locals, url }) => {
	const next = safeRedirectPath(url.searchParams.get('next'), '/projects');
	if (locals.actor) redirect(303, next);
	const email = url.searchParams.get('email') ?? '';
	return {
		form: await superValidate({ email, redirectTo: next }, zod4(signUpSchema), { errors: false })
	};
};

const detachedCookies: RequestEvent['cookies'] = {
	get: () => undefined,
	getAll: () => [],
	set: () => {},
	delete: () => {},
	serialize: () => ''
};

export const actions: Actions = {
	default: async (event) => {
		const form = await superValidate(await readForm(event.request), zod4(signUpSchema));
		if (!form.valid) return fail(400, { form });
		const email = form.data.email.trim().toLowerCase();
		const redirectTo = safeRedirectPath(form.data.redirectTo, '/projects');
		// whether mail works at all, asked for every address alike
		const ready = await mailReady().then(() => true, mailDown);
		// The same answer, in the same time, whether or not the address has an account: the letters
		// go after answering, and a known address costs a password hash too.
		let created = false;
		if (!(await findUserByEmail(email))) {
			try {
				await createUser({ name: form.data.name, email, password: form.data.password });
				created = true;
			} catch (e) {
				if (!(e instanceof AccountExistsError)) throw e;
			}
		} else await hashPassword(form.data.password);
		if (ready) {
			const origin = linkOrigin(event.url);
			if (created)
				// after the answer has gone, the page's cookies can no longer be set: Auth.js gets a
				// stand-in (sending a link sets nothing the person needs)
				sendLater('sign-up confirmation', () =>
					mailSignInLink({ ...event, cookies: detachedCookies }, { email, redirectTo })
				);
			else
				sendLater('account-exists notice', () =>
					sendAccountExistsNotice(email, `${origin}/signin`, `${origin}/reset`)
				);
		}
		const sent = ready ? 'signup' : 'mail-failed';
		redirect(303, `/signin?sent=${sent}&email=${encodeURIComponent(form.data.email)}`);
	}
};
