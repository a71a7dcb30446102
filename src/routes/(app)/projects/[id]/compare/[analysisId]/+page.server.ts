import { comparisonRequestSchema } from '$lib/schemas/analysis';
import { loadSavedAnalysis, saveAnalysis } from '../../save-analysis.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => loadSavedAnalysis(event, 'comparison');

export const actions: Actions = {
	save: (event) =>
		saveAnalysis(event, 'comparison', comparisonRequestSchema, 'compare', event.params.analysisId)
};
