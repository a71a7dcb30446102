import type { Actor } from '../../../src/lib/server/access';

/** A cookie jar standing in for SvelteKit's `event.cookies`. */
export function cookieJar() {
	const values = new Map<string, string>();
	return {
		values,
		get: (name: string) => values.get(name),
		getAll: () => [...values].map(([name, value]) => ({ name, value })),
		set: (name: string, value: string, opts: { maxAge?: number; expires?: Date } = {}) => {
			const expired = opts.maxAge === 0 || (opts.expires && opts.expires.getTime() < Date.now());
			if (expired || value === '') values.delete(name);
			else values.set(name, value);
		},
		delete: (name: string) => values.delete(name),
		serialize: () => ''
	};
}

/**
 * A RequestEvent-like object for calling a form action directly: a urlencoded POST, a client
 * address for the sign-in throttle, and a cookie jar that Auth.js writes the session into.
 */
export function formEvent(opts: {
	url: string;
	fields: Record<string, string>;
	clientAddress?: string;
	actor?: Actor | null;
	params?: Record<string, string>;
	cookies?: ReturnType<typeof cookieJar>;
}) {
	const url = new URL(opts.url, 'http://localhost:5173');
	const request = new Request(url, {
		method: 'POST',
		headers: { origin: url.origin, 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams(opts.fields)
	});
	return {
		url,
		request,
		params: opts.params ?? {},
		route: { id: url.pathname },
		locals: { actor: opts.actor ?? null, auth: async () => null },
		cookies: opts.cookies ?? cookieJar(),
		getClientAddress: () => opts.clientAddress ?? '127.0.0.1',
		fetch,
		setHeaders: () => {},
		platform: undefined,
		isDataRequest: false,
		isSubRequest: false
		// eslint-disable-next-line @typescript-eslint/no-explicit-any
	} as any;
}

/** Run an action and give back what it returned, or the redirect / error it threw. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function runAction(action: (event: any) => unknown, event: unknown) {
	try {
		return { returned: await action(event) };
	} catch (e) {
		return { thrown: e as { status: number; location?: string; body?: { message: string } } };
	}
}
