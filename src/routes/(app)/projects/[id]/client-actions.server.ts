import { readForm } from '$lib/server/form-body';
// The project page's client actions: invite a client by e-mail (editor), take access away and
// withdraw invitations (owner). Invitations go by mail; a failed mail withdraws the invitation.
import { fail, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import { sendProjectInvitation } from '$lib/server/invitation-mail';
import { linkOrigin, MAIL_UNAVAILABLE_MESSAGE } from '$lib/server/mail';
import * as access from '$lib/server/project-access';
import { accessIdSchema, clientInviteSchema } from '$lib/schemas/client-access';

async function idOf(request: Request) {
	return accessIdSchema.safeParse(Object.fromEntries(await readForm(request)));
}

export const clientActions = {
	inviteClient: async ({ locals, params, request, url }: RequestEvent) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(clientInviteSchema), {
			id: 'client'
		});
		if (!form.valid) return fail(400, { clientForm: form });
		const { invitation, token, project } = await access.inviteToProject(
			actor,
			params.id!,
			form.data.email
		);
		const sent = await sendProjectInvitation({
			to: form.data.email,
			from: actor,
			projectName: project.name,
			link: `${linkOrigin(url)}/invite/project/${token}`
		});
		if (!sent) {
			await access.withdrawProjectInvitation(invitation.id);
			return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
		}
		return message(form, `Invitation sent to ${form.data.email}.`);
	},
	revokeClient: async ({ locals, params, request }: RequestEvent) => {
		const parsed = await idOf(request);
		if (!parsed.success) return fail(400, { error: 'Whose access?' });
		await access.revokeProjectAccess(requireActor(locals.actor), params.id!, parsed.data.id);
		return { revoked: true };
	},
	withdrawClientInvite: async ({ locals, params, request }: RequestEvent) => {
		const parsed = await idOf(request);
		if (!parsed.success) return fail(400, { error: 'Which invitation?' });
		await access.revokeProjectInvitation(requireActor(locals.actor), params.id!, parsed.data.id);
		return { withdrawn: true };
	}
};
