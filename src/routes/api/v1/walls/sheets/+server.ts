import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { api, problem, readJson } from '$lib/server/http';
import { toSheetRequest, toWallDesign, wallDesignSchema } from '$lib/schemas/wall';
import { JoineryInputError } from '$lib/engine/joinery';
import { wallSheets } from '$lib/engine/wall';

/** Sheet layouts of a wall's cut list (the body's `sheets` sets kerf, trim and stock): open to
 * anyone, nothing stored. */
export const POST: RequestHandler = api(async ({ request }) => {
	const body = await readJson(request, wallDesignSchema);
	if (!body.ok) return body.response;
	try {
		return json(wallSheets(toWallDesign(body.data), toSheetRequest(body.data)));
	} catch (e) {
		if (e instanceof JoineryInputError)
			return problem(422, 'Some fields need attention.', e.issues);
		throw e;
	}
});
