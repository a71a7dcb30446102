import { error } from '@sveltejs/kit';
import { hash, verify } from '@node-rs/argon2';
import { and, desc, eq, gt, isNull, lt } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import type { LengthUnit } from '../schemas/preferences';
import { LENGTH_UNITS } from '../schemas/preferences';
import type { Actor } from './access';
import { getDb } from './db';
import { apiTokens, passwordResets, signInFailures, users } from './db/schema';
import { sendPasswordReset } from './mail';
import { createWorkshopFor } from './workshops';

export interface AccountUser {
	id: string;
	email: string;
	name: string | null;
}

export class AccountExistsError extends Error {
	constructor() {
		super('An account with this e-mail address already exists.');
	}
}

export function sha256(text: string) {
	return createHash('sha256').update(text).digest('hex');
}

function randomSecret(bytes = 32) {
	return randomBytes(bytes).toString('base64url');
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

// ---- users and passwords ----

/** Create an account with a password, and the personal workshop every account starts with. */
export async function createUser(input: {
	name: string;
	email: string;
	password: string;
}): Promise<AccountUser> {
	const email = input.email.trim().toLowerCase();
	// argon2id with the library's defaults (its recommended parameters)
	const passwordHash = await hash(input.password);
	const db = getDb();
	try {
		return db.transaction((tx) => {
			const user = tx
				.insert(users)
				.values({ name: input.name.trim(), email, passwordHash })
				.returning({ id: users.id, email: users.email, name: users.name })
				.get();
			createWorkshopFor(user.id, `${input.name.trim()}’s workshop`, true);
			return { id: user.id, email: user.email ?? email, name: user.name };
		});
	} catch (e) {
		if (isUniqueViolation(e)) throw new AccountExistsError();
		throw e;
	}
}

function isUniqueViolation(e: unknown) {
	return (
		typeof e === 'object' &&
		e !== null &&
		'code' in e &&
		String(e.code).startsWith('SQLITE_CONSTRAINT')
	);
}

export function findUserByEmail(email: string) {
	return getDb().select().from(users).where(eq(users.email, email.trim().toLowerCase())).get();
}

// Verified against when the address is unknown, so a miss costs as long as a hit.
let decoyHash: Promise<string> | undefined;

/** The user when the e-mail and password match; null otherwise (no hint which one was wrong). */
export async function verifyPassword(email: string, password: string): Promise<AccountUser | null> {
	const user = findUserByEmail(email);
	if (!user?.passwordHash || !user.email) {
		decoyHash ??= hash(randomSecret());
		await verify(await decoyHash, password).catch(() => false);
		return null;
	}
	const ok = await verify(user.passwordHash, password).catch(() => false);
	return ok ? { id: user.id, email: user.email, name: user.name } : null;
}

/** The acting user for a user id (from a verified session), or null when the account is gone. */
export function actorForUserId(id: string, via: Actor['via'] = 'session'): Actor | null {
	const user = getDb()
		.select({ id: users.id, email: users.email, name: users.name })
		.from(users)
		.where(eq(users.id, id))
		.get();
	if (!user?.email) return null;
	return { id: user.id, email: user.email, name: user.name, via };
}

// ---- failed sign-in throttling ----

export const SIGN_IN_WINDOW_MS = 15 * 60 * 1000;
/** From the third failure on, each further attempt waits a little longer. */
export const SLOW_AFTER_FAILURES = 3;
/** Five failures for one address within the window, and further attempts are refused. */
export const REFUSE_AFTER_FAILURES = 5;
// Per client address the bar is higher: a school or a shop may share one address among many people.
export const REFUSE_AFTER_FAILURES_PER_CLIENT = 20;

export type SignInGate =
	| { state: 'open' }
	| { state: 'slow'; delayMs: number }
	| { state: 'refused'; retryAfterMinutes: number };

const emailKey = (email: string) => `email:${email.trim().toLowerCase()}`;
const clientKey = (address: string) => `client:${address}`;

function recentFailures(key: string, now: number) {
	return getDb()
		.select({ at: signInFailures.at })
		.from(signInFailures)
		.where(
			and(eq(signInFailures.key, key), gt(signInFailures.at, new Date(now - SIGN_IN_WINDOW_MS)))
		)
		.orderBy(desc(signInFailures.at))
		.all()
		.map((r) => r.at.getTime());
}

/** Whether a sign-in for this e-mail from this client address may go ahead now. */
export function signInGate(email: string, clientAddress: string, now = Date.now()): SignInGate {
	const byEmail = recentFailures(emailKey(email), now);
	const byClient = recentFailures(clientKey(clientAddress), now);
	const refusedUntil = Math.max(
		refusedUntilOf(byEmail, REFUSE_AFTER_FAILURES),
		refusedUntilOf(byClient, REFUSE_AFTER_FAILURES_PER_CLIENT)
	);
	if (refusedUntil > now)
		return {
			state: 'refused',
			retryAfterMinutes: Math.max(1, Math.ceil((refusedUntil - now) / 60000))
		};
	const failures = Math.max(byEmail.length, byClient.length);
	if (failures >= SLOW_AFTER_FAILURES)
		return { state: 'slow', delayMs: Math.min(4000, 1000 * (failures - SLOW_AFTER_FAILURES + 1)) };
	return { state: 'open' };
}

// Refused until the oldest of the last `limit` failures leaves the window. `times` is newest first.
function refusedUntilOf(times: number[], limit: number) {
	return times.length >= limit ? times[limit - 1] + SIGN_IN_WINDOW_MS : 0;
}

export function recordSignInFailure(email: string, clientAddress: string, now = Date.now()) {
	const db = getDb();
	const at = new Date(now);
	db.transaction((tx) => {
		tx.insert(signInFailures)
			.values([
				{ key: emailKey(email), at },
				{ key: clientKey(clientAddress), at }
			])
			.run();
		// keep the table small: what has left the window no longer counts
		tx.delete(signInFailures)
			.where(lt(signInFailures.at, new Date(now - SIGN_IN_WINDOW_MS)))
			.run();
	});
}

export function clearSignInFailures(email: string) {
	getDb()
		.delete(signInFailures)
		.where(eq(signInFailures.key, emailKey(email)))
		.run();
}

export type PasswordSignInResult =
	| { ok: true; user: AccountUser }
	| { ok: false; reason: 'wrong' }
	| { ok: false; reason: 'unverified' }
	| { ok: false; reason: 'throttled'; retryAfterMinutes: number };

/** The whole password check: throttle, slow down, verify, record the outcome. */
export async function passwordSignIn(
	input: { email: string; password: string },
	clientAddress: string
): Promise<PasswordSignInResult> {
	const gate = signInGate(input.email, clientAddress);
	if (gate.state === 'refused')
		return { ok: false, reason: 'throttled', retryAfterMinutes: gate.retryAfterMinutes };
	if (gate.state === 'slow') await sleep(gate.delayMs);
	const user = await verifyPassword(input.email, input.password);
	if (!user) {
		recordSignInFailure(input.email, clientAddress);
		return { ok: false, reason: 'wrong' };
	}
	clearSignInFailures(input.email);
	// An unconfirmed address could be someone else's; invitations are matched by address, so the
	// address must be proven (by a mailed link) before the password alone lets anyone in.
	if (!findUserByEmail(user.email)?.emailVerified) return { ok: false, reason: 'unverified' };
	return { ok: true, user };
}

// ---- how much mail one address may be sent ----

export const MAIL_REQUESTS_PER_WINDOW = 5;

/**
 * Count one request to mail this address (a sign-in link, a reset link) and say whether it may be
 * sent: at most five within 15 minutes, so the forms cannot be used to flood someone's inbox.
 */
export function allowMailTo(
	email: string,
	now = Date.now()
): { ok: true } | { ok: false; retryAfterMinutes: number } {
	const key = `mail:${email.trim().toLowerCase()}`;
	const times = recentFailures(key, now);
	const until = refusedUntilOf(times, MAIL_REQUESTS_PER_WINDOW);
	if (until > now)
		return { ok: false, retryAfterMinutes: Math.max(1, Math.ceil((until - now) / 60000)) };
	getDb()
		.insert(signInFailures)
		.values({ key, at: new Date(now) })
		.run();
	return { ok: true };
}

export function throttleMessage(retryAfterMinutes: number) {
	return `Too many failed sign-ins; try again in ${retryAfterMinutes} minute${retryAfterMinutes === 1 ? '' : 's'}.`;
}

// ---- password reset ----

export const PASSWORD_RESET_TTL_MS = 60 * 60 * 1000;

/**
 * Mail a one-time link for choosing a new password. Says nothing about whether the address has an
 * account: the caller shows the same answer either way.
 */
export async function requestPasswordReset(
	email: string,
	origin: string,
	now = Date.now()
): Promise<{ ok: true } | { ok: false; retryAfterMinutes: number }> {
	// counted for every address, known or not, so the answer gives nothing away
	const allowed = allowMailTo(email, now);
	if (!allowed.ok) return allowed;
	const user = findUserByEmail(email);
	if (!user?.email) return { ok: true };
	const token = randomSecret();
	getDb()
		.insert(passwordResets)
		.values({
			tokenHash: sha256(token),
			userId: user.id,
			expiresAt: new Date(now + PASSWORD_RESET_TTL_MS)
		})
		.run();
	await sendPasswordReset(user.email, `${origin}/reset/${token}`);
	return { ok: true };
}

function liveReset(token: string, now: number) {
	return getDb()
		.select()
		.from(passwordResets)
		.where(
			and(
				eq(passwordResets.tokenHash, sha256(token)),
				isNull(passwordResets.usedAt),
				gt(passwordResets.expiresAt, new Date(now))
			)
		)
		.get();
}

/** Whether a reset link can still be used (for showing the form or an "expired" note). */
export function resetTokenIsLive(token: string, now = Date.now()) {
	return Boolean(liveReset(token, now));
}

/** Set a new password with a reset link. Consumes the link; false when it is unknown, used or expired. */
export async function resetPassword(token: string, newPassword: string, now = Date.now()) {
	if (!liveReset(token, now)) return false;
	const passwordHash = await hash(newPassword);
	const db = getDb();
	return db.transaction((tx) => {
		// claim the link atomically, so two tabs cannot both use it
		const claimed = tx
			.update(passwordResets)
			.set({ usedAt: new Date(now) })
			.where(
				and(
					eq(passwordResets.tokenHash, sha256(token)),
					isNull(passwordResets.usedAt),
					gt(passwordResets.expiresAt, new Date(now))
				)
			)
			.returning({ userId: passwordResets.userId })
			.get();
		if (!claimed) return false;
		const user = tx
			.update(users)
			.set({ passwordHash, sessionsValidFrom: new Date(now) })
			.where(eq(users.id, claimed.userId))
			.returning({ email: users.email, emailVerified: users.emailVerified })
			.get();
		// the mail reached them, so the address is theirs
		if (user && !user.emailVerified)
			tx.update(users)
				.set({ emailVerified: new Date(now) })
				.where(eq(users.id, claimed.userId))
				.run();
		// other links sent earlier stop working too
		tx.update(passwordResets)
			.set({ usedAt: new Date(now) })
			.where(and(eq(passwordResets.userId, claimed.userId), isNull(passwordResets.usedAt)))
			.run();
		if (user?.email)
			tx.delete(signInFailures)
				.where(eq(signInFailures.key, emailKey(user.email)))
				.run();
		return true;
	});
}

// ---- personal API tokens ----

export interface ApiTokenSummary {
	id: string;
	name: string;
	prefix: string;
	createdAt: Date;
	lastUsedAt: Date | null;
}

const TOKEN_PREFIX = 'spw_';
// Writing lastUsedAt on every request would make each API call a write; once a minute is enough.
const LAST_USED_RESOLUTION_MS = 60 * 1000;

/** Create a token. The secret is in the answer and nowhere else: only its sha-256 is kept. */
export function createApiToken(actor: Actor, input: { name: string }) {
	// A token cannot mint further tokens: a leaked one must not be able to outlive its revocation.
	if (actor.via !== 'session')
		error(403, 'API tokens can only be created while signed in in a browser.');
	const secret = TOKEN_PREFIX + randomSecret(24);
	const row = getDb()
		.insert(apiTokens)
		.values({
			userId: actor.id,
			name: input.name.trim(),
			tokenHash: sha256(secret),
			prefix: secret.slice(0, 12)
		})
		.returning()
		.get();
	return { ...summary(row), secret };
}

function summary(row: typeof apiTokens.$inferSelect): ApiTokenSummary {
	return {
		id: row.id,
		name: row.name,
		prefix: row.prefix,
		createdAt: row.createdAt,
		lastUsedAt: row.lastUsedAt
	};
}

/** The actor's tokens that still work, newest first. */
export function listApiTokens(actor: Actor): ApiTokenSummary[] {
	return getDb()
		.select()
		.from(apiTokens)
		.where(and(eq(apiTokens.userId, actor.id), isNull(apiTokens.revokedAt)))
		.orderBy(desc(apiTokens.createdAt))
		.all()
		.map(summary);
}

/** Revoke one of the actor's own tokens. False when there is no such live token of theirs. */
export function revokeApiToken(actor: Actor, id: string, now = Date.now()) {
	const row = getDb()
		.update(apiTokens)
		.set({ revokedAt: new Date(now) })
		.where(and(eq(apiTokens.id, id), eq(apiTokens.userId, actor.id), isNull(apiTokens.revokedAt)))
		.returning({ id: apiTokens.id })
		.get();
	return Boolean(row);
}

/** The actor for an `Authorization: Bearer <token>` header, or null for anything else. */
export function actorFromBearer(header: string | null | undefined, now = Date.now()): Actor | null {
	const match = /^Bearer\s+(\S+)\s*$/i.exec(header ?? '');
	if (!match || !match[1].startsWith(TOKEN_PREFIX) || match[1].length > 200) return null;
	const db = getDb();
	const row = db
		.select({
			id: apiTokens.id,
			lastUsedAt: apiTokens.lastUsedAt,
			userId: users.id,
			email: users.email,
			name: users.name
		})
		.from(apiTokens)
		.innerJoin(users, eq(users.id, apiTokens.userId))
		.where(and(eq(apiTokens.tokenHash, sha256(match[1])), isNull(apiTokens.revokedAt)))
		.get();
	if (!row?.email) return null;
	if (!row.lastUsedAt || now - row.lastUsedAt.getTime() >= LAST_USED_RESOLUTION_MS)
		db.update(apiTokens)
			.set({ lastUsedAt: new Date(now) })
			.where(eq(apiTokens.id, row.id))
			.run();
	return { id: row.userId, email: row.email, name: row.name, via: 'token' };
}

// ---- profile and preferences ----

export function getProfile(actor: Actor) {
	const row = getDb()
		.select({ id: users.id, email: users.email, name: users.name, lengthUnit: users.lengthUnit })
		.from(users)
		.where(eq(users.id, actor.id))
		.get();
	if (!row) error(401, 'Sign in to continue.');
	return { ...row, lengthUnit: asLengthUnit(row.lengthUnit) };
}

function asLengthUnit(value: string): LengthUnit {
	return (LENGTH_UNITS as readonly string[]).includes(value) ? (value as LengthUnit) : 'frac16';
}

export function setLengthUnit(actor: Actor, unit: LengthUnit) {
	if (!(LENGTH_UNITS as readonly string[]).includes(unit))
		throw new Error(`unknown length unit ${unit}`);
	getDb().update(users).set({ lengthUnit: unit }).where(eq(users.id, actor.id)).run();
}

export function updateProfile(actor: Actor, input: { name: string; lengthUnit: LengthUnit }) {
	setLengthUnit(actor, input.lengthUnit);
	getDb().update(users).set({ name: input.name.trim() }).where(eq(users.id, actor.id)).run();
}

/**
 * Whether a session token issued at `issuedAtSeconds` (JWT `iat`) is still honoured: a password
 * reset ends every session issued before it (a copied cookie stops working too).
 */
export function sessionIsCurrent(userId: string, issuedAtSeconds: number | undefined) {
	const row = getDb()
		.select({ validFrom: users.sessionsValidFrom })
		.from(users)
		.where(eq(users.id, userId))
		.get();
	if (!row) return false;
	if (!row.validFrom) return true;
	// iat has whole seconds: a token of the same second as the reset is let through
	return ((issuedAtSeconds ?? 0) + 1) * 1000 > row.validFrom.getTime();
}
