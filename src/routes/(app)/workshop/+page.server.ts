import { error, fail, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import { sendInvitation } from '$lib/server/invitation-mail';
import { linkOrigin, MAIL_UNAVAILABLE_MESSAGE } from '$lib/server/mail';
import * as workshops from '$lib/server/workshops';
import {
	invitationSchema,
	memberRemoveSchema,
	memberRoleSchema,
	workshopNameSchema
} from '$lib/schemas/workshop';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/form-body';

function current(locals: App.Locals) {
	const actor = requireActor(locals.actor);
	const ws = workshops.currentWorkshop(actor);
	if (!ws) error(404, 'You belong to no workshop yet.');
	return { actor, ws };
}

export const load: PageServerLoad = async ({ locals }) => {
	const { actor, ws } = current(locals);
	const isOwner = ws.role === 'owner';
	return {
		members: workshops.listMembers(actor, ws.id),
		invitations: isOwner ? workshops.listInvitations(actor, ws.id) : [],
		renameForm: await superValidate({ name: ws.name }, zod4(workshopNameSchema), { id: 'rename' }),
		createForm: await superValidate(zod4(workshopNameSchema), { id: 'create' }),
		inviteForm: await superValidate(zod4(invitationSchema), { id: 'invite' })
	};
};

export const actions: Actions = {
	switch: async ({ locals, request, url }) => {
		const actor = requireActor(locals.actor);
		const id = String((await readForm(request)).get('workshopId') ?? '');
		workshops.switchWorkshop(actor, id);
		redirect(303, url.searchParams.get('next') ?? '/projects');
	},
	rename: async ({ locals, request }) => {
		const { actor, ws } = current(locals);
		const form = await superValidate(await readForm(request), zod4(workshopNameSchema), {
			id: 'rename'
		});
		if (!form.valid) return fail(400, { renameForm: form });
		workshops.renameWorkshop(actor, ws.id, form.data.name);
		return message(form, 'Renamed.');
	},
	create: async ({ locals, request }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(workshopNameSchema), {
			id: 'create'
		});
		if (!form.valid) return fail(400, { createForm: form });
		workshops.createWorkshopFor(actor.id, form.data.name);
		redirect(303, '/workshop');
	},
	invite: async ({ locals, request, url }) => {
		const { actor, ws } = current(locals);
		const form = await superValidate(await readForm(request), zod4(invitationSchema), {
			id: 'invite'
		});
		if (!form.valid) return fail(400, { inviteForm: form });
		const { invitation, token } = workshops.createInvitation(
			actor,
			ws.id,
			form.data.email,
			form.data.role
		);
		const sent = await sendInvitation({
			to: form.data.email,
			from: actor,
			workshopName: ws.name,
			role: form.data.role,
			link: `${linkOrigin(url)}/invite/${token}`
		});
		if (!sent) {
			workshops.revokeInvitation(actor, ws.id, invitation.id);
			return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
		}
		return message(form, `Invitation sent to ${form.data.email}.`);
	},
	role: async ({ locals, request }) => {
		const { actor, ws } = current(locals);
		const parsed = memberRoleSchema.safeParse(Object.fromEntries(await readForm(request)));
		if (!parsed.success) return fail(400, { memberError: 'Choose a role.' });
		workshops.changeMemberRole(actor, ws.id, parsed.data.userId, parsed.data.role);
		return { memberMessage: 'Role changed.' };
	},
	remove: async ({ locals, request }) => {
		const { actor, ws } = current(locals);
		const parsed = memberRemoveSchema.safeParse(Object.fromEntries(await readForm(request)));
		if (!parsed.success) return fail(400, { memberError: 'Choose a member.' });
		workshops.removeMember(actor, ws.id, parsed.data.userId);
		return { memberMessage: 'Member removed.' };
	},
	revoke: async ({ locals, request }) => {
		const { actor, ws } = current(locals);
		workshops.revokeInvitation(actor, ws.id, String((await readForm(request)).get('id') ?? ''));
		return { memberMessage: 'Invitation withdrawn.' };
	},
	delete: async ({ locals }) => {
		const { actor, ws } = current(locals);
		workshops.deleteWorkshop(actor, ws.id);
		redirect(303, '/projects');
	}
};
