import { fail } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { resetRequestSchema } from '$lib/schemas/account';
import { requestPasswordReset } from '$lib/server/accounts/password-resets';
import { linkOrigin, mailDown } from '$lib/server/mail';
import { linkMailedMessage } from '../link-mailed.server';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async () => ({
	form: await superValidate(zod4(resetRequestSchema))
});

export const actions: Actions = {
	default: async ({ request, url }) => {
		const form = await superValidate(await readForm(request), zod4(resetRequestSchema));
		if (!form.valid) return fail(400, { form });
		const result = await requestPasswordReset(form.data.email, linkOrigin(url)).catch(mailDown);
		// the same answer whether or not the address has an account
		return linkMailedMessage(
			form,
			result,
			`If ${form.data.email} has an account, a link to choose a new password is on its way. It works once, within an hour.`
		);
	}
};
