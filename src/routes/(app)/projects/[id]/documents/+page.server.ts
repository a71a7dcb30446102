import { fail, redirect } from '@sveltejs/kit';
import { requireActor } from '$lib/server/access';
import { readForm } from '$lib/server/form-body';
import { addDocument, listDocuments, undoDeleteDocument } from '$lib/server/documents';
import { getProject } from '$lib/server/projects';
import { documentFieldsSchema } from '$lib/schemas/document';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params, url }) => {
	const actor = requireActor(locals.actor);
	const { project, role } = await getProject(actor, params.id);
	const deleted = url.searchParams.get('deleted');
	return { project, role, documents: await listDocuments(actor, params.id), deleted };
};

const statusOf = (e: unknown) => (e as { status?: number }).status;
const messageOf = (e: unknown) => (e as { body?: { message?: string } }).body?.message;

export const actions: Actions = {
	// the uploader without JavaScript: one or more files with one caption, then back to the list
	upload: async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		const form = await readForm(request);
		const files = form.getAll('file').filter((f): f is File => f instanceof File && f.size > 0);
		if (!files.length) return fail(422, { message: 'Choose at least one file to add.' });
		const fields = documentFieldsSchema.safeParse({ caption: form.get('caption') ?? undefined });
		if (!fields.success) return fail(422, { message: fields.error.issues[0].message });
		for (const file of files) {
			try {
				const bytes = new Uint8Array(await file.arrayBuffer());
				await addDocument(actor, params.id, { bytes, name: file.name }, fields.data);
			} catch (e) {
				const status = statusOf(e);
				if (!status || status >= 500) throw e;
				return fail(status, { message: `${file.name}: ${messageOf(e) ?? 'not added.'}` });
			}
		}
		redirect(303, `/projects/${params.id}/documents`);
	},
	undo: async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		const id = String((await readForm(request)).get('id') ?? '');
		if (!id) return fail(400, { message: 'Which document?' });
		await undoDeleteDocument(actor, id);
		redirect(303, `/projects/${params.id}/documents`);
	}
};
