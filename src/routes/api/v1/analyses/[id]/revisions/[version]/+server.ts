import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireActor } from '$lib/server/access';
import { getRevision, restoreRevision } from '$lib/server/analyses';
import { analysisApi, baseVersion, versionTag } from '$lib/server/analysis-http';
import { problem, readJson } from '$lib/server/http';
import { analysisRestoreSchema } from '$lib/schemas/analysis';

const versionParam = z.coerce.number().int().min(1);

function versionOf(raw: string) {
	const parsed = versionParam.safeParse(raw);
	return parsed.success ? parsed.data : null;
}

export const GET: RequestHandler = analysisApi(async ({ locals, params }) => {
	const version = versionOf(params.version);
	if (version === null) return problem(404, 'Not found.');
	const { revision } = await getRevision(requireActor(locals.actor), params.id, version);
	return json(revision);
});

/** Restore this version as a new one; If-Match or `version` guards against a stale restore. */
export const POST: RequestHandler = analysisApi(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	const version = versionOf(params.version);
	if (version === null) return problem(404, 'Not found.');
	const body = await readJson(request, analysisRestoreSchema);
	if (!body.ok) return body.response;
	// the guard is optional here: a restore loses nothing, the current version stays in history
	const base = baseVersion(request, body.data.version);
	if (!base.ok && base.response.status !== 428) return base.response;
	const analysis = await restoreRevision(
		actor,
		params.id,
		version,
		base.ok ? base.version : undefined
	);
	return json(analysis, { headers: { etag: versionTag(analysis.version) } });
});
