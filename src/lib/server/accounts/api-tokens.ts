import { error } from '@sveltejs/kit';
import { and, desc, eq, isNull } from 'drizzle-orm';
import type { Actor } from '../access';
import { getDb, firstRow, oneRow } from '../db';
import { apiTokens, users } from '../db/tables';
import { readLengthUnit } from '../preferences';
import { randomSecret, sha256 } from './secrets';

interface ApiTokenSummary {
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
export async function createApiToken(actor: Actor, input: { name: string }) {
	// A token cannot mint further tokens: a leaked one must not be able to outlive its revocation.
	if (actor.via !== 'session')
		error(403, 'API tokens can only be created while signed in in a browser.');
	const secret = TOKEN_PREFIX + randomSecret(24);
	const row = await getDb()
		.insert(apiTokens)
		.values({
			userId: actor.id,
			name: input.name.trim(),
			tokenHash: sha256(secret),
			prefix: secret.slice(0, 12)
		})
		.returning()
		.then(oneRow);
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
export async function listApiTokens(actor: Actor): Promise<ApiTokenSummary[]> {
	const rows = await getDb()
		.select()
		.from(apiTokens)
		.where(and(eq(apiTokens.userId, actor.id), isNull(apiTokens.revokedAt)))
		.orderBy(desc(apiTokens.createdAt));
	return rows.map(summary);
}

/** Revoke one of the actor's own tokens. False when there is no such live token of theirs. */
export async function revokeApiToken(actor: Actor, id: string, now = Date.now()) {
	const row = await getDb()
		.update(apiTokens)
		.set({ revokedAt: new Date(now) })
		.where(and(eq(apiTokens.id, id), eq(apiTokens.userId, actor.id), isNull(apiTokens.revokedAt)))
		.returning({ id: apiTokens.id })
		.then(firstRow);
	return Boolean(row);
}

/** The actor for an `Authorization: Bearer <token>` header, or null for anything else. */
export async function actorFromBearer(
	header: string | null | undefined,
	now = Date.now()
): Promise<Actor | null> {
	const match = /^Bearer\s+(\S+)\s*$/i.exec(header ?? '');
	if (!match || !match[1].startsWith(TOKEN_PREFIX) || match[1].length > 200) return null;
	const db = getDb();
	const row = await db
		.select({
			id: apiTokens.id,
			lastUsedAt: apiTokens.lastUsedAt,
			userId: users.id,
			email: users.email,
			name: users.name,
			lengthUnit: users.lengthUnit
		})
		.from(apiTokens)
		.innerJoin(users, eq(users.id, apiTokens.userId))
		.where(and(eq(apiTokens.tokenHash, sha256(match[1])), isNull(apiTokens.revokedAt)))
		.then(firstRow);
	if (!row?.email) return null;
	if (!row.lastUsedAt || now - row.lastUsedAt.getTime() >= LAST_USED_RESOLUTION_MS)
		await db
			.update(apiTokens)
			.set({ lastUsedAt: new Date(now) })
			.where(eq(apiTokens.id, row.id));
	return {
		id: row.userId,
		email: row.email,
		name: row.name,
		via: 'token',
		lengthUnit: readLengthUnit(row.lengthUnit)
	};
}

/** Revoke every live token of a user (a password reset; "sign out everywhere" when asked). */
export async function revokeAllApiTokens(userId: string, now = Date.now()) {
	const revoked = await getDb()
		.update(apiTokens)
		.set({ revokedAt: new Date(now) })
		.where(and(eq(apiTokens.userId, userId), isNull(apiTokens.revokedAt)))
		.returning({ id: apiTokens.id });
	return revoked.length;
}
