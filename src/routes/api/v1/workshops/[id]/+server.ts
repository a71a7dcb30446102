import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { api, readJson } from '$lib/server/http';
import {
	deleteWorkshop,
	getWorkshop,
	listMembers,
	renameWorkshop,
	setClassMode
} from '$lib/server/workshops';
import { workshopPatchSchema } from '$lib/schemas/workshop';

export const GET: RequestHandler = api(async ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	const ws = await getWorkshop(actor, params.id);
	return json({ ...ws, members: await listMembers(actor, params.id) });
});

export const PATCH: RequestHandler = api(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	const current = await getWorkshop(actor, params.id);
	const body = await readJson(request, workshopPatchSchema);
	if (!body.ok) return body.response;
	const { name, isClass } = body.data;
	let ws = { ...current };
	if (isClass !== undefined) ws = { ...ws, ...(await setClassMode(actor, params.id, isClass)) };
	if (name !== undefined) ws = { ...ws, ...(await renameWorkshop(actor, params.id, name)) };
	const { role: _r, ...workshop } = ws;
	void _r;
	return json(workshop);
});

export const DELETE: RequestHandler = api(async ({ locals, params }) => {
	await deleteWorkshop(requireActor(locals.actor), params.id);
	return new Response(null, { status: 204 });
});
