import { and, desc, eq, gt, lt } from 'drizzle-orm';
import { getDb } from '../db';
import { signInFailures } from '../db/schema';

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

export const emailKey = (email: string) => `email:${email.trim().toLowerCase()}`;
const clientKey = (address: string) => `client:${address}`;

/** Times (ms) of the failures counted under `key` within the window, newest first. */
export function recentFailures(key: string, now: number) {
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

/** Refused until the oldest of the last `limit` failures leaves the window. `times` is newest first. */
export function refusedUntilOf(times: number[], limit: number) {
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

export function throttleMessage(retryAfterMinutes: number) {
	return `Too many failed sign-ins; try again in ${retryAfterMinutes} minute${retryAfterMinutes === 1 ? '' : 's'}.`;
}
