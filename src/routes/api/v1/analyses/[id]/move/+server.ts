import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { moveAnalysis } from '$lib/server/analyses';
import { analysisApi } from '$lib/server/analysis-http';
import { readJson } from '$lib/server/http';
import { analysisMoveSchema } from '$lib/schemas/analysis';

export const POST: RequestHandler = analysisApi(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, analysisMoveSchema);
	if (!body.ok) return body.response;
	return json(await moveAnalysis(actor, params.id, body.data.projectId));
});
