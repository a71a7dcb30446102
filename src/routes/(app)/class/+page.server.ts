import { fail, isHttpError, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireActor } from '$lib/server/access';
import { listClassSessions, startClassSession } from '$lib/server/class-sessions';
import { readForm } from '$lib/server/form-body';
import { EXPERIMENTS } from '$lib/lab/experiments';
import { startClassSchema } from '$lib/schemas/class-session';
import type { Actions, PageServerLoad } from './$types';

// Starting a class session: pick one of the lab's experiments; the teacher's own open sessions.
export const load: PageServerLoad = async ({ locals, url }) => {
	const actor = requireActor(locals.actor);
	const chosen = url.searchParams.get('experiment');
	const experiment = EXPERIMENTS.some((e) => e.id === chosen) ? chosen! : EXPERIMENTS[0].id;
	return {
		experiments: EXPERIMENTS.map((e) => ({
			id: e.id,
			title: e.title,
			questions: e.steps.filter((s) => s.ask).length,
			first: e.steps[0].say
		})),
		sessions: await listClassSessions(actor),
		form: await superValidate({ experiment, step: 0 }, zod4(startClassSchema))
	};
};

export const actions: Actions = {
	start: async ({ locals, request }) => {
		const actor = requireActor(locals.actor);
		const form = await superValidate(await readForm(request), zod4(startClassSchema));
		if (!form.valid) return fail(400, { form, refused: null as string | null });
		let id: string;
		try {
			id = (await startClassSession(actor, form.data)).id;
		} catch (e) {
			// too many sessions open, or an experiment the lab no longer has: said beside the button
			if (isHttpError(e) && (e.status === 409 || e.status === 422))
				return fail(e.status, { form, refused: e.body.message });
			throw e;
		}
		redirect(303, `/class/${id}`);
	}
};
