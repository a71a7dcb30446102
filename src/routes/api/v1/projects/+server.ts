import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { api, readJson, readQuery } from '$lib/server/http';
import { createProject, listProjects } from '$lib/server/projects';
import { projectCreateSchema, projectListQuerySchema } from '$lib/schemas/project';

export const GET: RequestHandler = api(async ({ locals, url }) => {
	const actor = requireActor(locals.actor);
	const query = readQuery(url, projectListQuerySchema);
	if (!query.ok) return query.response;
	return json(await listProjects(actor, query.data));
});

export const POST: RequestHandler = api(async ({ locals, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, projectCreateSchema);
	if (!body.ok) return body.response;
	const { workshopId, ...input } = body.data;
	return json(await createProject(actor, workshopId, input), { status: 201 });
});
