import { randomUUID } from 'node:crypto';
import { eq, lt } from 'drizzle-orm';
import { getDb, firstRow, transaction } from '../db';
import { endedSessions, users } from '../db/tables';

/** What the session token carries that matters here (Auth.js's JWT claims plus our `sid`). */
interface SessionClaims {
	sub?: string;
	iat?: number;
	exp?: number;
	sid?: unknown;
}

/** A new id for one sign-in; it stays in the token as Auth.js renews it. */
export function newSessionId() {
	return randomUUID();
}

/**
 * Whether a session token is still honoured: not signed out, and issued after the last password
 * reset or "sign out everywhere" (a copied cookie stops working too).
 */
export async function sessionIsCurrent(
	userId: string,
	issuedAtSeconds: number | undefined,
	sessionId?: unknown
) {
	const db = getDb();
	if (typeof sessionId === 'string') {
		const ended = await db
			.select({ id: endedSessions.id })
			.from(endedSessions)
			.where(eq(endedSessions.id, sessionId))
			.then(firstRow);
		if (ended) return false;
	}
	const row = await db
		.select({ validFrom: users.sessionsValidFrom })
		.from(users)
		.where(eq(users.id, userId))
		.then(firstRow);
	if (!row) return false;
	if (!row.validFrom) return true;
	// iat has whole seconds: a token of the same second as the reset is let through
	return ((issuedAtSeconds ?? 0) + 1) * 1000 > row.validFrom.getTime();
}

/**
 * End the session these claims belong to, on the server: its cookie, and any copy of it, is refused
 * from now on. A token from before sessions had ids ends every session of its user.
 */
export async function endSession(claims: SessionClaims, now = Date.now()) {
	if (typeof claims.sid === 'string') {
		const expiresAt = new Date(claims.exp ? claims.exp * 1000 : now + 31 * 24 * 3600 * 1000);
		await transaction(async (tx) => {
			await tx
				.insert(endedSessions)
				.values({ id: claims.sid as string, expiresAt })
				.onConflictDoNothing();
			// what would have expired anyway need not be remembered
			await tx.delete(endedSessions).where(lt(endedSessions.expiresAt, new Date(now)));
		});
	} else if (claims.sub) await endAllSessions(claims.sub, now);
}

/** End every session of a user (a password reset, "sign out everywhere"). */
export async function endAllSessions(userId: string, now = Date.now()) {
	await getDb()
		.update(users)
		.set({ sessionsValidFrom: new Date(now) })
		.where(eq(users.id, userId));
}
