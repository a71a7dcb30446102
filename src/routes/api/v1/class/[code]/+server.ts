import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { countMiss, refuseGuessing } from '$lib/server/class-limits';
import { classByCode } from '$lib/server/class-sessions';
import { api, problem } from '$lib/server/http';
import { joinCodeSchema } from '$lib/schemas/class-session';

// What every student's phone polls: the step, its question, and the answer once revealed.
export const GET: RequestHandler = api(async ({ params, getClientAddress }) => {
	const address = getClientAddress();
	const refused = await refuseGuessing(address);
	if (refused) return refused;
	const code = joinCodeSchema.safeParse(params.code);
	const view = code.success ? await classByCode(code.data) : null;
	if (!view) {
		await countMiss(address);
		return problem(404, 'No open session has that code. It may have ended.');
	}
	return json(view, { headers: { 'Cache-Control': 'no-store' } });
});
