import type { Handle } from '@sveltejs/kit';
import { problem } from '../http';

const FORM_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data', 'text/plain'];
const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Cross-site form posts are refused, as SvelteKit's own origin check did (svelte.config.js turns
 * that one off), but the API answers its refusal as JSON and the pages as plain text.
 */
export const originCheck: Handle = async ({ event, resolve }) => {
	const { request, url } = event;
	const type = (request.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase();
	if (
		UNSAFE.has(request.method) &&
		FORM_TYPES.includes(type) &&
		request.headers.get('origin') !== url.origin
	) {
		const message = `Cross-site ${request.method} form submissions are forbidden.`;
		if (url.pathname.startsWith('/api/')) return problem(403, message);
		return new Response(message, { status: 403, headers: { 'content-type': 'text/plain' } });
	}
	return resolve(event);
};
