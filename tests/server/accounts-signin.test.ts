import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { createUser } from '../../src/lib/server/accounts/users';
import { authHandle } from '../../src/lib/server/auth';
import { schema, oneRow } from '../../src/lib/server/db';
import { listCaughtMail, waitForMailTo } from '../../src/lib/server/dev/caught-mail';
import { actions as signInActions } from '../../src/routes/(public)/signin/+page.server';
import { actions as signUpActions } from '../../src/routes/(public)/signup/+page.server';
import { actions as resetActions } from '../../src/routes/(public)/reset/+page.server';
import { handleError } from '../../src/hooks.server';
import { useTempDb } from './support/db';
import { useMailCatcher } from './support/mail';
import { cookieJar, formEvent, runAction } from './support/request';

const db = useTempDb();
const mail = useMailCatcher();

const sessionCookie = (jar: ReturnType<typeof cookieJar>) =>
	[...jar.values.keys()].find((k) => k.endsWith('authjs.session-token'));

async function confirmedUser(email: string, password: string) {
	const user = await createUser({ name: 'Flo', email, password });
	await db()
		.db.update(schema.users)
		.set({ emailVerified: new Date() })
		.where(eq(schema.users.id, user.id));
	return user;
}

describe('the sign-in page', () => {
	it('signs in with the right password: a session cookie and a 303 to the projects', async () => {
		await confirmedUser('flo@shop.example', 'right password here');
		const cookies = cookieJar();
		const event = formEvent({
			url: '/signin?/password',
			fields: {
				email: 'flo@shop.example',
				password: 'right password here',
				redirectTo: '/projects'
			},
			cookies
		});
		const { thrown } = await runAction(signInActions.password, event);
		expect(thrown).toMatchObject({ status: 303, location: '/projects' });
		expect(sessionCookie(cookies)).toBeTruthy();
	});

	it('answers 400 with the message next to the password for a wrong one, and sets no cookie', async () => {
		const cookies = cookieJar();
		const event = formEvent({
			url: '/signin?/password',
			fields: { email: 'flo@shop.example', password: 'wrong', redirectTo: '/' },
			cookies
		});
		const { returned } = (await runAction(signInActions.password, event)) as {
			returned: {
				status: number;
				data: { form: { errors: Record<string, string[]>; data: Record<string, string> } };
			};
		};
		expect(returned.status).toBe(400);
		expect(returned.data.form.errors.password?.[0]).toMatch(/do not match/);
		expect(returned.data.form.data.email).toBe('flo@shop.example');
		expect(sessionCookie(cookies)).toBeUndefined();
	});

	it('answers 429 "Too many failed sign-ins" once five have failed within 15 minutes', async () => {
		await confirmedUser('gus@shop.example', 'right password here');
		const attempt = (password: string) =>
			runAction(
				signInActions.password,
				formEvent({
					url: '/signin?/password',
					fields: { email: 'gus@shop.example', password },
					clientAddress: '203.0.113.50'
				})
			) as Promise<{ returned: { status: number; data: { form: { message?: string } } } }>;
		for (let i = 0; i < 5; i++) expect((await attempt('not it')).returned.status).toBe(400);
		const refused = await attempt('right password here');
		expect(refused.returned.status).toBe(429);
		expect(refused.returned.data.form.message).toBe(
			'Too many failed sign-ins; try again in 15 minutes.'
		);
	});

	it('refuses a redirect to another site after sign-in', async () => {
		const { thrown } = await runAction(
			signInActions.password,
			formEvent({
				url: '/signin?/password',
				fields: {
					email: 'flo@shop.example',
					password: 'right password here',
					redirectTo: '//evil.example/x'
				}
			})
		);
		expect(thrown).toMatchObject({ status: 303, location: '/projects' });
	});
});

