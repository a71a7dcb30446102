import { redirect } from '@sveltejs/kit';
import { joinCodeSchema } from '$lib/schemas/class-session';
import type { PageServerLoad } from './$types';

// The short address students type: /c, then the code (a GET form, so it works on any phone).
export const load: PageServerLoad = ({ url }) => {
	const typed = url.searchParams.get('code');
	if (typed === null) return { typed: '', problem: null };
	const code = joinCodeSchema.safeParse(typed);
	if (code.success) redirect(303, `/c/${code.data}`);
	return { typed: typed.slice(0, 20), problem: code.error.issues[0].message };
};
