import { and, desc, eq, gt, inArray, lt } from 'drizzle-orm';
import { getDb, transaction } from '../db';
import { signInFailures } from '../db/tables';

const SIGN_IN_WINDOW_MS = 15 * 60 * 1000;
/** From an account's third failure on (from anywhere), each further attempt waits a little longer. */
const SLOW_AFTER_FAILURES = 3;
/**
 * Five failures for one account from one client address within the window, and that address may
 * not try that account again until the window has moved on. The account's owner, elsewhere, still
 * can: one address cannot lock anyone out of an account it does not own.
 */
export const REFUSE_AFTER_FAILURES = 5;
// Per client address, over all accounts, the bar is higher: a school or a shop may share one
// address among many people (behind a proxy, see ADDRESS_HEADER in the README).
const REFUSE_AFTER_FAILURES_PER_CLIENT = 20;

type SignInGate =
	| { state: 'open' }
	| { state: 'slow'; delayMs: number }
	| { state: 'refused'; retryAfterMinutes: number };

export const emailKey = (email: string) => `email:${email.trim().toLowerCase()}`;
const clientKey = (address: string) => `client:${address}`;
/** The start of every per-address key of one account. */
export const pairKeyPrefix = (email: string) => `pair:${email.trim().toLowerCase()}|`;
const pairKey = (email: string, address: string) => pairKeyPrefix(email) + address;

/** Times (ms) of the failures counted under `key` within the window, newest first. */
export async function recentFailures(key: string, now: number) {
	const rows = await getDb()
		.select({ at: signInFailures.at })
		.from(signInFailures)
		.where(
			and(eq(signInFailures.key, key), gt(signInFailures.at, new Date(now - SIGN_IN_WINDOW_MS)))
		)
		.orderBy(desc(signInFailures.at));
	return rows.map((r) => r.at.getTime());
}

/**
 * Whether a sign-in for this e-mail from this client address may go ahead now: refused for this
 * account from this address, or for this address altogether; slowed for the account wherever the
 * failures came from.
 */
export async function signInGate(
	email: string,
	clientAddress: string,
	now = Date.now()
): Promise<SignInGate> {
	const byEmail = await recentFailures(emailKey(email), now);
	const byPair = await recentFailures(pairKey(email, clientAddress), now);
	const byClient = await recentFailures(clientKey(clientAddress), now);
	const refusedUntil = Math.max(
		refusedUntilOf(byPair, REFUSE_AFTER_FAILURES),
		refusedUntilOf(byClient, REFUSE_AFTER_FAILURES_PER_CLIENT)
	);
	if (refusedUntil > now)
		return {
			state: 'refused',
			retryAfterMinutes: Math.max(1, Math.ceil((refusedUntil - now) / 60000))
		};
	const failures = byEmail.length;
	if (failures >= SLOW_AFTER_FAILURES)
		return { state: 'slow', delayMs: Math.min(4000, 1000 * (failures - SLOW_AFTER_FAILURES + 1)) };
	return { state: 'open' };
}

/** Refused until the oldest of the last `limit` failures leaves the window. `times` is newest first. */
export function refusedUntilOf(times: number[], limit: number) {
	return times.length >= limit ? times[limit - 1] + SIGN_IN_WINDOW_MS : 0;
}

export async function recordSignInFailure(email: string, clientAddress: string, now = Date.now()) {
	const at = new Date(now);
	await transaction(async (tx) => {
		await tx.insert(signInFailures).values([
			{ key: emailKey(email), at },
			{ key: pairKey(email, clientAddress), at },
			{ key: clientKey(clientAddress), at }
		]);
		// keep the table small: what has left the window no longer counts
		await tx.delete(signInFailures).where(lt(signInFailures.at, new Date(now - SIGN_IN_WINDOW_MS)));
	});
}

/** After a successful sign-in: the account's count, and its count from this address, start again. */
export async function clearSignInFailures(email: string, clientAddress?: string) {
	const keys = [emailKey(email)];
	if (clientAddress !== undefined) keys.push(pairKey(email, clientAddress));
	await getDb().delete(signInFailures).where(inArray(signInFailures.key, keys));
}

export function throttleMessage(retryAfterMinutes: number) {
	return `Too many failed sign-ins; try again in ${retryAfterMinutes} minute${retryAfterMinutes === 1 ? '' : 's'}.`;
}
