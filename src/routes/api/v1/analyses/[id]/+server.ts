import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { deleteAnalysis, getAnalysis, updateAnalysis } from '$lib/server/analyses';
import { analysisApi, baseVersion, versionTag } from '$lib/server/analysis-http';
import { readJson } from '$lib/server/http';
import { analysisPatchSchema, analysisPutSchema } from '$lib/schemas/analysis';

export const GET: RequestHandler = analysisApi(async ({ locals, params }) => {
	const { analysis, role } = await getAnalysis(requireActor(locals.actor), params.id);
	return json({ ...analysis, role }, { headers: { etag: versionTag(analysis.version) } });
});

/** PATCH changes the name and/or input; PUT gives both. Either needs the version it is based on. */
function write(schema: typeof analysisPatchSchema | typeof analysisPutSchema): RequestHandler {
	return analysisApi(async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		await getAnalysis(actor, params.id);
		const body = await readJson(request, schema);
		if (!body.ok) return body.response;
		const base = baseVersion(request, body.data.version);
		if (!base.ok) return base.response;
		const { name, input } = body.data;
		const analysis = await updateAnalysis(actor, params.id, { name, input, version: base.version });
		return json(analysis, { headers: { etag: versionTag(analysis.version) } });
	});
}

export const PATCH = write(analysisPatchSchema);
export const PUT = write(analysisPutSchema);

export const DELETE: RequestHandler = analysisApi(async ({ locals, params }) => {
	return json(await deleteAnalysis(requireActor(locals.actor), params.id));
});
