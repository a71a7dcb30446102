import type { Handle } from '@sveltejs/kit';

/**
 * A request answered before its body was read (a 413 for a body too large, a 401 before an
 * anonymous upload is looked at) leaves that body in the connection, and the next request on a
 * kept-alive connection would wait behind it. Such answers close the connection instead of
 * reading what may be a large body only to throw it away.
 */
export const closeUnreadBody: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	if (!event.request.body || event.request.bodyUsed) return response;
	try {
		response.headers.set('connection', 'close');
		return response;
	} catch {
		// immutable headers (Response.redirect): copy
		const copy = new Response(response.body, response);
		copy.headers.set('connection', 'close');
		return copy;
	}
};
