import type { Handle } from '@sveltejs/kit';
import { limitCompute } from '../rate-limit';

/** The open compute routes: free to call, so limited per client address. */
export const COMPUTE_ROUTES =
	/^\/api\/v1\/(shelf(\/[\w-]+)?|joints|stability|cases\/check|walls\/(check|cutlist|sheets))\/?$/;

/** 429 with Retry-After once an address has used its budget (see rate-limit.ts). */
export const computeLimit: Handle = async ({ event, resolve }) => {
	if (event.request.method !== 'POST' || !COMPUTE_ROUTES.test(event.url.pathname))
		return resolve(event);
	return (await limitCompute(event.getClientAddress())) ?? resolve(event);
};
