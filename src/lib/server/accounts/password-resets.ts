import { and, eq, gt, isNull, or, sql } from 'drizzle-orm';
import { getDb, firstRow, transaction } from '../db';
import { apiTokens, passwordResets, signInFailures, users } from '../db/tables';
import { mailReady, sendLater, sendPasswordReset } from '../mail';
import { allowMailTo } from './mail-allowance';
import { hashPassword } from './passwords';
import { randomSecret, sha256 } from './secrets';
import { emailKey, pairKeyPrefix } from './throttle';
import { findUserByEmail } from './users';

export const PASSWORD_RESET_TTL_MS = 60 * 60 * 1000;

/**
 * Mail a one-time link for choosing a new password. Says nothing about whether the address has an
 * account: the caller shows the same answer either way, in the same time (the mail goes after).
 */
export async function requestPasswordReset(
	email: string,
	origin: string,
	now = Date.now()
): Promise<{ ok: true } | { ok: false; retryAfterMinutes: number }> {
	// counted for every address, known or not, so the answer gives nothing away
	const allowed = await allowMailTo(email, now);
	if (!allowed.ok) return allowed;
	// the same for every address: is mail working at all (MailUnavailable when not)
	await mailReady();
	const user = await findUserByEmail(email);
	if (!user?.email) return { ok: true };
	const token = randomSecret();
	await getDb()
		.insert(passwordResets)
		.values({
			tokenHash: sha256(token),
			userId: user.id,
			expiresAt: new Date(now + PASSWORD_RESET_TTL_MS)
		});
	// sent after answering, so a known address takes no longer than an unknown one
	const to = user.email;
	sendLater('password reset', () => sendPasswordReset(to, `${origin}/reset/${token}`));
	return { ok: true };
}

async function liveReset(token: string, now: number) {
	return await getDb()
		.select()
		.from(passwordResets)
		.where(
			and(
				eq(passwordResets.tokenHash, sha256(token)),
				isNull(passwordResets.usedAt),
				gt(passwordResets.expiresAt, new Date(now))
			)
		)
		.then(firstRow);
}

/** Whether a reset link can still be used (for showing the form or an "expired" note). */
export async function resetTokenIsLive(token: string, now = Date.now()) {
	return Boolean(await liveReset(token, now));
}

/**
 * Set a new password with a reset link. Consumes the link; false when it is unknown, used or expired.
 * Ends every session of the account and revokes its API tokens: a reset is what someone does when
 * they fear their password is known, and a token made by whoever knew it must stop working too.
 */
export async function resetPassword(token: string, newPassword: string, now = Date.now()) {
	if (!(await liveReset(token, now))) return false;
	const passwordHash = await hashPassword(newPassword);
	return transaction(async (tx) => {
		// claim the link atomically, so two tabs cannot both use it
		const claimed = await tx
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
			.then(firstRow);
		if (!claimed) return false;
		const user = await tx
			.update(users)
			.set({ passwordHash, sessionsValidFrom: new Date(now) })
			.where(eq(users.id, claimed.userId))
			.returning({ email: users.email, emailVerified: users.emailVerified })
			.then(firstRow);
		// the mail reached them, so the address is theirs
		if (user && !user.emailVerified)
			await tx
				.update(users)
				.set({ emailVerified: new Date(now) })
				.where(eq(users.id, claimed.userId));
		await tx
			.update(apiTokens)
			.set({ revokedAt: new Date(now) })
			.where(and(eq(apiTokens.userId, claimed.userId), isNull(apiTokens.revokedAt)));
		// other links sent earlier stop working too
		await tx
			.update(passwordResets)
			.set({ usedAt: new Date(now) })
			.where(and(eq(passwordResets.userId, claimed.userId), isNull(passwordResets.usedAt)));
		// the account's failed sign-ins, from every address, no longer count
		if (user?.email) {
			const pairs = pairKeyPrefix(user.email);
			await tx
				.delete(signInFailures)
				.where(
					or(
						eq(signInFailures.key, emailKey(user.email)),
						sql`substr(${signInFailures.key}, 1, ${pairs.length}) = ${pairs}`
					)
				);
		}
		return true;
	});
}
