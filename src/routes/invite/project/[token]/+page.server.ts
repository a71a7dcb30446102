import { error, redirect } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { acceptProjectInvitation, findProjectInvitation } from '$lib/server/project-access';
import type { Actions, PageServerLoad } from './$types';

// An invitation to read one project as its client: sign in or sign up with the address it was
// sent to, then accept; the project opens.
export const load: PageServerLoad = async ({ params, locals }) => {
	const found = await findProjectInvitation(params.token);
	if (found.state === 'unknown') error(404, 'This invitation link is not known.');
	const inv = found.invitation;
	return {
		state: found.state,
		projectName: inv.projectName,
		workshopName: inv.workshopName,
		email: inv.email,
		signedInAs: locals.actor?.email ?? null
	};
};

export const actions: Actions = {
	accept: async ({ params, locals }) => {
		const inv = await acceptProjectInvitation(requireActor(locals.actor), params.token);
		redirect(303, `/projects/${inv.projectId}`);
	}
};
