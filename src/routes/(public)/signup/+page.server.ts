import { fail, redirect } from '@sveltejs/kit';
import { setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { signUpSchema } from '$lib/schemas/account';
import { AccountExistsError, createUser } from '$lib/server/accounts';
import { mailSignInLink } from '$lib/server/auth';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
	if (locals.actor) redirect(303, '/projects');
	return { form: await superValidate(zod4(signUpSchema)) };
};

export const actions: Actions = {
	default: async (event) => {
		const form = await superValidate(event.request, zod4(signUpSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await createUser(form.data);
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
		const mailed = await mailSignInLink(event, { email: form.data.email, redirectTo: '/projects' });
		const sent = mailed.ok ? 'signup' : 'link';
		redirect(303, `/signin?sent=${sent}&email=${encodeURIComponent(form.data.email)}`);
	}
};
