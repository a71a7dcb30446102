import { redirect } from '@sveltejs/kit';
import { signOutOf } from '$lib/server/auth';
import type { Actions, PageServerLoad } from './$types';

// Signing out changes state, so it is a POST (the shell's button); a GET only shows the button.
export const load: PageServerLoad = ({ locals }) => {
	if (!locals.actor) redirect(303, '/signin');
};

export const actions: Actions = {
	default: async (event) => {
		await signOutOf(event);
		redirect(303, '/signin');
	}
};
