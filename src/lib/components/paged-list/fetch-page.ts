import type { ListParams } from './list-url';

/**
 * One page of a list from the JSON API, with the `fetch` a load function is given (on the server
 * it carries the visitor's cookie; in the browser it is the browser's). A failure is kept as words
 * for the table to show with a way to try again, rather than thrown as an error page.
 */
export async function fetchListPage<T>(
	fetch: typeof globalThis.fetch,
	path: string,
	params: ListParams
): Promise<{ list: T; failure: null } | { list: null; failure: string }> {
	const search = new URLSearchParams();
	for (const [k, v] of Object.entries(params))
		if (v !== undefined && v !== null && v !== '') search.set(k, String(v));
	try {
		const res = await fetch(`${path}?${search}`, { headers: { accept: 'application/json' } });
		if (res.ok) return { list: (await res.json()) as T, failure: null };
		const body = await res.json().catch(() => null);
		return { list: null, failure: body?.error ?? `the server answered ${res.status}` };
	} catch {
		return { list: null, failure: 'the server could not be reached' };
	}
}
