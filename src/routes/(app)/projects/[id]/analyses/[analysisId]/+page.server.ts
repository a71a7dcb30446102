import { error, redirect } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { getAnalysis } from '$lib/server/analyses';
import type { PageServerLoad } from './$types';

const EDITOR: Record<string, string> = {
	shelf: 'shelf',
	comparison: 'compare',
	case: 'case',
	joint: 'joint',
	stability: 'stability'
};

/** An analysis opens in its kind's own screen. */
export const load: PageServerLoad = ({ locals, params }) => {
	const { analysis } = getAnalysis(requireActor(locals.actor), params.analysisId);
	if (analysis.projectId !== params.id) error(404, 'Not found.');
	redirect(303, `/projects/${analysis.projectId}/${EDITOR[analysis.kind]}/${analysis.id}`);
};
