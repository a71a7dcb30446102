import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import {
	PASSWORD_RESET_TTL_MS,
	requestPasswordReset,
	resetPassword,
	resetTokenIsLive
} from '../../src/lib/server/accounts/password-resets';
import { getProfile, setLengthUnit } from '../../src/lib/server/accounts/profile';
import { sessionIsCurrent } from '../../src/lib/server/accounts/sessions';
import { passwordSignIn, verifyPassword } from '../../src/lib/server/accounts/sign-in';
import { REFUSE_AFTER_FAILURES, signInGate } from '../../src/lib/server/accounts/throttle';
import {
	AccountExistsError,
	actorForUserId,
	createUser,
	findUserByEmail
} from '../../src/lib/server/accounts/users';
import { latestMailTo, waitForMailTo } from '../../src/lib/server/dev/caught-mail';
import { linksIn } from '../../src/lib/server/dev/mail-catcher';
import { schema, oneRow } from '../../src/lib/server/db';
import { listWorkshops } from '../../src/lib/server/workshops';
import { useTempDb } from './support/db';
import { useMailCatcher } from './support/mail';

const db = useTempDb();
const mail = useMailCatcher();

describe('sign-up', () => {
	it('creates the user and their personal workshop, owned by them', async () => {
		const user = await createUser({
			name: 'Ada Joiner',
			email: ' Ada@Shop.example ',
			password: 'long enough words'
		});
		expect(user.email).toBe('ada@shop.example');
		const actor = (await actorForUserId(user.id))!;
		const workshops = await listWorkshops(actor);
		expect(workshops).toHaveLength(1);
		expect(workshops[0]).toMatchObject({
			personal: true,
			role: 'owner',
			name: 'Ada Joiner’s workshop'
		});
		const row = await db()
			.db.select()
			.from(schema.users)
			.where(eq(schema.users.id, user.id))
			.then(oneRow);
		expect(row.currentWorkshopId).toBe(workshops[0].id);
	});

	it('stores an argon2id hash, not the password', async () => {
		const user = await createUser({
			name: 'Ben',
			email: 'ben@shop.example',
			password: 'plain words here'
		});
		const row = await db()
			.db.select()
			.from(schema.users)
			.where(eq(schema.users.id, user.id))
			.then(oneRow);
		expect(row.passwordHash).not.toContain('plain words here');
		expect(row.passwordHash).toMatch(/^\$argon2id\$/);
	});

	it('refuses a second account under the same address', async () => {
		await expect(
			createUser({ name: 'Ada again', email: 'ADA@shop.example', password: 'another password' })
		).rejects.toBeInstanceOf(AccountExistsError);
	});
});

describe('password check', () => {
	it('accepts the right password and refuses a wrong one or an unknown address', async () => {
		expect(await verifyPassword('ada@shop.example', 'long enough words')).toMatchObject({
			email: 'ada@shop.example'
		});
		expect(await verifyPassword('ada@shop.example', 'long enough word')).toBeNull();
		expect(await verifyPassword('nobody@shop.example', 'long enough words')).toBeNull();
	});
});

describe('failed sign-in throttle', () => {
	it('slows after 3 failures and refuses after 5 within 15 minutes from that address, even the right password', async () => {
		await createUser({ name: 'Cy', email: 'cy@shop.example', password: 'correct horse staple' });
		const wrong = { email: 'cy@shop.example', password: 'wrong guess' };
		for (let i = 1; i <= REFUSE_AFTER_FAILURES; i++) {
			const r = await passwordSignIn(wrong, '203.0.113.7');
			expect(r).toEqual({ ok: false, reason: 'wrong' });
			if (i === 3) expect((await signInGate(wrong.email, '203.0.113.7')).state).toBe('slow');
		}
		// refused from the address the failures came from, even with the right password …
		const refused = await passwordSignIn(
			{ ...wrong, password: 'correct horse staple' },
			'203.0.113.7'
		);
		expect(refused).toEqual({ ok: false, reason: 'throttled', retryAfterMinutes: 15 });
		// … but not from another address: those failures cannot lock the owner out (issue 11.4);
		// the account is still slowed down wherever the next attempt comes from
		expect((await signInGate(wrong.email, '198.51.100.2')).state).toBe('slow');
		// 15 minutes after the first failure the oldest one has left the window
		expect(
			(await signInGate(wrong.email, '203.0.113.7', Date.now() + 15 * 60 * 1000 + 1000)).state
		).not.toBe('refused');
	});

	it('a success clears the count for that address', async () => {
		const di = await createUser({
			name: 'Di',
			email: 'di@shop.example',
			password: 'correct horse staple'
		});
		await db()
			.db.update(schema.users)
			.set({ emailVerified: new Date() })
			.where(eq(schema.users.id, di.id));
		await passwordSignIn({ email: 'di@shop.example', password: 'nope nope' }, '192.0.2.1');
		expect(
			(
				await passwordSignIn(
					{ email: 'di@shop.example', password: 'correct horse staple' },
					'192.0.2.1'
				)
			).ok
		).toBe(true);
		expect((await signInGate('di@shop.example', '192.0.2.9')).state).toBe('open');
	});
});

describe('an unconfirmed address', () => {
	it('does not let the right password alone sign in, and counts no failure', async () => {
		await createUser({ name: 'Fen', email: 'fen@shop.example', password: 'correct horse staple' });
		const r = await passwordSignIn(
			{ email: 'fen@shop.example', password: 'correct horse staple' },
			'192.0.2.5'
		);
		expect(r).toEqual({ ok: false, reason: 'unverified' });
		expect((await signInGate('fen@shop.example', '192.0.2.5')).state).toBe('open');
	});
});

