import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { listRevisions } from '$lib/server/analyses';
import { analysisApi } from '$lib/server/analysis-http';

export const GET: RequestHandler = analysisApi(async ({ locals, params }) => {
	return json({ items: await listRevisions(requireActor(locals.actor), params.id) });
});
