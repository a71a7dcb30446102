import type { RequestHandler } from './$types';
import { requireActor } from '$lib/server/access';
import { getAnalysis } from '$lib/server/analyses';
import { api } from '$lib/server/http';
import { recordPdfResponse } from '$lib/server/record-http';
import { analysisRecord } from '$lib/server/records';

/** One analysis's record as a PDF: members of its workshop and the project's clients. */
export const GET: RequestHandler = api(async ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	const { analysis } = await getAnalysis(actor, params.id);
	return recordPdfResponse((await analysisRecord(actor, analysis.projectId, analysis.id)).record);
});
