import type { RequestHandler } from './$types';
import { requireActor } from '$lib/server/access';
import { readDocumentFile } from '$lib/server/documents';
import { api } from '$lib/server/http';
import { fileHeaders } from '$lib/server/uploads';

// The stored file (`?variant=thumbnail` for the small picture, `?download` to save it), served
// only to those who may see its project, never sniffed and never run.
export const GET: RequestHandler = api(async ({ locals, params, url }) => {
	const variant = url.searchParams.get('variant') === 'thumbnail' ? 'thumbnail' : 'original';
	const file = await readDocumentFile(requireActor(locals.actor), params.id, variant);
	return new Response(file.bytes.slice().buffer as ArrayBuffer, {
		headers: fileHeaders(file, url.searchParams.has('download'))
	});
});
