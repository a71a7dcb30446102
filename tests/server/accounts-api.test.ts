import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import {
	actorFromBearer,
	createApiToken,
	listApiTokens
} from '../../src/lib/server/accounts/api-tokens';
import { sha256 } from '../../src/lib/server/accounts/secrets';
import { createUser } from '../../src/lib/server/accounts/users';
import type { Actor } from '../../src/lib/server/access';
import { schema, oneRow } from '../../src/lib/server/db';
import { actorHandle, securityHeaders } from '../../src/hooks.server';
import { GET as getMe } from '../../src/routes/api/v1/me/+server';
import { GET as listTokens, POST as postToken } from '../../src/routes/api/v1/tokens/+server';
import { DELETE as deleteToken } from '../../src/routes/api/v1/tokens/[id]/+server';
import { useTempDb } from './support/db';

const db = useTempDb();

type Handler = (event: never) => Response | Promise<Response>;

/** A request through the actor hook (bearer token or nothing) into a route handler. */
async function call(
	handler: Handler,
	opts: {
		path: string;
		method?: string;
		bearer?: string;
		session?: Actor;
		body?: unknown;
		params?: Record<string, string>;
	}
) {
	const url = new URL(opts.path, 'http://localhost:5173');
	const headers = new Headers();
	if (opts.bearer) headers.set('authorization', `Bearer ${opts.bearer}`);
	if (opts.body !== undefined) headers.set('content-type', 'application/json');
	const request = new Request(url, {
		method: opts.method ?? 'GET',
		headers,
		body: opts.body === undefined ? undefined : JSON.stringify(opts.body)
	});
	const session = opts.session;
	const event = {
		url,
		request,
		params: opts.params ?? {},
		locals: {
			actor: null,
			auth: async () => (session ? { user: { id: session.id }, expires: '' } : null)
		}
	};
	// eslint-disable-next-line @typescript-eslint/no-explicit-any
	return actorHandle({ event: event as any, resolve: (e: any) => handler(e as never) });
}

async function person(name: string) {
	const user = await createUser({
		name,
		email: `${name.toLowerCase()}@api.example`,
		password: 'long enough words'
	});
	return { id: user.id, email: user.email, name: user.name, via: 'session' } as Actor;
}

describe('GET /api/v1/me', () => {
	it('is 401 with a problem body when anonymous', async () => {
		const res = await call(getMe, { path: '/api/v1/me' });
		expect(res.status).toBe(401);
		expect(await res.json()).toEqual({ error: 'Sign in to continue.', issues: [] });
	});

	it('is 200 with a token: the user, their personal workshop and their unit', async () => {
		const ivy = await person('Ivy');
		const token = await createApiToken(ivy, { name: 'laptop script' });
		const res = await call(getMe, { path: '/api/v1/me', bearer: token.secret });
		expect(res.status).toBe(200);
		const me = await res.json();
		expect(me).toMatchObject({
			id: ivy.id,
			email: 'ivy@api.example',
			via: 'token',
			lengthUnit: 'frac16'
		});
		expect(me.workshops).toEqual([expect.objectContaining({ personal: true, role: 'owner' })]);
	});

	it('is 200 with a session', async () => {
		const jo = await person('Jo');
		const res = await call(getMe, { path: '/api/v1/me', session: jo });
		expect(res.status).toBe(200);
		expect((await res.json()).via).toBe('session');
	});

	it('is 401 for a made-up token, even alongside a session cookie', async () => {
		const kai = await person('Kai');
		const res = await call(getMe, {
			path: '/api/v1/me',
			bearer: 'spw_not-a-real-token',
			session: kai
		});
		expect(res.status).toBe(401);
	});
});

