import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { apiTokenCreateSchema, apiTokenRevokeSchema, profileSchema } from '$lib/schemas/account';
import { requireActor } from '$lib/server/access';
import { createApiToken, listApiTokens, revokeApiToken } from '$lib/server/accounts/api-tokens';
import { getProfile, updateProfile } from '$lib/server/accounts/profile';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async ({ locals }) => {
	if (!locals.actor) redirect(303, '/signin?next=/account');
	const profile = getProfile(locals.actor);
	return {
		email: profile.email,
		profile: await superValidate(
			{ name: profile.name ?? '', lengthUnit: profile.lengthUnit },
			zod4(profileSchema),
			{ id: 'profile' }
		),
		newToken: await superValidate(zod4(apiTokenCreateSchema), { id: 'token' }),
		tokens: listApiTokens(locals.actor)
	};
};

export const actions: Actions = {
	profile: async ({ request, locals }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(profileSchema), {
			id: 'profile'
		});
		if (!form.valid) return fail(400, { form });
		updateProfile(actor, form.data);
		return message(form, 'Saved.');
	},

	createToken: async ({ request, locals }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(apiTokenCreateSchema), {
			id: 'token'
		});
		if (!form.valid) return fail(400, { form });
		const token = createApiToken(actor, form.data);
		// Shown once, in this answer only (not in a redirect URL): it is stored only as a hash.
		return message(form, { name: token.name, secret: token.secret });
	},

	revokeToken: async ({ request, locals }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(apiTokenRevokeSchema));
		if (!form.valid) return fail(400, { form });
		if (!revokeApiToken(actor, form.data.id))
			return fail(404, {
				form,
				revokeError: 'That token was not found; it may be revoked already.'
			});
		return { form, revoked: true };
	}
};
