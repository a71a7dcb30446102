import { error } from '@sveltejs/kit';
import { dev } from '$app/environment';
import type { PageServerLoad } from './$types';

// Development only: what the local mail catcher kept. A production build answers 404 here, and
// since `dev` is the constant false there, the branch that reads the mail folder is not bundled.
export const load: PageServerLoad = async () => {
	if (!dev) error(404, 'Not found.');
	if (dev) {
		const { listCaughtMail } = await import('$lib/server/dev/caught-mail');
		const messages = listCaughtMail().slice(0, 100);
		return {
			messages: messages.map(({ id, to, from, subject, text, links, receivedAt }) => ({
				id,
				to,
				from,
				subject,
				text,
				links,
				receivedAt
			}))
		};
	}
	return { messages: [] };
};
