import { error, redirect } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { acceptInvitation, findInvitation } from '$lib/server/workshops';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ params, locals }) => {
	const found = await findInvitation(params.token);
	if (found.state === 'unknown') error(404, 'This invitation link is not known.');
	const inv = found.invitation;
	return {
		state: found.state,
		workshopName: inv.workshopName,
		role: inv.role,
		email: inv.email,
		signedInAs: locals.actor?.email ?? null
	};
};

export const actions: Actions = {
	accept: async ({ params, locals }) => {
		const { outcome } = await acceptInvitation(requireActor(locals.actor), params.token);
		// a newcomer goes straight in; a member whose role changed (or could not) is told first
		if (outcome.kind === 'joined') redirect(303, '/projects');
		return { outcome };
	}
};
