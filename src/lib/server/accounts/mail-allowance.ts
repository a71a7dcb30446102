import { getDb } from '../db';
import { signInFailures } from '../db/tables';
import { recentFailures, refusedUntilOf } from './throttle';

const MAIL_REQUESTS_PER_WINDOW = 5;

/**
 * Count one request to mail this address (a sign-in link, a reset link) and say whether it may be
 * sent: at most five within 15 minutes, so the forms cannot be used to flood someone's inbox.
 */
export async function allowMailTo(
	email: string,
	now = Date.now()
): Promise<{ ok: true } | { ok: false; retryAfterMinutes: number }> {
	const key = `mail:${email.trim().toLowerCase()}`;
	const times = await recentFailures(key, now);
	const until = refusedUntilOf(times, MAIL_REQUESTS_PER_WINDOW);
	if (until > now)
		return { ok: false, retryAfterMinutes: Math.max(1, Math.ceil((until - now) / 60000)) };
	await getDb()
		.insert(signInFailures)
		.values({ key, at: new Date(now) });
	return { ok: true };
}
