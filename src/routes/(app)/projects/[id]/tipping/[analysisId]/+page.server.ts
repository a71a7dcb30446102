import { loadSavedAnalysis, saveAnalysis } from '../../save-analysis.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => loadSavedAnalysis(event, 'stability');

export const actions: Actions = {
	save: (event) => saveAnalysis(event, 'stability', event.params.analysisId)
};
