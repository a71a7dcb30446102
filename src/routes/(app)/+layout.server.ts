import { redirect } from '@sveltejs/kit';
import type { LayoutServerLoad } from './$types';

// Signed-in area. Each page's load and action still checks the actor and role itself.
export const load: LayoutServerLoad = ({ locals, url }) => {
	if (!locals.actor) redirect(303, `/signin?next=${encodeURIComponent(url.pathname + url.search)}`);
};
