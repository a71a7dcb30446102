import { fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import * as workshops from '$lib/server/workshops';
import {
	classModeSchema,
	confirmSchema,
	invitationSchema,
	workshopNameSchema,
	workshopSwitchSchema
} from '$lib/schemas/workshop';
import { invite } from './invite-action.server';
import { current, memberActions } from './member-actions.server';
import { safeRedirectPath } from '$lib/schemas/return-path';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

export const load: PageServerLoad = async ({ locals }) => {
	const { actor, ws } = await current(locals);
	const isOwner = ws.role === 'owner';
	return {
		members: await workshops.listMembers(actor, ws.id),
		invitations: isOwner ? await workshops.listInvitations(actor, ws.id) : [],
		renameForm: await superValidate({ name: ws.name }, zod4(workshopNameSchema), { id: 'rename' }),
		createForm: await superValidate(zod4(workshopNameSchema), { id: 'create' }),
		inviteForm: await superValidate(zod4(invitationSchema), { id: 'invite' })
	};
};

export const actions: Actions = {
	switch: async ({ locals, request, url }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(workshopSwitchSchema), {
			id: 'workshop-switch'
		});
		if (!form.valid) return fail(400, { switchForm: form });
		await workshops.switchWorkshop(actor, form.data.workshopId);
		redirect(303, safeRedirectPath(url.searchParams.get('next'), '/projects'));
	},
	rename: async ({ locals, request }) => {
		const { actor, ws } = await current(locals);
		const form = await superValidate(await readForm(request), zod4(workshopNameSchema), {
			id: 'rename'
		});
		if (!form.valid) return fail(400, { renameForm: form });
		await workshops.renameWorkshop(actor, ws.id, form.data.name);
		return message(form, 'Renamed.');
	},
	classMode: async ({ locals, request }) => {
		const { actor, ws } = await current(locals);
		const form = await superValidate(await readForm(request), zod4(classModeSchema));
		if (!form.valid) return fail(400, { memberError: 'Choose whether this is a class.' });
		await workshops.setClassMode(actor, ws.id, form.data.isClass);
		return {
			memberMessage: form.data.isClass
				? 'This workshop is a class: invite students, or make members students.'
				: 'This workshop is no longer a class.'
		};
	},
	create: async ({ locals, request }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(workshopNameSchema), {
			id: 'create'
		});
		if (!form.valid) return fail(400, { createForm: form });
		await workshops.createWorkshopFor(actor.id, form.data.name);
		redirect(303, '/workshop');
	},
	invite,
	...memberActions,
	// without JavaScript the first press asks again on the page (the dialog does it in the browser)
	delete: async ({ locals, request }) => {
		const { actor, ws } = await current(locals);
		const form = await superValidate(await readForm(request), zod4(confirmSchema));
		if (form.data.confirm !== 'yes') return { confirmDelete: true };
		await workshops.deleteWorkshop(actor, ws.id);
		redirect(303, '/projects');
	}
};
