import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { api, problem, readJson } from '$lib/server/http';
import { stabilityRequestSchema } from '$lib/schemas/stability';
import { JoineryInputError } from '$lib/engine/joinery';
import { checkStabilitySI } from '$lib/engine/stability';

/** Tip-over and anchoring of one case: open to anyone, nothing stored. */
export const POST: RequestHandler = api(async ({ request }) => {
	const body = await readJson(request, stabilityRequestSchema);
	if (!body.ok) return body.response;
	try {
		return json(checkStabilitySI(body.data));
	} catch (e) {
		if (e instanceof JoineryInputError)
			return problem(422, 'Some fields need attention.', e.issues);
		throw e;
	}
});
