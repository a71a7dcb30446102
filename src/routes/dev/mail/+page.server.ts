import { error } from '@sveltejs/kit';
import { dev } from '$app/environment';
import { listCaughtMail } from '$lib/server/dev/caught-mail';
import type { PageServerLoad } from './$types';

// Development only: what the local mail catcher kept. A production build answers 404 here
// (`dev` is false there at build time, so the folder is never read).
export const load: PageServerLoad = () => {
	if (!dev) error(404, 'Not found.');
	return {
		messages: listCaughtMail()
			.slice(0, 100)
			.map(({ id, to, from, subject, text, links, receivedAt }) => ({
				id,
				to,
				from,
				subject,
				text,
				links,
				receivedAt
			}))
	};
};
