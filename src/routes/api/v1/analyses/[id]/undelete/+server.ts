import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { undoDelete } from '$lib/server/analyses';
import { analysisApi } from '$lib/server/analysis-http';

/** The Undo of a delete, within the window the DELETE answer names (undoUntil). */
export const POST: RequestHandler = analysisApi(async ({ locals, params }) => {
	return json(await undoDelete(requireActor(locals.actor), params.id));
});
