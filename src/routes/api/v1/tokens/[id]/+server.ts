import { requireActor } from '$lib/server/access';
import { revokeApiToken } from '$lib/server/accounts/api-tokens';
import { api, problem } from '$lib/server/http';
import type { RequestHandler } from './$types';

/** Revoke one of the caller's own tokens (a token may revoke itself). */
export const DELETE: RequestHandler = api(async ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	if (!(await revokeApiToken(actor, params.id))) return problem(404, 'No such token of yours.');
	return new Response(null, { status: 204 });
});
