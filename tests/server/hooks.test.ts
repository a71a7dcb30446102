// The hooks every request passes: JSON for everything under /api/, the origin check, the cache
// headers of signed-in answers, the Auth.js cookies, and how errors are logged.
import { eq } from 'drizzle-orm';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createUser } from '../../src/lib/server/accounts/users';
import { authConfig, authHandle } from '../../src/lib/server/auth';
import { schema } from '../../src/lib/server/db';
import { apiJson } from '../../src/lib/server/hooks/api-json';
import { authCookies } from '../../src/lib/server/hooks/auth-cookies';
import { originCheck } from '../../src/lib/server/hooks/origin-check';
import { closeUnreadBody } from '../../src/lib/server/hooks/unread-body';
import { actorHandle, handleError, securityHeaders } from '../../src/hooks.server';
import { actions as signInActions } from '../../src/routes/(public)/signin/+page.server';
import { useTempDb } from './support/db';
import { cookieJar, formEvent, runAction } from './support/request';

const db = useTempDb();

type Resolve = (e: unknown) => Response | Promise<Response>;
function hookEvent(path: string, init: RequestInit = {}, extra: Record<string, unknown> = {}) {
	const url = new URL(path, 'http://localhost:5173');
	return { url, request: new Request(url, init), locals: {}, ...extra } as never;
}

describe('every answer under /api/ is JSON', () => {
	it('an unknown path: a JSON 404 instead of the HTML page', async () => {
		const res = await apiJson({
			event: hookEvent('/api/v1/nothing-here'),
			resolve: (() =>
				new Response('<!doctype html><h1>Not found</h1>', {
					status: 404,
					headers: { 'content-type': 'text/html' }
				})) as Resolve
		} as never);
		expect(res.status).toBe(404);
		expect(res.headers.get('content-type')).toMatch(/application\/json/);
		const body = await res.json();
		expect(body.error).toMatch(/no such API path/);
		expect(body.issues).toEqual([]);
	});

	it('a wrong method: a JSON 405 that keeps the Allow header', async () => {
		const res = await apiJson({
			event: hookEvent('/api/v1/health', { method: 'DELETE' }),
			resolve: (() =>
				new Response('DELETE method not allowed', {
					status: 405,
					headers: { 'content-type': 'text/plain', allow: 'GET, HEAD' }
				})) as Resolve
		} as never);
		expect(res.status).toBe(405);
		expect(res.headers.get('allow')).toBe('GET, HEAD');
		expect((await res.json()).error).toMatch(/does not answer that method/);
	});

	it('leaves pages alone', async () => {
		const page = new Response('<h1>Not found</h1>', {
			status: 404,
			headers: { 'content-type': 'text/html' }
		});
		const res = await apiJson({
			event: hookEvent('/nothing-here'),
			resolve: (() => page) as Resolve
		} as never);
		expect(res).toBe(page);
	});
});

describe('the origin check', () => {
	const crossSite = (path: string) =>
		hookEvent(path, {
			method: 'POST',
			headers: { 'content-type': 'text/plain', origin: 'https://evil.example' },
			body: 'x'
		});
	const never = (() => {
		throw new Error('must not be reached');
	}) as Resolve;

	it('refuses a cross-site form post to the API with a JSON 403', async () => {
		const res = await originCheck({ event: crossSite('/api/v1/shelf'), resolve: never } as never);
		expect(res.status).toBe(403);
		expect((await res.json()).error).toMatch(/Cross-site POST form submissions are forbidden/);
	});

	it('refuses a cross-site form post to a page in plain text', async () => {
		const res = await originCheck({ event: crossSite('/signin'), resolve: never } as never);
		expect(res.status).toBe(403);
		expect(await res.text()).toMatch(/Cross-site POST/);
	});

	it('lets a same-site form post and a cross-site JSON post through', async () => {
		const ok = new Response('ok');
		for (const headers of [
			{ 'content-type': 'application/x-www-form-urlencoded', origin: 'http://localhost:5173' },
			{ 'content-type': 'application/json', origin: 'https://script.example' }
		]) {
			const res = await originCheck({
				event: hookEvent('/api/v1/shelf', { method: 'POST', headers, body: 'x' }),
				resolve: (() => ok) as Resolve
			} as never);
			expect(res).toBe(ok);
		}
	});
});

describe('signed-in answers', () => {
	it('carry Cache-Control: private, no-store; anonymous ones do not', async () => {
		const signedIn = await securityHeaders({
			event: hookEvent('/projects', {}, { locals: { actor: { id: 'u1' } } }),
			resolve: (() => new Response('page')) as Resolve
		} as never);
		expect(signedIn.headers.get('cache-control')).toBe('private, no-store');
		const anonymous = await securityHeaders({
			event: hookEvent('/', {}, { locals: { actor: null } }),
			resolve: (() => new Response('page')) as Resolve
		} as never);
		expect(anonymous.headers.get('cache-control')).toBeNull();
	});
});

