import type { RequestHandler } from './$types';
import { recordPdfResponse } from '$lib/server/record-http';
import { sharedRecord } from '$lib/server/records';

/** The shared record as a PDF; a closed or unknown link is a bare 404. */
export const GET: RequestHandler = async ({ params }) =>
	recordPdfResponse(await sharedRecord(params.token));
