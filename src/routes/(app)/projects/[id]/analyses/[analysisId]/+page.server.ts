import { error, redirect } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { getAnalysis } from '$lib/server/analyses';
import { kindScreenPath } from '$lib/kinds/names';
import type { PageServerLoad } from './$types';

/** An analysis opens in its kind's own screen. */
export const load: PageServerLoad = ({ locals, params }) => {
	const { analysis } = getAnalysis(requireActor(locals.actor), params.analysisId);
	if (analysis.projectId !== params.id) error(404, 'Not found.');
	redirect(303, kindScreenPath(analysis.projectId, analysis.kind, analysis.id));
};
