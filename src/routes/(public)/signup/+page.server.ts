import { fail, redirect } from '@sveltejs/kit';
import { setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { signUpSchema } from '$lib/schemas/account';
import { safeRedirectPath } from '$lib/schemas/return-path';
import { AccountExistsError, createUser } from '$lib/server/accounts/users';
import { mailSignInLink } from '$lib/server/auth';
import { mailDown } from '$lib/server/mail';
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

export const actions: Actions = {
	default: async (event) => {
		const form = await superValidate(await readForm(event.request), zod4(signUpSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await createUser({
				name: form.data.name,
				email: form.data.email,
				password: form.data.password
			});
		} catch (e) {
			if (e instanceof AccountExistsError)
				return setError(
					form,
					'email',
					'An account with this address already exists. Sign in, or set a new password from the sign-in page.',
					{ status: 409 }
				);
			throw e;
		}
		// The mailed link confirms the address and signs them in; until then the password waits.
		const mailed = await mailSignInLink(event, {
			email: form.data.email,
			redirectTo: safeRedirectPath(form.data.redirectTo, '/projects')
		}).catch(mailDown);
		const sent = !mailed ? 'mail-failed' : mailed.ok ? 'signup' : 'link';
		redirect(303, `/signin?sent=${sent}&email=${encodeURIComponent(form.data.email)}`);
	}
};
