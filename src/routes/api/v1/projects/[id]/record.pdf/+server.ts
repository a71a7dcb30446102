import type { RequestHandler } from './$types';
import { requireActor } from '$lib/server/access';
import { api } from '$lib/server/http';
import { recordPdfResponse } from '$lib/server/record-http';
import { projectRecord } from '$lib/server/records';

/** The project's record as a PDF: members of its workshop and its clients. */
export const GET: RequestHandler = api(async ({ locals, params }) =>
	recordPdfResponse((await projectRecord(requireActor(locals.actor), params.id)).record)
);
