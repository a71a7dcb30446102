import { error, fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import { createProject } from '$lib/server/projects';
import { listSharedProjects } from '$lib/server/project-access';
import { currentWorkshop } from '$lib/server/workshops';
import { projectSchema } from '$lib/schemas/project';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async ({ locals }) => {
	const actor = requireActor(locals.actor);
	return {
		createForm: await superValidate(zod4(projectSchema)),
		// projects of other workshops the actor was invited to as a client
		shared: await listSharedProjects(actor)
	};
};

export const actions: Actions = {
	create: async ({ locals, request }) => {
		const actor = requireActor(locals.actor);
		const ws = await currentWorkshop(actor);
		if (!ws) error(404, 'You belong to no workshop yet.');
		const form = await superValidate(await readForm(request), zod4(projectSchema));
		if (!form.valid) return fail(400, { createForm: form });
		const project = await createProject(actor, ws.id, form.data);
		redirect(303, `/projects/${project.id}`);
	}
};
