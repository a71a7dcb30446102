import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEdit, requireActor } from '$lib/server/access';
import { readForm } from '$lib/server/form-body';
import { listAnalyses } from '$lib/server/analyses';
import { deleteDocument, getDocument, updateDocument } from '$lib/server/documents';
import { documentFormSchema } from '$lib/schemas/document';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	const { document, project, role } = await getDocument(actor, params.documentId);
	if (document.projectId !== params.id)
		redirect(308, `/projects/${project.id}/documents/${document.id}`);
	const analyses = !canEdit(role)
		? []
		: (
				await listAnalyses(actor, project.id, {
					q: '',
					sort: 'name',
					dir: 'asc',
					page: 1,
					perPage: 100
				})
			).items.map((a) => ({ id: a.id, name: a.name }));
	const form = await superValidate(
		{
			caption: document.caption,
			inRecord: document.inRecord,
			analysisId: document.analysisId ?? ''
		},
		zod4(documentFormSchema)
	);
	return { document, project, role, analyses, form };
};

export const actions: Actions = {
	update: async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(documentFormSchema));
		if (!form.valid) return fail(400, { form });
		const { analysisId, ...rest } = form.data;
		await updateDocument(actor, params.documentId, { ...rest, analysisId: analysisId || null });
		return message(form, 'Saved.');
	},
	delete: async ({ locals, params, request }) => {
		await readForm(request);
		await deleteDocument(requireActor(locals.actor), params.documentId);
		redirect(303, `/projects/${params.id}/documents?deleted=${params.documentId}`);
	}
};
