import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { duplicateAnalysis } from '$lib/server/analyses';
import { analysisApi, versionTag } from '$lib/server/analysis-http';
import { readJson } from '$lib/server/http';
import { analysisDuplicateSchema } from '$lib/schemas/analysis';

export const POST: RequestHandler = analysisApi(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, analysisDuplicateSchema);
	if (!body.ok) return body.response;
	const copy = await duplicateAnalysis(actor, params.id, body.data);
	return json(copy, {
		status: 201,
		headers: { etag: versionTag(copy.version), location: `/api/v1/analyses/${copy.id}` }
	});
});
