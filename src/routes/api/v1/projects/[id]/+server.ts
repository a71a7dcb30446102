import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { api, readJson } from '$lib/server/http';
import { deleteProject, getProject, updateProject } from '$lib/server/projects';
import { projectPatchSchema } from '$lib/schemas/project';

export const GET: RequestHandler = api(async ({ locals, params }) => {
	const { project, role } = await getProject(requireActor(locals.actor), params.id);
	return json({ ...project, role });
});

export const PATCH: RequestHandler = api(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	await getProject(actor, params.id);
	const body = await readJson(request, projectPatchSchema);
	if (!body.ok) return body.response;
	return json(await updateProject(actor, params.id, body.data));
});

export const DELETE: RequestHandler = api(async ({ locals, params }) => {
	await deleteProject(requireActor(locals.actor), params.id);
	return new Response(null, { status: 204 });
});
