// The save form shared by the analysis screens (superforms, JSON): the name and version are checked
// here, the input once by its kind's schema when the data module computes it; then create (303 to
// the saved analysis) or update (409 when someone saved in between).
import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor, requireRole } from '$lib/server/access';
import { AnalysisProblem, createAnalysis, getAnalysis, updateAnalysis } from '$lib/server/analyses';
import { kindLabel, kindScreenPath, type AnalysisKind } from '$lib/kinds/names';
import { getProject } from '$lib/server/projects';
import {
	analysisSaveSchema,
	type AnalysisSave,
	type SaveMessage
} from '$lib/schemas/analysis-form';
import { readForm } from '$lib/server/form-body';

const adapter = zod4(analysisSaveSchema);

/** The save form of a screen: a new analysis's default name, or a saved one's name and version. */
export function saveForm(initial: { name: string; version?: number }) {
	return superValidate<AnalysisSave, SaveMessage>({ ...initial, input: null }, adapter, {
		errors: false
	});
}

/** "input.depth: Must be greater than zero." — the first field the server refused, by its path. */
function refusal(e: AnalysisProblem) {
	const first = e.issues[0];
	if (!first) return e.message;
	return `${e.message} ${first.path.length ? `${first.path.join('.')}: ` : ''}${first.message}`;
}

export async function saveAnalysis(event: RequestEvent, kind: AnalysisKind, analysisId?: string) {
	const actor = requireActor(event.locals.actor);
	const projectId = event.params.id!;
	const form = await superValidate<AnalysisSave, SaveMessage>(
		await readForm(event.request),
		adapter
	);
	if (!form.valid) return fail(400, { form });
	const { name, input, version } = form.data;
	let id: string;
	try {
		if (analysisId) {
			const saved = await updateAnalysis(actor, analysisId, { name, input, version: version ?? 1 });
			form.data.version = saved.version;
			return message(form, { text: 'Saved.', ok: true });
		}
		id = (await createAnalysis(actor, projectId, { kind, name, input })).id;
	} catch (e) {
		if (e instanceof AnalysisProblem)
			return message(form, { text: refusal(e), ok: false } satisfies SaveMessage, {
				status: e.status === 409 ? 409 : 422
			});
		throw e;
	}
	redirect(303, kindScreenPath(projectId, kind, id));
}

/**
 * The load of a new analysis's screen: an editor's or a student's (viewers read saved ones), named
 * by its kind.
 */
export async function loadNewAnalysis(
	event: Pick<RequestEvent, 'locals' | 'params'>,
	kind: AnalysisKind
) {
	const actor = requireActor(event.locals.actor);
	const { project } = await getProject(actor, event.params.id!);
	const { role } = await requireRole(actor, project.workshopId, 'student');
	return {
		project: { id: project.id, name: project.name },
		role,
		canChange: true,
		save: await saveForm({ name: kindLabel(kind) })
	};
}

/** The load of a saved analysis's screen: the analysis, if it is of this kind and in this project. */
export async function loadSavedAnalysis(
	event: Pick<RequestEvent, 'locals' | 'params'>,
	kind: AnalysisKind
) {
	const { analysis, project, role, canChange } = await getAnalysis(
		requireActor(event.locals.actor),
		event.params.analysisId!
	);
	if (analysis.projectId !== event.params.id || analysis.kind !== kind) error(404, 'Not found.');
	return {
		project: { id: project.id, name: project.name },
		role,
		// editors change any analysis, a student their own
		canChange,
		analysis: {
			id: analysis.id,
			name: analysis.name,
			input: analysis.input,
			version: analysis.version,
			updatedAt: analysis.updatedAt,
			updatedByName: analysis.updatedByName
		},
		save: await saveForm({ name: analysis.name, version: analysis.version })
	};
}
