import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { api, problem, readJson } from '$lib/server/http';
import { jointRequestSchema } from '$lib/schemas/joinery';
import { JoineryInputError, planJointSI } from '$lib/engine/joinery';

/** Plan one joint: open to anyone, nothing stored. */
export const POST: RequestHandler = api(async ({ request }) => {
	const body = await readJson(request, jointRequestSchema);
	if (!body.ok) return body.response;
	try {
		return json(planJointSI(body.data));
	} catch (e) {
		if (e instanceof JoineryInputError)
			return problem(422, 'Some fields need attention.', e.issues);
		throw e;
	}
});
