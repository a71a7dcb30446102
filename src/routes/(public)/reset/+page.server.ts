import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { resetRequestSchema } from '$lib/schemas/account';
import { requestPasswordReset } from '$lib/server/accounts/password-resets';
import { linkOrigin, MAIL_UNAVAILABLE_MESSAGE, mailDown } from '$lib/server/mail';
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
		if (!result) return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
		if (!result.ok)
			return message(
				form,
				`We have sent several links to that address already; try again in ${result.retryAfterMinutes} minutes.`,
				{ status: 429 }
			);
		// the same answer whether or not the address has an account
		return message(
			form,
			`If ${form.data.email} has an account, a link to choose a new password is on its way. It works once, within an hour.`
		);
	}
};
