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
import { sweepOrphanFiles } from '$lib/server/documents';
// units beyond the trade's table (unit-table.ts) are read on the server with mathjs
import '$lib/engine/units/quantity-full';

/** Refuse to start a production server without AUTH_SECRET, rather than fail every request. */
export const init: ServerInit = () => {
	if (building) return;
	authSecret();
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
		event.locals.actor = actorFromBearer(authorization);
	} else {
		const session = await event.locals.auth();
		const userId = session?.user?.id;
		if (userId) event.locals.actor = actorForUserId(userId, 'session');
	}
	return resolve(event);
};

const SECURITY_HEADERS: Record<string, string> = {
	'X-Content-Type-Options': 'nosniff',
	'Referrer-Policy': 'strict-origin-when-cross-origin',
	'X-Frame-Options': 'DENY',
	'Permissions-Policy':
		'camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()',
	'Cross-Origin-Opener-Policy': 'same-origin'
};

/** The usual security headers; the CSP itself comes from svelte.config.js. */
export const securityHeaders: Handle = async ({ event, resolve }) => {
	let response = await resolve(event);
	const headers: Record<string, string> = { ...SECURITY_HEADERS };
	if (!dev) headers['Strict-Transport-Security'] = 'max-age=63072000; includeSubDomains';
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
export const handle = sequence(
	closeUnreadBody,
	securityHeaders,
	originCheck,
	apiJson,
	computeLimit,
	authCookies,
	authHandle,
	actorHandle
);

/** Log unexpected errors with an id; the client sees only a plain message and that id. */
export const handleError: HandleServerError = ({ error, event, status, message }) => {
	const id = crypto.randomUUID();
	const where = `[${id}] ${status} ${event.request.method} ${event.url.pathname}`;
	// a refusal (4xx) is an everyday answer: one line, no stack; only server errors get the stack
	if (status >= 500) console.error(where, error);
	else if (status !== 404) console.warn(`${where}: ${message}`);
	return {
		message:
			status === 404 ? 'Not found.' : status >= 500 ? 'Something went wrong on our side.' : message,
		id
	};
};
