import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { createAnalysis, listAnalyses } from '$lib/server/analyses';
import { analysisApi, versionTag } from '$lib/server/analysis-http';
import { readJson, readQuery } from '$lib/server/http';
import { analysisCreateSchema, analysisListQuerySchema } from '$lib/schemas/analysis';

export const GET: RequestHandler = analysisApi(async ({ locals, params, url }) => {
	const actor = requireActor(locals.actor);
	const query = readQuery(url, analysisListQuerySchema);
	if (!query.ok) return query.response;
	return json(await listAnalyses(actor, params.id, query.data));
});

export const POST: RequestHandler = analysisApi(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	const body = await readJson(request, analysisCreateSchema);
	if (!body.ok) return body.response;
	const analysis = await createAnalysis(actor, params.id, body.data);
	return json(analysis, {
		status: 201,
		headers: { etag: versionTag(analysis.version), location: `/api/v1/analyses/${analysis.id}` }
	});
});
