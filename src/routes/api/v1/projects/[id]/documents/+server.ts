import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { addDocument, listDocuments } from '$lib/server/documents';
import { api } from '$lib/server/http';
import { readUpload } from '$lib/server/uploads';

export const GET: RequestHandler = api(async ({ locals, params }) =>
	json({ items: await listDocuments(requireActor(locals.actor), params.id) })
);

export const POST: RequestHandler = api(async ({ locals, params, request }) => {
	const actor = requireActor(locals.actor);
	const read = await readUpload(request);
	if (!read.ok) return read.response;
	const document = await addDocument(actor, params.id, read.upload.file, read.upload.fields);
	return json(document, { status: 201 });
});
