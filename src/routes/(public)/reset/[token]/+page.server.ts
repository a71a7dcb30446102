import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { resetPasswordSchema } from '$lib/schemas/account';
import { resetPassword, resetTokenIsLive } from '$lib/server/accounts/password-resets';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

const EXPIRED = 'This link has expired or was already used. Ask for a new one.';

export const load: PageServerLoad = async ({ params }) => ({
	live: await resetTokenIsLive(params.token),
	form: await superValidate(zod4(resetPasswordSchema))
});

export const actions: Actions = {
	default: async ({ request, params }) => {
		const form = await superValidate(await readForm(request), zod4(resetPasswordSchema));
		if (!form.valid) return fail(400, { form });
		if (!(await resetPassword(params.token, form.data.password)))
			return message(form, EXPIRED, { status: 400 });
		redirect(303, '/signin?notice=password-reset');
	}
};
