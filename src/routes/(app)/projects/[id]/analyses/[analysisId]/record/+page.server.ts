import { requireActor } from '$lib/server/access';
import { analysisRecord } from '$lib/server/records';
import { recordActions, recordPanel } from '../../../record-actions.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const { params } = event;
	const actor = requireActor(event.locals.actor);
	const { record, role } = await analysisRecord(actor, params.id, params.analysisId);
	return { record, role, panel: await recordPanel(event, role, record, params.analysisId) };
};

export const actions: Actions = recordActions;
