// A session ends on the server: after signing out, or "sign out everywhere", a copied session
// cookie answers 401 on /api/v1/me (it answered 200 for up to 30 days before).
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { createApiToken, listApiTokens } from '../../src/lib/server/accounts/api-tokens';
import { requestPasswordReset, resetPassword } from '../../src/lib/server/accounts/password-resets';
import { createUser } from '../../src/lib/server/accounts/users';
import { authHandle } from '../../src/lib/server/auth';
import { schema } from '../../src/lib/server/db';
import { waitForMailTo } from '../../src/lib/server/dev/caught-mail';
import { actorHandle } from '../../src/hooks.server';
import { GET as getMe } from '../../src/routes/api/v1/me/+server';
import { actions as signInActions } from '../../src/routes/(public)/signin/+page.server';
import { actions as signOutActions } from '../../src/routes/signout/+page.server';
import { actions as accountActions } from '../../src/routes/(app)/account/+page.server';
import { useTempDb } from './support/db';
import { useMailCatcher } from './support/mail';
import { cookieJar, formEvent, runAction } from './support/request';

const db = useTempDb();
const mail = useMailCatcher();

async function signedIn(email: string) {
	const user = await createUser({ name: 'Ines', email, password: 'a long passphrase' });
	await db()
		.db.update(schema.users)
		.set({ emailVerified: new Date() })
		.where(eq(schema.users.id, user.id));
	const cookies = cookieJar();
	const { thrown } = await runAction(
		signInActions.password,
		formEvent({
			url: '/signin?/password',
			fields: { email, password: 'a long passphrase', redirectTo: '/projects' },
			cookies
		})
	);
	expect(thrown?.status).toBe(303);
	const name = [...cookies.values.keys()].find((k) => k.endsWith('authjs.session-token'))!;
	return { user, cookie: `${name}=${cookies.values.get(name)}` };
}

/** GET /api/v1/me through Auth.js and the actor hook, with only this cookie. */
async function me(cookie: string) {
	const url = new URL('http://localhost:5173/api/v1/me');
	const event = {
		...formEvent({ url: url.pathname, fields: {} }),
		url,
		request: new Request(url, { headers: { cookie, host: url.host } }),
		locals: {}
	};
	return authHandle({
		event,
		resolve: (e) => actorHandle({ event: e, resolve: (e2) => getMe(e2 as never) })
	});
}

/** Post a form action with this cookie (as the browser of that session would). */
function withCookie(url: string, cookie: string, fields: Record<string, string>, actor: unknown) {
	const event = formEvent({ url, fields, actor: actor as never });
	const request = new Request(event.request.url, {
		method: 'POST',
		headers: {
			cookie,
			origin: event.url.origin,
			'content-type': 'application/x-www-form-urlencoded'
		},
		body: new URLSearchParams(fields)
	});
	return { ...event, request };
}

describe('signing out', () => {
	it('ends the session on the server: the copied cookie answers 401 afterwards', async () => {
		const { user, cookie } = await signedIn('ines@shop.example');
		expect((await me(cookie)).status).toBe(200);
		const actor = { id: user.id, email: user.email, name: user.name, via: 'session' };
		const { thrown } = await runAction(
			signOutActions.default,
			withCookie('/signout', cookie, {}, actor)
		);
		expect(thrown?.status).toBe(303);
		expect((await me(cookie)).status).toBe(401);
	});

	it('ends only that session: another browser of the same person stays signed in', async () => {
		const first = await signedIn('jo@shop.example');
		// a second sign-in of the same account (another browser)
		const cookies = cookieJar();
		await runAction(
			signInActions.password,
			formEvent({
				url: '/signin?/password',
				fields: { email: 'jo@shop.example', password: 'a long passphrase', redirectTo: '/' },
				cookies
			})
		);
		const name = [...cookies.values.keys()].find((k) => k.endsWith('authjs.session-token'))!;
		const second = `${name}=${cookies.values.get(name)}`;
		const actor = { id: first.user.id, email: first.user.email, name: 'Jo', via: 'session' };
		await runAction(signOutActions.default, withCookie('/signout', first.cookie, {}, actor));
		expect((await me(first.cookie)).status).toBe(401);
		expect((await me(second)).status).toBe(200);
	});
});

describe('sign out everywhere (account page)', () => {
	it('ends every session and, when ticked, revokes the API tokens', async () => {
		const { user, cookie } = await signedIn('kai@shop.example');
		const actor = { id: user.id, email: user.email, name: user.name, via: 'session' as const };
		await createApiToken(actor, { name: 'Cut-list script' });
		const { thrown } = await runAction(
			accountActions.signOutEverywhere,
			withCookie('/account?/signOutEverywhere', cookie, { revokeTokens: 'on' }, actor)
		);
		expect(thrown).toMatchObject({
			status: 303,
			location: '/signin?notice=signed-out-everywhere-tokens'
		});
		expect((await me(cookie)).status).toBe(401);
		expect(await listApiTokens(actor)).toEqual([]);
	});

	it('keeps the tokens when the box is left unticked, and says so', async () => {
		const { user, cookie } = await signedIn('lee@shop.example');
		const actor = { id: user.id, email: user.email, name: user.name, via: 'session' as const };
		await createApiToken(actor, { name: 'Shop laptop' });
		const { thrown } = await runAction(
			accountActions.signOutEverywhere,
			withCookie('/account?/signOutEverywhere', cookie, {}, actor)
		);
		expect(thrown?.location).toBe('/signin?notice=signed-out-everywhere');
		expect((await me(cookie)).status).toBe(401);
		expect((await listApiTokens(actor)).map((t) => t.name)).toEqual(['Shop laptop']);
	});
});

describe('a password reset', () => {
	it('revokes the API tokens as well as the sessions', async () => {
		const { user, cookie } = await signedIn('mo@shop.example');
		const actor = { id: user.id, email: user.email, name: user.name, via: 'session' as const };
		await createApiToken(actor, { name: 'Nightly export' });
		const sent = new Date();
		await requestPasswordReset('mo@shop.example', 'http://localhost:5173');
		const message = await waitForMailTo('mo@shop.example', { dir: mail.dir, after: sent });
		const link = message.links.find((l) => l.startsWith('http://localhost:5173/reset/'))!;
		const token = link.split('/reset/')[1];
		expect(await resetPassword(token, 'another long passphrase', Date.now() + 1500)).toBe(true);
		expect((await me(cookie)).status).toBe(401);
		expect(await listApiTokens(actor)).toEqual([]);
	});
});
