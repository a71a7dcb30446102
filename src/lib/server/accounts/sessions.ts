import { eq } from 'drizzle-orm';
import { getDb } from '../db';
import { users } from '../db/schema';

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
