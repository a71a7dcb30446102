import { json } from '@sveltejs/kit';
import { apiTokenCreateSchema } from '$lib/schemas/account';
import { requireActor } from '$lib/server/access';
import { createApiToken, listApiTokens } from '$lib/server/accounts/api-tokens';
import { api, readJson } from '$lib/server/http';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = api(async ({ locals }) =>
	json({ items: await listApiTokens(requireActor(locals.actor)) })
);

/** Create a token; its secret is in this answer only. Needs a browser session, not a token. */
export const POST: RequestHandler = api(async ({ locals, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, apiTokenCreateSchema);
	if (!body.ok) return body.response;
	// createApiToken answers 403 when the caller is itself using a token
	return json(await createApiToken(actor, body.data), { status: 201 });
});
