// Inviting someone to the workshop: the invitation is made, mailed, and withdrawn again when the
// mail cannot go (the page says so; a link nobody received should not stay open).
import { fail, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { invitationSchema } from '$lib/schemas/workshop';
import { readForm } from '$lib/server/form-body';
import { sendInvitation } from '$lib/server/invitation-mail';
import { linkOrigin, MAIL_UNAVAILABLE_MESSAGE } from '$lib/server/mail';
import * as workshops from '$lib/server/workshops';
import { current } from './member-actions.server';

export async function invite({ locals, request, url }: RequestEvent) {
	const { actor, ws } = await current(locals);
	const form = await superValidate(await readForm(request), zod4(invitationSchema), {
		id: 'invite'
	});
	if (!form.valid) return fail(400, { inviteForm: form });
	const { email, role } = form.data;
	const { invitation, token } = await workshops.createInvitation(actor, ws.id, email, role);
	const sent = await sendInvitation({
		to: email,
		from: actor,
		workshopName: ws.name,
		role,
		link: `${linkOrigin(url)}/invite/${token}`
	});
	if (!sent) {
		await workshops.revokeInvitation(actor, ws.id, invitation.id);
		return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
	}
	return message(form, `Invitation sent to ${email}.`);
}
