// The row actions of a project's analyses table as form actions: they work without JavaScript
// (a delete first asks again on the page) and the browser enhances them (menu, dialog, no reload).
import { fail, type RequestEvent } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import {
	AnalysisProblem,
	deleteAnalysis,
	duplicateAnalysis,
	getAnalysis,
	moveAnalysis,
	undoDelete
} from '$lib/server/analyses';
import { readForm } from '$lib/server/form-body';
import { getProject } from '$lib/server/projects';
import { analysisRowMoveSchema, analysisRowSchema } from '$lib/schemas/list-page';
import type { z } from 'zod';

async function read<S extends z.ZodType>(event: RequestEvent, schema: S) {
	const actor = requireActor(event.locals.actor);
	const parsed = schema.safeParse(Object.fromEntries(await readForm(event.request)));
	return { actor, parsed };
}

/** Run a data-module call; its refusals (409, 422) become the table's notice, not an error page. */
async function attempt<T>(run: () => Promise<T>) {
	try {
		return { ok: true as const, value: await run() };
	} catch (e) {
		if (e instanceof AnalysisProblem)
			return { ok: false as const, failure: fail(e.status, notice(e.message)) };
		throw e;
	}
}

/** What the table says after a row action; after a delete, the row that Undo brings back. */
type RowNotice = { text: string; undo?: { id: string; name: string } };
const notice = (text: string, undo?: RowNotice['undo']): { rowNotice: RowNotice } => ({
	rowNotice: { text, undo }
});
const invalid = (message: string) => fail(400, notice(message));

export const analysisRowActions = {
	duplicate: async (event: RequestEvent) => {
		const { actor, parsed } = await read(event, analysisRowSchema);
		if (!parsed.success) return invalid('Choose an analysis to copy.');
		const done = await attempt(async () => await duplicateAnalysis(actor, parsed.data.analysisId));
		if (!done.ok) return done.failure;
		return notice(`Copied as “${done.value.name}”.`);
	},
	move: async (event: RequestEvent) => {
		const { actor, parsed } = await read(event, analysisRowMoveSchema);
		if (!parsed.success) return invalid('Choose the project to move it to.');
		const done = await attempt(
			async () => await moveAnalysis(actor, parsed.data.analysisId, parsed.data.projectId)
		);
		if (!done.ok) return done.failure;
		const to = (await getProject(actor, parsed.data.projectId)).project.name;
		return notice(`Moved “${done.value.name}” to ${to}.`);
	},
	deleteAnalysis: async (event: RequestEvent) => {
		const { actor, parsed } = await read(event, analysisRowSchema);
		if (!parsed.success) return invalid('Choose an analysis to delete.');
		const { analysis } = await getAnalysis(actor, parsed.data.analysisId);
		const row = { id: analysis.id, name: analysis.name };
		// without JavaScript, the first press asks again on the page
		if (parsed.data.confirm !== 'yes') return { confirmDelete: row };
		const done = await attempt(async () => await deleteAnalysis(actor, row.id));
		if (!done.ok) return done.failure;
		return notice(`Deleted “${row.name}”.`, row);
	},
	undelete: async (event: RequestEvent) => {
		const { actor, parsed } = await read(event, analysisRowSchema);
		if (!parsed.success) return invalid('Choose an analysis to bring back.');
		const done = await attempt(async () => await undoDelete(actor, parsed.data.analysisId));
		if (!done.ok) return done.failure;
		return notice(`Brought back “${done.value.name}”.`);
	}
};
