import { json, type RequestHandler } from '@sveltejs/kit';
import type { z } from 'zod';
import { ShelfInputError } from '$lib/engine';
import { problem, readJson } from '$lib/server/http';

/**
 * A POST route that validates its body with a shared schema and returns what the engine computes.
 * Open to anyone: it reads no stored data. Problems the schema cannot see (an unknown material,
 * solid wood across the grain) come back as 422 with the field named.
 */
export function computeRoute<S extends z.ZodType, R>(
	schema: S,
	compute: (input: z.output<S>) => R
): RequestHandler {
	return async ({ request }) => {
		const body = await readJson(request, schema);
		if (!body.ok) return body.response;
		try {
			return json(compute(body.data));
		} catch (e) {
			if (e instanceof ShelfInputError)
				return problem(422, 'Some fields need attention.', e.issues);
			throw e;
		}
	};
}
