import { currentWorkshop, listWorkshops } from '$lib/server/workshops';
import { lengthUnitOf } from '$lib/server/preferences';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async ({ locals }) => {
	const actor = locals.actor;
	if (!actor) return { actor: null, workshops: [], workshop: null, lengthUnit: 'frac16' as const };
	return {
		actor: { id: actor.id, name: actor.name, email: actor.email },
		workshops: await listWorkshops(actor),
		workshop: await currentWorkshop(actor),
		lengthUnit: await lengthUnitOf(actor)
	};
};
