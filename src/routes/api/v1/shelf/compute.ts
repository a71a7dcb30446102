import { json, type RequestHandler } from '@sveltejs/kit';
import { computeAnswer, computeEndpoint } from '$lib/server/compute-api';
import { api, readJson } from '$lib/server/http';

/**
 * A POST route of an open compute endpoint (src/lib/server/compute-api.ts): validates its body with
 * the shared schema and returns what the engine computes. Open to anyone: it reads no stored data.
 * Problems the schema cannot see (an unknown material, solid wood across the grain) come back as 422
 * with the field named. The production server answers the same requests on its fast path
 * (src/lib/server/fast-path.ts) with the same code; this route answers everything else.
 */
export function computeRoute(path: string): RequestHandler {
	const endpoint = computeEndpoint(path);
	return api(async ({ request }) => {
		const body = await readJson(request, endpoint.schema);
		if (!body.ok) return body.response;
		const answer = computeAnswer(endpoint, body.data, new URL(request.url).searchParams);
		return json(answer.body, { status: answer.status });
	});
}
