import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { listClassSessions, startClassSession } from '$lib/server/class-sessions';
import { api, readJson } from '$lib/server/http';
import { startClassSchema } from '$lib/schemas/class-session';

export const GET: RequestHandler = api(async ({ locals }) =>
	json({ items: await listClassSessions(requireActor(locals.actor)) })
);

export const POST: RequestHandler = api(async ({ locals, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, startClassSchema);
	if (!body.ok) return body.response;
	return json(await startClassSession(actor, body.data), { status: 201 });
});
