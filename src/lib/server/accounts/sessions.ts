import { randomUUID } from 'node:crypto';
import { eq, lt } from 'drizzle-orm';
import { getDb } from '../db';
import { endedSessions, users } from '../db/schema';

/** What the session token carries that matters here (Auth.js's JWT claims plus our `sid`). */
export interface SessionClaims {
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
export function sessionIsCurrent(
	userId: string,
	issuedAtSeconds: number | undefined,
	sessionId?: unknown
) {
	const db = getDb();
	if (typeof sessionId === 'string') {
		const ended = db
			.select({ id: endedSessions.id })
			.from(endedSessions)
			.where(eq(endedSessions.id, sessionId))
			.get();
		if (ended) return false;
	}
	const row = db
		.select({ validFrom: users.sessionsValidFrom })
		.from(users)
		.where(eq(users.id, userId))
		.get();
	if (!row) return false;
	if (!row.validFrom) return true;
	// iat has whole seconds: a token of the same second as the reset is let through
	return ((issuedAtSeconds ?? 0) + 1) * 1000 > row.validFrom.getTime();
}

/**
 * End the session these claims belong to, on the server: its cookie, and any copy of it, is refused
 * from now on. A token from before sessions had ids ends every session of its user.
 */
export function endSession(claims: SessionClaims, now = Date.now()) {
	const db = getDb();
	if (typeof claims.sid === 'string') {
		const expiresAt = new Date(claims.exp ? claims.exp * 1000 : now + 31 * 24 * 3600 * 1000);
		db.transaction((tx) => {
			tx.insert(endedSessions)
				.values({ id: claims.sid as string, expiresAt })
				.onConflictDoNothing()
				.run();
			// what would have expired anyway need not be remembered
			tx.delete(endedSessions)
				.where(lt(endedSessions.expiresAt, new Date(now)))
				.run();
		});
	} else if (claims.sub) endAllSessions(claims.sub, now);
}

/** End every session of a user (a password reset, "sign out everywhere"). */
export function endAllSessions(userId: string, now = Date.now()) {
	getDb()
		.update(users)
		.set({ sessionsValidFrom: new Date(now) })
		.where(eq(users.id, userId))
		.run();
}
