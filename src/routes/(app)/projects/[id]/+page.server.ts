import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEdit, requireActor } from '$lib/server/access';
import { listDocuments } from '$lib/server/documents';
import { deleteProject, getProject, listProjects, updateProject } from '$lib/server/projects';
import { listProjectAccess } from '$lib/server/project-access';
import { listRecordSends } from '$lib/server/record-mail';
import { clientInviteSchema } from '$lib/schemas/client-access';
import { projectSchema } from '$lib/schemas/project';
import { analysisRowActions } from './analysis-actions.server';
import { clientActions } from './client-actions.server';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	const { project, role } = await getProject(actor, params.id);
	// where an editor may move an analysis: the other projects of this workshop
	const otherProjects = !canEdit(role)
		? []
		: (
				await listProjects(actor, {
					workshop: project.workshopId,
					q: '',
					sort: 'name',
					dir: 'asc',
					page: 1,
					perPage: 100
				})
			).items
				.filter((p) => p.id !== project.id)
				.map((p) => ({ id: p.id, name: p.name }));
	return {
		project,
		role,
		otherProjects,
		documents: await listDocuments(actor, project.id),
		editForm: await superValidate(project, zod4(projectSchema)),
		// who reads it as a client, and where its records went (editors and owners)
		clients: canEdit(role) ? await listProjectAccess(actor, project.id) : null,
		sends: canEdit(role) ? await listRecordSends(actor, project.id) : [],
		clientForm: await superValidate(zod4(clientInviteSchema), { id: 'client' })
	};
};

export const actions: Actions = {
	update: async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(projectSchema));
		if (!form.valid) return fail(400, { editForm: form });
		await updateProject(actor, params.id, form.data);
		return message(form, 'Saved.');
	},
	// without JavaScript the first press asks again on the page (the dialog does it in the browser)
	delete: async ({ locals, params, request }) => {
		const actor = requireActor(locals.actor);
		if ((await readForm(request)).get('confirm') !== 'yes') return { confirmProjectDelete: true };
		await deleteProject(actor, params.id);
		redirect(303, '/projects');
	},
	...analysisRowActions,
	...clientActions
};
