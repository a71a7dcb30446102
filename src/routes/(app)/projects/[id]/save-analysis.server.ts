// The save action shared by the analysis screens: validate the form and the input with the shared
// schemas, then create (303 to the saved analysis) or update (409 when someone saved in between).
import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import { requireActor } from '$lib/server/access';
import { AnalysisProblem, createAnalysis, getAnalysis, updateAnalysis } from '$lib/server/analyses';
import type { AnalysisKind } from '$lib/server/db/schema';
import { analysisFormSchema } from '$lib/schemas/analysis-form';
import { readForm } from '$lib/server/form-body';
import { fieldIssues } from '$lib/schemas/issues';

type Issue = { path: (string | number)[]; message: string };

export async function saveAnalysis(
	event: RequestEvent,
	kind: AnalysisKind,
	inputSchema: z.ZodType,
	screen: string,
	analysisId?: string
) {
	const actor = requireActor(event.locals.actor);
	const projectId = event.params.id!;
	const form = analysisFormSchema.safeParse(Object.fromEntries(await readForm(event.request)));
	if (!form.success) {
		const issues: Issue[] = fieldIssues(form.error);
		return fail(400, { message: issues[0]?.message ?? 'Check the form.', issues });
	}
	const input = inputSchema.safeParse(form.data.input);
	if (!input.success) {
		const issues = fieldIssues(input.error).map((i) => ({
			path: ['input', ...i.path],
			message: i.message
		}));
		return fail(400, { message: 'Some fields need attention before saving.', issues });
	}
	let id: string;
	try {
		if (analysisId) {
			const saved = updateAnalysis(actor, analysisId, {
				name: form.data.name,
				input: form.data.input,
				version: form.data.version ?? 1
			});
			return { saved: true, version: saved.version };
		}
		id = createAnalysis(actor, projectId, {
			kind,
			name: form.data.name,
			input: form.data.input
		}).id;
	} catch (e) {
		if (e instanceof AnalysisProblem)
			return fail(e.status, { message: e.message, issues: e.issues as Issue[] });
		throw e;
	}
	redirect(303, `/projects/${projectId}/${screen}/${id}`);
}

/** The load of a saved analysis's screen: the analysis, if it is of this kind and in this project. */
export function loadSavedAnalysis(
	event: Pick<RequestEvent, 'locals' | 'params'>,
	kind: AnalysisKind
) {
	const { analysis, project, role } = getAnalysis(
		requireActor(event.locals.actor),
		event.params.analysisId!
	);
	if (analysis.projectId !== event.params.id || analysis.kind !== kind) error(404, 'Not found.');
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
}
