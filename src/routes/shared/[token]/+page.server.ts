import { sharedRecord } from '$lib/server/records';
import type { PageServerLoad } from './$types';

// A share link: the record and nothing else, for someone without an account. Not indexed, not
// cached, and no referrer carries the token to other sites.
export const load: PageServerLoad = async ({ params, setHeaders }) => {
	setHeaders({
		'cache-control': 'private, no-store',
		'x-robots-tag': 'noindex, nofollow',
		'referrer-policy': 'no-referrer'
	});
	return { record: await sharedRecord(params.token) };
};
