import { error } from '@sveltejs/kit';
import { countMiss, refuseGuessing } from '$lib/server/class-limits';
import { classByCode } from '$lib/server/class-sessions';
import { joinCodeSchema } from '$lib/schemas/class-session';
import type { PageServerLoad } from './$types';

// A student's page of one class session: join with a nickname, then answer (see +page.svelte).
export const load: PageServerLoad = async ({ params, getClientAddress, setHeaders }) => {
	const address = getClientAddress();
	const refused = await refuseGuessing(address);
	if (refused) error(429, (await refused.json()).error);
	const code = joinCodeSchema.safeParse(params.code);
	const session = code.success ? await classByCode(code.data) : null;
	if (!session) await countMiss(address);
	setHeaders({ 'Cache-Control': 'no-store' });
	return { code: code.success ? code.data : params.code.slice(0, 20), session };
};
