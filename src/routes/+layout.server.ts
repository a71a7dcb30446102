import { currentWorkshop, listWorkshops } from '$lib/server/workshops';
import { lengthUnitOf } from '$lib/server/preferences';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = ({ locals }) => {
	const actor = locals.actor;
	if (!actor) return { actor: null, workshops: [], workshop: null, lengthUnit: 'frac16' as const };
	return {
		actor: { id: actor.id, name: actor.name, email: actor.email },
		workshops: listWorkshops(actor),
		workshop: currentWorkshop(actor),
		lengthUnit: lengthUnitOf(actor)
	};
};
