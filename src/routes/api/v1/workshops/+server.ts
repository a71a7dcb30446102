import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { api, readJson } from '$lib/server/http';
import { createWorkshopFor, listWorkshops } from '$lib/server/workshops';
import { workshopNameSchema } from '$lib/schemas/workshop';

export const GET: RequestHandler = api(async ({ locals }) =>
	json({ items: await listWorkshops(requireActor(locals.actor)) })
);

export const POST: RequestHandler = api(async ({ locals, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, workshopNameSchema);
	if (!body.ok) return body.response;
	const ws = await createWorkshopFor(actor.id, body.data.name);
	return json({ ...ws, role: 'owner' }, { status: 201 });
});
