import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { api, problem, readJson } from '$lib/server/http';
import { toWallDesign, wallDesignSchema } from '$lib/schemas/wall';
import { JoineryInputError } from '$lib/engine/joinery';
import { wallShop } from '$lib/engine/wall';

/** The cut list, banding and hardware of a wall: open to anyone, nothing stored. */
export const POST: RequestHandler = api(async ({ request }) => {
	const body = await readJson(request, wallDesignSchema);
	if (!body.ok) return body.response;
	try {
		const { cutList, banding, hardware } = wallShop(toWallDesign(body.data));
		return json({ estimate: true, cutList, banding, hardware });
	} catch (e) {
		if (e instanceof JoineryInputError)
			return problem(422, 'Some fields need attention.', e.issues);
		throw e;
	}
});
