import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { countMiss, limitAnswer, refuseGuessing } from '$lib/server/class-limits';
import { answerClass, classByCode } from '$lib/server/class-sessions';
import { api, problem, readJson } from '$lib/server/http';
import { answerClassSchema, joinCodeSchema } from '$lib/schemas/class-session';

// A student's answer to the current question: only the choice is taken; the step is the server's.
export const PUT: RequestHandler = api(async ({ params, request, getClientAddress }) => {
	const address = getClientAddress();
	const refused = await refuseGuessing(address);
	if (refused) return refused;
	const code = joinCodeSchema.safeParse(params.code);
	if (!code.success || !(await classByCode(code.data))) {
		await countMiss(address);
		return problem(404, 'No open session has that code. It may have ended.');
	}
	const body = await readJson(request, answerClassSchema);
	if (!body.ok) return body.response;
	const limited = await limitAnswer(address, body.data.seat);
	if (limited) return limited;
	return json(await answerClass(code.data, body.data));
});
