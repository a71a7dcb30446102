import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { endClassSession, getClassSession, updateClassSession } from '$lib/server/class-sessions';
import { api, readJson } from '$lib/server/http';
import { updateClassSchema } from '$lib/schemas/class-session';

export const GET: RequestHandler = api(async ({ locals, params }) =>
	json(await getClassSession(requireActor(locals.actor), params.id))
);

export const PATCH: RequestHandler = api(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	await getClassSession(actor, params.id);
	const body = await readJson(request, updateClassSchema);
	if (!body.ok) return body.response;
	return json(await updateClassSession(actor, params.id, body.data));
});

export const DELETE: RequestHandler = api(async ({ locals, params }) => {
	await endClassSession(requireActor(locals.actor), params.id);
	return new Response(null, { status: 204 });
});
