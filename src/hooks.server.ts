import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { building, dev } from '$app/environment';
import { actorFromBearer } from '$lib/server/accounts/api-tokens';
import { actorForUserId } from '$lib/server/accounts/users';
import { authHandle, authSecret, OPEN_API } from '$lib/server/auth';
import { apiJson } from '$lib/server/hooks/api-json';
import { authCookies } from '$lib/server/hooks/auth-cookies';
import { computeLimit } from '$lib/server/hooks/compute-limit';
import { originCheck } from '$lib/server/hooks/origin-check';
import { closeUnreadBody } from '$lib/server/hooks/unread-body';
import { HSTS, SECURITY_HEADERS } from '$lib/server/hooks/security-headers';
import { reportError } from '$lib/server/errors';
import { registerFastPath } from '$lib/server/fast-path';
import { sweepOrphanFiles } from '$lib/server/documents';
import { dbReady } from '$lib/server/db';
// units beyond the trade's table (unit-table.ts) are read on the server with mathjs
import '$lib/engine/units/quantity-full';

/**
 * Refuse to start a production server without AUTH_SECRET, rather than fail every request; open the
 * database and apply its migrations before the first request.
 */
export const init: ServerInit = async () => {
	if (building) return;
	authSecret();
	await dbReady();
	// the production server (server.js) answers the open compute routes with it, ahead of SvelteKit
	registerFastPath();
	// files left by a crash mid-upload or a deleted project; never holds up the start
	sweepOrphanFiles().catch((e) => console.error('Sweeping orphan document files failed:', e));
};

/** Who is acting: an API token on /api/ requests, else the Auth.js session cookie. */
export const actorHandle: Handle = async ({ event, resolve }) => {
	event.locals.actor = null;
	if (OPEN_API.test(event.url.pathname)) return resolve(event);
	const authorization = event.request.headers.get('authorization');
	if (authorization && event.url.pathname.startsWith('/api/')) {
		// a bad or revoked token is anonymous, never a fallback to the cookie
		event.locals.actor = await actorFromBearer(authorization);
	} else {
		const session = await event.locals.auth();
		const userId = session?.user?.id;
		if (userId) event.locals.actor = await actorForUserId(userId, 'session');
	}
	return resolve(event);
};

/** The usual security headers; the CSP itself comes from svelte.config.js. */
export const securityHeaders: Handle = async ({ event, resolve }) => {
	let response = await resolve(event);
	const headers: Record<string, string> = { ...SECURITY_HEADERS };
	if (!dev) headers['Strict-Transport-Security'] = HSTS;
	// what a signed-in person sees is theirs: no shared cache keeps it, no browser cache stores it
	if (event.locals?.actor) headers['Cache-Control'] = 'private, no-store';
	try {
		for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
	} catch {
		// some responses (e.g. Response.redirect) have immutable headers: copy them
		response = new Response(response.body, response);
		for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
	}
	return response;
};

// Headers outermost, so Auth.js's own responses (it answers /auth/* itself) get them too.
/** Every request's hooks, outermost first (exported for the fast path's sameness test). */
export const handles: Handle[] = [
	closeUnreadBody,
	securityHeaders,
	originCheck,
	apiJson,
	computeLimit,
	authCookies,
	authHandle,
	actorHandle
];

export const handle = sequence(...handles);

/** Log unexpected errors with an id; the client sees only a plain message and that id. */
export const handleError: HandleServerError = ({ error, event, status, message }) =>
	reportError({ error, status, message, method: event.request.method, path: event.url.pathname });
