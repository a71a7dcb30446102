import { error, fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import {
	AnalysisProblem,
	getAnalysis,
	getRevision,
	listRevisions,
	restoreRevision
} from '$lib/server/analyses';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

const versionSchema = z.coerce.number().int().min(1);
/** Restore: the version to bring back, and the version the page showed as current. */
const restoreSchema = z.object({ version: versionSchema, current: versionSchema });

export const load: PageServerLoad = async ({ locals, params, url }) => {
	const actor = requireActor(locals.actor);
	const { analysis, project, role } = await getAnalysis(actor, params.analysisId);
	if (analysis.projectId !== params.id) error(404, 'Not found.');
	const revisions = await listRevisions(actor, analysis.id);
	const asked = versionSchema.safeParse(url.searchParams.get('v') ?? analysis.version);
	const shown = asked.success ? (await getRevision(actor, analysis.id, asked.data)).revision : null;
	return {
		analysis: {
			id: analysis.id,
			name: analysis.name,
			kind: analysis.kind,
			version: analysis.version
		},
		project: { id: project.id, name: project.name },
		role,
		revisions: revisions.map(({ version, name, summary, createdAt, changedByName, current }) => ({
			version,
			name,
			summary,
			createdAt,
			changedByName,
			current
		})),
		shown: shown && {
			version: shown.version,
			name: shown.name,
			summary: shown.summary,
			inputRows: shown.inputRows,
			engineVersion: shown.engineVersion
		}
	};
};

export const actions: Actions = {
	restore: async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(restoreSchema));
		if (!form.valid) return fail(400, { problem: 'Pick a version to restore.' });
		try {
			await restoreRevision(actor, params.analysisId, form.data.version, form.data.current);
		} catch (e) {
			if (e instanceof AnalysisProblem) return fail(e.status, { problem: e.message });
			throw e;
		}
		redirect(303, `/projects/${params.id}/analyses/${params.analysisId}/history`);
	}
};
