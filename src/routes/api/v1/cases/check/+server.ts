import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { api, problem, readJson } from '$lib/server/http';
import { caseDesignSchema } from '$lib/schemas/case';
import { JoineryInputError } from '$lib/engine/joinery';
import { checkCaseSI } from '$lib/engine/case';

/** Check a whole case: open to anyone, nothing stored. */
export const POST: RequestHandler = api(async ({ request }) => {
	const body = await readJson(request, caseDesignSchema);
	if (!body.ok) return body.response;
	try {
		return json(checkCaseSI(body.data));
	} catch (e) {
		if (e instanceof JoineryInputError)
			return problem(422, 'Some fields need attention.', e.issues);
		throw e;
	}
});
