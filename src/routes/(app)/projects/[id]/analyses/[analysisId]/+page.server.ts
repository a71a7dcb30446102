import { error, redirect } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { getAnalysis } from '$lib/server/analyses';
import { kindScreenPath } from '$lib/kinds/names';
import type { PageServerLoad } from './$types';

/** An analysis opens in its kind's own screen; for a client, in its record. */
export const load: PageServerLoad = async ({ locals, params }) => {
	const { analysis, role } = await getAnalysis(requireActor(locals.actor), params.analysisId);
	if (analysis.projectId !== params.id) error(404, 'Not found.');
	if (role === 'client')
		redirect(303, `/projects/${analysis.projectId}/analyses/${analysis.id}/record`);
	redirect(303, kindScreenPath(analysis.projectId, analysis.kind, analysis.id));
};