describe('sign-up, then the mailed link', () => {
	it('creates the account, mails a confirm-and-sign-in link, and the password waits for it', async () => {
		const after = new Date();
		const { thrown } = await runAction(
			signUpActions.default,
			formEvent({
				url: '/signup',
				fields: {
					name: 'Hana',
					email: 'Hana@Shop.example',
					password: 'a long passphrase',
					redirectTo: '/invite/abc'
				}
			})
		);
		expect(thrown).toMatchObject({ status: 303 });
		expect(thrown!.location).toMatch(/^\/signin\?sent=signup/);
		const message = await waitForMailTo('hana@shop.example', { dir: mail.dir, after });
		expect(message.subject).toBe('Confirm your address for Spanwright');
		const link = message.links.find((l) => l.includes('/auth/callback/nodemailer'));
		expect(link).toBeTruthy();
		expect(new URL(link!).searchParams.get('callbackUrl')).toBe('http://localhost:5173/invite/abc');
		expect(new URL(link!).searchParams.get('email')).toBe('hana@shop.example');

		// before the link is followed, the right password alone does not sign in
		const early = (await runAction(
			signInActions.password,
			formEvent({
				url: '/signin?/password',
				fields: { email: 'hana@shop.example', password: 'a long passphrase' }
			})
		)) as { returned: { status: number; data: { form: { message?: string } } } };
		expect(early.returned.status).toBe(400);
		expect(early.returned.data.form.message).toMatch(/Confirm your e-mail address first/);

		// following the link (Auth.js answers /auth/* itself) signs in and confirms the address
		const url = new URL(link!);
		const getLink = {
			...formEvent({ url: url.pathname + url.search, fields: {} }),
			request: new Request(url)
		};
		const response = await authHandle({
			event: getLink,
			resolve: () => new Response('not reached')
		});
		expect(response.status).toBe(302);
		expect(response.headers.get('location')).toBe('http://localhost:5173/invite/abc');
		expect(response.headers.getSetCookie().some((c) => c.includes('authjs.session-token='))).toBe(
			true
		);
		const row = await db()
			.db.select()
			.from(schema.users)
			.where(eq(schema.users.email, 'hana@shop.example'))
			.then(oneRow);
		expect(row.emailVerified).toBeInstanceOf(Date);
		// and the same link does not work twice
		const again = await authHandle({
			event: { ...getLink, request: new Request(url) },
			resolve: () => new Response('')
		});
		expect(again.headers.get('location')).toMatch(/\/signin\?error=Verification/);

		const later = await runAction(
			signInActions.password,
			formEvent({
				url: '/signin?/password',
				fields: { email: 'hana@shop.example', password: 'a long passphrase' }
			})
		);
		expect(later.thrown).toMatchObject({ status: 303, location: '/projects' });
	});

	it('answers a known address exactly as a new one, and mails its owner instead (no enumeration)', async () => {
		const sentAt = new Date();
		const answer = async (email: string) => {
			// like SvelteKit's, these cookies cannot be set once the answer has gone
			const jar = cookieJar();
			let answered = false;
			const cookies = {
				...jar,
				set: (...args: Parameters<typeof jar.set>) => {
					if (answered) throw new Error('Cannot use `cookies.set(...)` after the response');
					jar.set(...args);
				}
			};
			const { thrown } = await runAction(
				signUpActions.default,
				formEvent({
					url: '/signup',
					fields: { name: 'Flo 2', email, password: 'another long one' },
					cookies: cookies as never
				})
			);
			answered = true;
			return thrown;
		};
		const known = await answer('flo@shop.example');
		const fresh = await answer('new-flo@shop.example');
		expect(known?.status).toBe(303);
		expect(known?.location).toBe('/signin?sent=signup&email=flo%40shop.example');
		expect(fresh?.location).toBe('/signin?sent=signup&email=new-flo%40shop.example');
		const notice = await waitForMailTo('flo@shop.example', { dir: mail.dir, after: sentAt });
		expect(notice.subject).toMatch(/already have a Spanwright account/);
		// the new address gets its confirmation link, sent after the answer
		const confirmation = await waitForMailTo('new-flo@shop.example', {
			dir: mail.dir,
			after: sentAt
		});
		expect(confirmation.links.some((l) => l.includes('/auth/callback/'))).toBe(true);
		// the known account is as it was: no second user, the password unchanged
		const rows = await db()
			.db.select()
			.from(schema.users)
			.where(eq(schema.users.email, 'flo@shop.example'));
		expect(rows).toHaveLength(1);
	});
});

describe('when mail cannot be sent', () => {
	it('the reset page answers 503 with a plain message and keeps the address typed', async () => {
		const before = process.env.SMTP_URL;
		process.env.SMTP_URL = 'smtp://127.0.0.1:9'; // the discard port: nothing listens there
		try {
			const { returned } = (await runAction(
				resetActions.default,
				formEvent({ url: '/reset', fields: { email: 'flo@shop.example' } })
			)) as {
				returned: { status: number; data: { form: { message: string; data: { email: string } } } };
			};
			expect(returned.status).toBe(503);
			expect(returned.data.form.message).toMatch(/could not send mail just now/);
			expect(returned.data.form.data.email).toBe('flo@shop.example');
			// and the same for an address with no account, so the 503 tells nothing either
			const unknown = (await runAction(
				resetActions.default,
				formEvent({ url: '/reset', fields: { email: 'nobody-here@shop.example' } })
			)) as { returned: { status: number } };
			expect(unknown.returned.status).toBe(503);
		} finally {
			process.env.SMTP_URL = before;
		}
	});
});

describe('handleError', () => {
	it('gives the client a message and an id, never the stack', async () => {
		const logged: unknown[] = [];
		const original = console.error;
		console.error = (...args: unknown[]) => logged.push(args);
		try {
			const body = await handleError({
				error: new Error('secret table name in a stack'),
				event: {
					request: new Request('http://localhost/x'),
					url: new URL('http://localhost/x')
				} as unknown as Parameters<typeof handleError>[0]['event'],
				status: 500,
				message: 'Internal Error'
			});
			expect(Object.keys(body!).sort()).toEqual(['id', 'message']);
			expect(body!.message).toBe('Something went wrong on our side.');
			expect(JSON.stringify(body)).not.toContain('secret table');
			expect(String((logged[0] as unknown[])[0])).toContain(body!.id!);
		} finally {
			console.error = original;
		}
	});
});

describe('a reset request', () => {
	it('answers a known and an unknown address alike, and mails after answering', async () => {
		const ask = async (email: string) =>
			(await runAction(resetActions.default, formEvent({ url: '/reset', fields: { email } }))) as {
				returned: { form: { message: string; valid: boolean } };
			};
		const after = new Date();
		const known = await ask('flo@shop.example');
		// the letter is not out yet when the page answers: it goes after
		const caught = listCaughtMail(mail.dir).filter(
			(m) => m.to.includes('flo@shop.example') && new Date(m.receivedAt) >= after
		);
		expect(caught).toEqual([]);
		const unknown = await ask('nobody-at-all@shop.example');
		expect(known.returned.form.valid).toBe(unknown.returned.form.valid);
		expect(known.returned.form.message.replace('flo@shop.example', 'X')).toBe(
			unknown.returned.form.message.replace('nobody-at-all@shop.example', 'X')
		);
		const letter = await waitForMailTo('flo@shop.example', { dir: mail.dir, after });
		expect(letter.subject).toMatch(/new Spanwright password/);
	});
});