describe('password reset', () => {
	it('mails a one-time link that sets the new password once', async () => {
		const sent = new Date();
		await requestPasswordReset('ben@shop.example', 'http://localhost:5173');
		const message = await waitForMailTo('ben@shop.example', { dir: mail.dir, after: sent });
		expect(message.subject).toMatch(/new Spanwright password/);
		const link = message.links.find((l) => l.startsWith('http://localhost:5173/reset/'))!;
		expect(link).toBeTruthy();
		const token = link.split('/reset/')[1];
		expect(await resetTokenIsLive(token)).toBe(true);
		const ben = (await findUserByEmail('ben@shop.example'))!;
		const issuedBefore = Math.floor(Date.now() / 1000) - 60; // a session from a minute ago
		expect(await sessionIsCurrent(ben.id, issuedBefore)).toBe(true);
		expect(await resetPassword(token, 'a fresh passphrase')).toBe(true);
		// the reset ends every earlier session, a copied cookie included; new ones are honoured
		expect(await sessionIsCurrent(ben.id, issuedBefore)).toBe(false);
		expect(await sessionIsCurrent(ben.id, Math.floor(Date.now() / 1000) + 1)).toBe(true);
		expect(await verifyPassword('ben@shop.example', 'a fresh passphrase')).not.toBeNull();
		expect(await verifyPassword('ben@shop.example', 'plain words here')).toBeNull();
		// the same link a second time does nothing
		expect(await resetPassword(token, 'yet another passphrase')).toBe(false);
		expect(await verifyPassword('ben@shop.example', 'a fresh passphrase')).not.toBeNull();
	});

	it('stores only the sha-256 of the token', async () => {
		const sent = new Date();
		await requestPasswordReset('ada@shop.example', 'http://localhost:5173');
		const token = (
			await waitForMailTo('ada@shop.example', { dir: mail.dir, after: sent })
		).links[0].split('/reset/')[1];
		const rows = await db().db.select().from(schema.passwordResets);
		expect(rows.some((r) => r.tokenHash === token)).toBe(false);
		expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.tokenHash))).toBe(true);
	});

	it('a link older than one hour no longer works', async () => {
		const sent = new Date();
		await requestPasswordReset('di@shop.example', 'http://localhost:5173');
		const token = (
			await waitForMailTo('di@shop.example', { dir: mail.dir, after: sent, subject: /password/ })
		).links[0].split('/reset/')[1];
		const later = Date.now() + PASSWORD_RESET_TTL_MS + 1000;
		expect(await resetTokenIsLive(token, later)).toBe(false);
		expect(await resetPassword(token, 'too late passphrase', later)).toBe(false);
		expect(await verifyPassword('di@shop.example', 'correct horse staple')).not.toBeNull();
	});

	it('sends nothing for an address without an account', async () => {
		await requestPasswordReset('ghost@shop.example', 'http://localhost:5173');
		await new Promise((r) => setTimeout(r, 200));
		expect(latestMailTo('ghost@shop.example', mail.dir)).toBeNull();
	});
});

describe('the mail catcher', () => {
	it('keeps each link once, whether it came from the text or an escaped href', () => {
		const url = 'http://localhost:5173/auth/callback/nodemailer?token=abc&email=a%40b.test';
		const html = `<a href="${url.replace(/&/g, '&#38;')}">Sign in</a> <a href="${url.replace(/&/g, '&amp;')}">x</a>`;
		expect(linksIn(`Open ${url}\n`, html)).toEqual([url]);
	});
});

describe('length unit preference', () => {
	it('is frac16 at first and keeps what the user picks', async () => {
		const user = await createUser({
			name: 'Eve',
			email: 'eve@shop.example',
			password: 'metric person here'
		});
		const actor = (await actorForUserId(user.id))!;
		expect((await getProfile(actor)).lengthUnit).toBe('frac16');
		await setLengthUnit(actor, 'mm');
		expect((await getProfile(actor)).lengthUnit).toBe('mm');
	});
});

describe('one address cannot lock anyone out (throttle per account and per address)', () => {
	it("an attacker's failures for someone else's account do not refuse the owner elsewhere", async () => {
		const owner = await createUser({
			name: 'Ivo',
			email: 'ivo@shop.example',
			password: 'correct horse staple'
		});
		await db()
			.db.update(schema.users)
			.set({ emailVerified: new Date() })
			.where(eq(schema.users.id, owner.id));
		for (let i = 0; i < REFUSE_AFTER_FAILURES + 2; i++)
			await passwordSignIn({ email: 'ivo@shop.example', password: `guess ${i}` }, '203.0.113.66');
		expect((await signInGate('ivo@shop.example', '203.0.113.66')).state).toBe('refused');
		// the owner, from home, is slowed (the account is under attack) but let in
		const gate = await signInGate('ivo@shop.example', '192.0.2.44');
		expect(gate.state).toBe('slow');
		const r = await passwordSignIn(
			{ email: 'ivo@shop.example', password: 'correct horse staple' },
			'192.0.2.44'
		);
		expect(r.ok).toBe(true);
	}, 30_000);

	it('an address that fails for many accounts is refused for all of them, and only that address', async () => {
		for (let i = 0; i < 20; i++)
			await passwordSignIn({ email: `nobody${i}@shop.example`, password: 'x' }, '198.51.100.99');
		expect((await signInGate('someone@shop.example', '198.51.100.99')).state).toBe('refused');
		expect((await signInGate('someone@shop.example', '198.51.100.100')).state).toBe('open');
	}, 30_000);
});
