// The members part of the workshop page's actions: change a role, remove a member, withdraw an
// invitation; each body read through the form helper and parsed by superforms with shared schemas.
import { error, fail, type RequestEvent } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import { readForm } from '$lib/server/form-body';
import * as workshops from '$lib/server/workshops';
import {
	invitationRevokeSchema,
	memberRemoveSchema,
	memberRoleSchema
} from '$lib/schemas/workshop';

/** The actor and their current workshop (404 when they belong to none). */
export async function current(locals: App.Locals) {
	const actor = requireActor(locals.actor);
	const ws = await workshops.currentWorkshop(actor);
	if (!ws) error(404, 'You belong to no workshop yet.');
	return { actor, ws };
}

export const memberActions = {
	role: async ({ locals, request }: RequestEvent) => {
		const { actor, ws } = await current(locals);
		const form = await superValidate(await readForm(request), zod4(memberRoleSchema));
		if (!form.valid) return fail(400, { memberError: 'Choose a role.' });
		await workshops.changeMemberRole(actor, ws.id, form.data.userId, form.data.role);
		return { memberMessage: 'Role changed.' };
	},
	remove: async ({ locals, request }: RequestEvent) => {
		const { actor, ws } = await current(locals);
		const form = await superValidate(await readForm(request), zod4(memberRemoveSchema));
		if (!form.valid) return fail(400, { memberError: 'Choose a member.' });
		await workshops.removeMember(actor, ws.id, form.data.userId);
		return { memberMessage: 'Member removed.' };
	},
	revoke: async ({ locals, request }: RequestEvent) => {
		const { actor, ws } = await current(locals);
		const form = await superValidate(await readForm(request), zod4(invitationRevokeSchema));
		if (!form.valid) return fail(400, { memberError: 'Choose an invitation.' });
		await workshops.revokeInvitation(actor, ws.id, form.data.id);
		return { memberMessage: 'Invitation withdrawn.' };
	}
};
