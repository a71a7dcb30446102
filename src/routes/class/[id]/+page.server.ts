import { redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { endClassSession, getClassSession, updateClassSession } from '$lib/server/class-sessions';
import { readForm } from '$lib/server/form-body';
import { qrPath } from '$lib/server/qr';
import { classActionSchema } from '$lib/schemas/class-session';
import type { Actions, PageServerLoad } from './$types';

// The teacher's screen of a class session (theirs alone): join code, QR code, the answers.
export const load: PageServerLoad = async ({ locals, params, url }) => {
	if (!locals.actor) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
	const session = await getClassSession(locals.actor, params.id);
	const joinUrl = `${url.origin}/c/${session.code}`;
	return { session, joinUrl, qr: qrPath(joinUrl) };
};

async function target(request: Request) {
	const form = await superValidate(await readForm(request), zod4(classActionSchema));
	return form.valid ? form.data.to : undefined;
}

export const actions: Actions = {
	reveal: async ({ locals, params, request }) => {
		await readForm(request);
		await updateClassSession(locals.actor, params.id, { revealed: true });
	},
	step: async ({ locals, params, request }) => {
		const to = await target(request);
		if (to !== undefined) await updateClassSession(locals.actor, params.id, { step: to });
	},
	end: async ({ locals, params, request }) => {
		if ((await readForm(request)).get('confirm') !== 'yes') return { confirmEnd: true };
		await endClassSession(locals.actor, params.id);
		redirect(303, '/class?ended=1');
	}
};