describe('API tokens', () => {
	it('keeps only the sha-256 and a prefix; the secret resolves to the actor and records its use', async () => {
		const lu = await person('Lu');
		const token = await createApiToken(lu, { name: 'cut list export' });
		expect(token.secret).toMatch(/^spw_[A-Za-z0-9_-]{32}$/);
		const row = await db()
			.db.select()
			.from(schema.apiTokens)
			.where(eq(schema.apiTokens.id, token.id))
			.then(oneRow);
		expect(row.tokenHash).toBe(sha256(token.secret));
		expect(row.tokenHash).not.toContain(token.secret);
		expect(token.secret.startsWith(row.prefix)).toBe(true);
		expect(row.lastUsedAt).toBeNull();
		expect(await actorFromBearer(`Bearer ${token.secret}`)).toEqual({
			id: lu.id,
			email: lu.email,
			name: 'Lu',
			via: 'token',
			// the actor carries the user's length unit (the default, 1/16")
			lengthUnit: 'frac16'
		});
		const used = await db()
			.db.select()
			.from(schema.apiTokens)
			.where(eq(schema.apiTokens.id, token.id))
			.then(oneRow);
		expect(used.lastUsedAt).toBeInstanceOf(Date);
	});

	it('are created with a session (201, secret once), listed without secrets, revoked, and then refused', async () => {
		const mo = await person('Mo');
		const created = await call(postToken, {
			path: '/api/v1/tokens',
			method: 'POST',
			session: mo,
			body: { name: 'shop PC' }
		});
		expect(created.status).toBe(201);
		const { id, secret } = await created.json();
		expect(typeof secret).toBe('string');

		const listed = await (
			await call(listTokens, { path: '/api/v1/tokens', bearer: secret })
		).json();
		expect(listed.items.map((t: { id: string }) => t.id)).toEqual([id]);
		expect(JSON.stringify(listed)).not.toContain(secret);

		const revoked = await call(deleteToken, {
			path: `/api/v1/tokens/${id}`,
			method: 'DELETE',
			session: mo,
			params: { id }
		});
		expect(revoked.status).toBe(204);
		expect((await call(getMe, { path: '/api/v1/me', bearer: secret })).status).toBe(401);
		expect(await actorFromBearer(`Bearer ${secret}`)).toBeNull();
		expect(await listApiTokens(mo)).toEqual([]);
		const twice = await call(deleteToken, {
			path: `/api/v1/tokens/${id}`,
			method: 'DELETE',
			session: mo,
			params: { id }
		});
		expect(twice.status).toBe(404);
	});

	it('cannot be created with a token (403), nor with a bad body (422)', async () => {
		const ned = await person('Ned');
		const token = await createApiToken(ned, { name: 'first' });
		const res = await call(postToken, {
			path: '/api/v1/tokens',
			method: 'POST',
			bearer: token.secret,
			body: { name: 'second' }
		});
		expect(res.status).toBe(403);
		const bad = await call(postToken, {
			path: '/api/v1/tokens',
			method: 'POST',
			session: ned,
			body: { name: '' }
		});
		expect(bad.status).toBe(422);
		expect((await bad.json()).issues[0].path).toEqual(['name']);
	});

	it("cannot revoke someone else's token", async () => {
		const owner = await person('Ola');
		const other = await person('Pim');
		const token = await createApiToken(owner, { name: 'mine' });
		const res = await call(deleteToken, {
			path: `/api/v1/tokens/${token.id}`,
			method: 'DELETE',
			session: other,
			params: { id: token.id }
		});
		expect(res.status).toBe(404);
		expect((await actorFromBearer(`Bearer ${token.secret}`))?.id).toBe(owner.id);
	});
});

describe('security headers', () => {
	it('are set on every answer', async () => {
		const res = await securityHeaders({
			// eslint-disable-next-line @typescript-eslint/no-explicit-any
			event: {} as any,
			resolve: async () => Response.redirect('http://localhost:5173/signin', 302)
		});
		expect(res.headers.get('x-frame-options')).toBe('DENY');
		expect(res.headers.get('x-content-type-options')).toBe('nosniff');
		expect(res.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
		expect(res.headers.get('permissions-policy')).toContain('camera=()');
	});
});
