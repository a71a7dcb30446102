import { error } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { getAnalysis } from '$lib/server/analyses';
import { comparisonRequestSchema } from '$lib/schemas/analysis';
import { saveAnalysis } from '../../save-analysis.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals, params }) => {
	const { analysis, project, role } = getAnalysis(requireActor(locals.actor), params.analysisId);
	if (analysis.projectId !== params.id || analysis.kind !== 'comparison') error(404, 'Not found.');
	return {
		project: { id: project.id, name: project.name },
		role,
		analysis: {
			id: analysis.id,
			name: analysis.name,
			input: analysis.input,
			version: analysis.version,
			updatedAt: analysis.updatedAt,
			updatedByName: analysis.updatedByName
		}
	};
};

export const actions: Actions = {
	save: (event) =>
		saveAnalysis(event, 'comparison', comparisonRequestSchema, 'compare', event.params.analysisId)
};
