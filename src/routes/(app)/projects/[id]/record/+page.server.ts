import { requireActor } from '$lib/server/access';
import { projectRecord } from '$lib/server/records';
import { recordActions, recordPanel } from '../record-actions.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { record, role } = await projectRecord(requireActor(event.locals.actor), event.params.id);
	return { record, role, panel: await recordPanel(event, role, record) };
};

export const actions: Actions = recordActions;
