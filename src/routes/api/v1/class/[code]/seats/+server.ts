import type { RequestHandler } from './$types';
import { json } from '@sveltejs/kit';
import { countMiss, limitJoin } from '$lib/server/class-limits';
import { classByCode, joinClass } from '$lib/server/class-sessions';
import { api, problem, readJson } from '$lib/server/http';
import { joinClassSchema, joinCodeSchema } from '$lib/schemas/class-session';

// A student joins with a nickname: the only thing taken from them. The seat token comes back once.
export const POST: RequestHandler = api(async ({ params, request, getClientAddress }) => {
	const address = getClientAddress();
	const limited = await limitJoin(address);
	if (limited) return limited;
	const code = joinCodeSchema.safeParse(params.code);
	if (!code.success || !(await classByCode(code.data))) {
		await countMiss(address);
		return problem(404, 'No open session has that code. Check it on the teacher’s screen.');
	}
	const body = await readJson(request, joinClassSchema);
	if (!body.ok) return body.response;
	return json(await joinClass(code.data, body.data.nickname), { status: 201 });
});
