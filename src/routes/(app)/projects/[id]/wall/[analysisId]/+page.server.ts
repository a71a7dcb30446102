import { loadSavedAnalysis, saveAnalysis } from '../../save-analysis.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => loadSavedAnalysis(event, 'wall');

export const actions: Actions = {
	save: (event) => saveAnalysis(event, 'wall', event.params.analysisId)
};
