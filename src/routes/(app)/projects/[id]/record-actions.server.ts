import { readForm } from '$lib/server/form-body';
// The record page's actions, shared by the project's record and one analysis's: make and close
// share links, and send the record by e-mail (a failed send says so and keeps what was typed).
import { fail, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { canEdit, requireActor } from '$lib/server/access';
import { linkOrigin, MAIL_UNAVAILABLE_MESSAGE } from '$lib/server/mail';
import { sendRecord } from '$lib/server/record-mail';
import { createShareLink, listShareLinks, revokeShareLink } from '$lib/server/share-links';
import { accessIdSchema, recordMailSchema, shareLinkSchema } from '$lib/schemas/client-access';
import type { ProjectRole } from '$lib/server/access';
import type { RecordDoc } from '$lib/server/records';

/** What the editor's panel beside the record needs (nothing for a reader). */
export async function recordPanel(
	event: RequestEvent,
	role: ProjectRole,
	record: RecordDoc,
	analysisId?: string
) {
	if (!canEdit(role)) return null;
	const actor = requireActor(event.locals.actor);
	const links = (await listShareLinks(actor, event.params.id!)).filter(
		(l) => (l.analysisId ?? undefined) === analysisId
	);
	return {
		links,
		shareForm: await superValidate({ days: 30, analysisId }, zod4(shareLinkSchema), {
			id: 'share',
			errors: false
		}),
		mailForm: await superValidate({ to: '', message: '', analysisId }, zod4(recordMailSchema), {
			id: 'mail',
			errors: false
		}),
		client: record.project.client
	};
}

export const recordActions = {
	share: async ({ locals, params, request, url }: RequestEvent) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(shareLinkSchema), {
			id: 'share'
		});
		if (!form.valid) return fail(400, { shareForm: form });
		const { token } = await createShareLink(actor, params.id!, form.data);
		return message(form, `${linkOrigin(url)}/shared/${token}`);
	},
	unshare: async ({ locals, params, request }: RequestEvent) => {
		const actor = requireActor(locals.actor);
		const parsed = accessIdSchema.safeParse(Object.fromEntries(await readForm(request)));
		if (!parsed.success) return fail(400, { error: 'Which link?' });
		await revokeShareLink(actor, params.id!, parsed.data.id);
		return { closed: true };
	},
	mail: async ({ locals, params, request, url }: RequestEvent) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(recordMailSchema), {
			id: 'mail'
		});
		if (!form.valid) return fail(400, { mailForm: form });
		const link = await sendRecord(actor, params.id!, form.data, linkOrigin(url));
		if (!link) return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
		return message(form, `Sent to ${form.data.to}, with the PDF attached.`);
	}
};
