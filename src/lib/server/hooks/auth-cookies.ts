import type { Handle } from '@sveltejs/kit';

/**
 * The cookies Auth.js sets through SvelteKit (reading the session, our sign-in forms): Secure only
 * over https (SvelteKit would mark them Secure on plain http too, and the browser would then drop
 * them), and no `authjs.callback-url` cookie on every answer — our forms pass where to go back to
 * with the request, and Auth.js's own /auth/* answers still set it where its flow needs it.
 */
export const authCookies: Handle = async ({ event, resolve }) => {
	const cookies = event.cookies;
	const set = cookies.set.bind(cookies);
	const secure = event.url.protocol === 'https:';
	cookies.set = (name, value, options) => {
		if (name.endsWith('authjs.callback-url')) return;
		set(name, value, { ...options, secure: options.secure ?? secure });
	};
	return resolve(event);
};