describe('the Auth.js cookies', () => {
	it('a signed-in page over plain http sets no callback-url cookie and nothing Secure', async () => {
		const user = await createUser({
			name: 'Ola',
			email: 'ola@shop.example',
			password: 'long words here'
		});
		await db()
			.db.update(schema.users)
			.set({ emailVerified: new Date() })
			.where(eq(schema.users.id, user.id));
		const login = cookieJar();
		await runAction(
			signInActions.password,
			formEvent({
				url: '/signin?/password',
				fields: { email: 'ola@shop.example', password: 'long words here', redirectTo: '/' },
				cookies: login
			})
		);
		const name = [...login.values.keys()].find((k) => k.endsWith('authjs.session-token'))!;
		const url = new URL('http://shop.lan:3000/projects');
		const written: { name: string; secure?: boolean }[] = [];
		const event = {
			...formEvent({ url: url.pathname, fields: {} }),
			url,
			request: new Request(url, {
				headers: { cookie: `${name}=${login.values.get(name)}`, host: url.host }
			}),
			locals: {},
			cookies: {
				...cookieJar(),
				set: (n: string, _v: string, o: { secure?: boolean } = {}) =>
					written.push({ name: n, secure: o.secure })
			}
		};
		let actor: unknown;
		await authCookies({
			event,
			resolve: ((e: never) =>
				authHandle({
					event: e,
					resolve: (e2) =>
						actorHandle({
							event: e2,
							resolve: (e3) => {
								actor = e3.locals.actor;
								return new Response('page');
							}
						})
				})) as Resolve
		} as never);
		expect(actor).toMatchObject({ id: user.id });
		expect(written.filter((c) => c.name.endsWith('callback-url'))).toEqual([]);
		expect(written.filter((c) => c.secure)).toEqual([]);
	});
});

describe('Auth.js per request', () => {
	it('builds its configuration once, not for every request', () => {
		expect(authConfig()).toBe(authConfig());
	});

	it('does no work for the open API routes: no session reader is set there', async () => {
		for (const path of ['/api/v1/shelf', '/api/v1/shelf/max-span', '/api/v1/health']) {
			const event = hookEvent(path, { method: 'POST' }) as { locals: Record<string, unknown> };
			const res = await authHandle({
				event: event as never,
				resolve: (() => new Response('{}')) as Resolve
			} as never);
			expect(res.status).toBe(200);
			expect(event.locals.auth).toBeUndefined();
		}
		// a signed-in route still gets one
		const event = hookEvent('/api/v1/projects') as { locals: Record<string, unknown> };
		await authHandle({
			event: event as never,
			resolve: (() => new Response('{}')) as Resolve
		} as never);
		expect(event.locals.auth).toBeTypeOf('function');
	});
});

describe('handleError', () => {
	afterEach(() => vi.restoreAllMocks());

	it('logs a refusal (4xx) as one line without a stack, and a server error with it', () => {
		const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
		const error = vi.spyOn(console, 'error').mockImplementation(() => {});
		const event = hookEvent('/api/v1/health', { method: 'DELETE' });
		handleError({
			error: new Error('x'),
			event,
			status: 405,
			message: 'Method not allowed'
		} as never);
		expect(warn).toHaveBeenCalledTimes(1);
		expect(warn.mock.calls[0]).toHaveLength(1);
		expect(String(warn.mock.calls[0][0])).toMatch(
			/405 DELETE \/api\/v1\/health: Method not allowed/
		);
		expect(error).not.toHaveBeenCalled();
		handleError({
			error: new Error('boom'),
			event,
			status: 500,
			message: 'Internal Error'
		} as never);
		expect(error).toHaveBeenCalledTimes(1);
		expect(error.mock.calls[0][1]).toBeInstanceOf(Error);
	});
});

describe('a body left unread', () => {
	const post = () =>
		new Request('http://localhost:5173/api/v1/projects', {
			method: 'POST',
			headers: { 'content-type': 'application/json' },
			body: 'x'.repeat(300 * 1024)
		});

	it('closes the connection after the answer, so the next request on it does not wait', async () => {
		const request = post();
		const res = await closeUnreadBody({
			event: { request, url: new URL(request.url) },
			resolve: (() => new Response('{"error":"Sign in"}', { status: 401 })) as Resolve
		} as never);
		expect(res.status).toBe(401);
		expect(res.headers.get('connection')).toBe('close');
	});

	it('keeps the connection when the body was read', async () => {
		const request = post();
		const res = await closeUnreadBody({
			event: { request, url: new URL(request.url) },
			resolve: (async () => {
				await request.text();
				return new Response('{}', { status: 201 });
			}) as Resolve
		} as never);
		expect(res.headers.get('connection')).toBeNull();
	});
});
