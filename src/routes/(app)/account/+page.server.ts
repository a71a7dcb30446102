import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import {
	apiTokenCreateSchema,
	apiTokenRevokeSchema,
	profileSchema,
	signOutEverywhereSchema
} from '$lib/schemas/account';
import { requireActor } from '$lib/server/access';
import {
	createApiToken,
	listApiTokens,
	revokeAllApiTokens,
	revokeApiToken
} from '$lib/server/accounts/api-tokens';
import { endAllSessions } from '$lib/server/accounts/sessions';
import { signOutOf } from '$lib/server/auth';
import { getProfile, updateProfile } from '$lib/server/accounts/profile';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async ({ locals }) => {
	if (!locals.actor) redirect(303, '/signin?next=/account');
	const profile = await getProfile(locals.actor);
	return {
		email: profile.email,
		profile: await superValidate(
			{ name: profile.name ?? '', lengthUnit: profile.lengthUnit },
			zod4(profileSchema),
			{ id: 'profile' }
		),
		newToken: await superValidate(zod4(apiTokenCreateSchema), { id: 'token' }),
		tokens: await listApiTokens(locals.actor),
		everywhere: await superValidate({ revokeTokens: true }, zod4(signOutEverywhereSchema), {
			id: 'everywhere'
		})
	};
};

export const actions: Actions = {
	profile: async ({ request, locals }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(profileSchema), {
			id: 'profile'
		});
		if (!form.valid) return fail(400, { form });
		await updateProfile(actor, form.data);
		return message(form, 'Saved.');
	},

	createToken: async ({ request, locals }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(apiTokenCreateSchema), {
			id: 'token'
		});
		if (!form.valid) return fail(400, { form });
		const token = await createApiToken(actor, form.data);
		// Shown once, in this answer only (not in a redirect URL): it is stored only as a hash.
		return message(form, { name: token.name, secret: token.secret });
	},

	revokeToken: async ({ request, locals }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(apiTokenRevokeSchema));
		if (!form.valid) return fail(400, { form });
		if (!(await revokeApiToken(actor, form.data.id)))
			return fail(404, {
				form,
				revokeError: 'That token was not found; it may be revoked already.'
			});
		return { form, revoked: true };
	},

	/** End every session of this account (other browsers, copied cookies), and this one. */
	signOutEverywhere: async (event) => {
		const actor = requireActor(event.locals.actor);
		const form = await superValidate(await readForm(event.request), zod4(signOutEverywhereSchema), {
			id: 'everywhere'
		});
		if (!form.valid) return fail(400, { everywhere: form });
		await endAllSessions(actor.id);
		if (form.data.revokeTokens) await revokeAllApiTokens(actor.id);
		await signOutOf(event);
		redirect(
			303,
			`/signin?notice=${form.data.revokeTokens ? 'signed-out-everywhere-tokens' : 'signed-out-everywhere'}`
		);
	}
};
