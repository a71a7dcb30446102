import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { deleteDocument, getDocument, updateDocument } from '$lib/server/documents';
import { api, readJson } from '$lib/server/http';
import { documentPatchSchema } from '$lib/schemas/document';

export const GET: RequestHandler = api(async ({ locals, params }) =>
	json((await getDocument(requireActor(locals.actor), params.id)).document)
);

export const PATCH: RequestHandler = api(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	await getDocument(actor, params.id);
	const body = await readJson(request, documentPatchSchema);
	if (!body.ok) return body.response;
	return json(await updateDocument(actor, params.id, body.data));
});

export const DELETE: RequestHandler = api(async ({ locals, params }) => {
	const { undoUntil } = await deleteDocument(requireActor(locals.actor), params.id);
	return json({ undoUntil });
});
