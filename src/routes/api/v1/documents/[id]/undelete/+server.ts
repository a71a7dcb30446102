import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { undoDeleteDocument } from '$lib/server/documents';
import { api } from '$lib/server/http';

export const POST: RequestHandler = api(async ({ locals, params }) =>
	json(await undoDeleteDocument(requireActor(locals.actor), params.id))
);
