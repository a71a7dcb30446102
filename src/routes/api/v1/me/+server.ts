import { json } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { getProfile } from '$lib/server/accounts/profile';
import { api } from '$lib/server/http';
import { listWorkshops } from '$lib/server/workshops';
import type { RequestHandler } from './$types';

/** Who the caller is, how they signed in, their workshops and their length unit. */
export const GET: RequestHandler = api(async ({ locals }) => {
	const actor = requireActor(locals.actor);
	const profile = await getProfile(actor);
	return json({
		id: actor.id,
		email: actor.email,
		name: actor.name,
		via: actor.via,
		lengthUnit: profile.lengthUnit,
		workshops: await listWorkshops(actor)
	});
});
