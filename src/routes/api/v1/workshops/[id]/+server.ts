import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { api, readJson } from '$lib/server/http';
import { deleteWorkshop, getWorkshop, listMembers, renameWorkshop } from '$lib/server/workshops';
import { workshopNameSchema } from '$lib/schemas/workshop';

export const GET: RequestHandler = api(async ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	const ws = await getWorkshop(actor, params.id);
	return json({ ...ws, members: await listMembers(actor, params.id) });
});

export const PATCH: RequestHandler = api(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	await getWorkshop(actor, params.id);
	const body = await readJson(request, workshopNameSchema);
	if (!body.ok) return body.response;
	return json(await renameWorkshop(actor, params.id, body.data.name));
});

export const DELETE: RequestHandler = api(async ({ locals, params }) => {
	await deleteWorkshop(requireActor(locals.actor), params.id);
	return new Response(null, { status: 204 });
});
