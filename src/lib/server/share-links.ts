/**
 * Share links: a read-only view of one project's record (or one analysis's) for someone without an
 * account. The token is 32 random bytes, shown once in the link and stored only as its sha-256; a
 * revoked, expired or unknown token answers the same bare 404.
 */
import { error } from '@sveltejs/kit';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import { randomBytes } from 'node:crypto';
import type { Actor } from './access';
import { getDb, firstRow, oneRow } from './db';
import { analyses, shareLinks, users } from './db/tables';
import { sha256 } from './project-access';
import { analysisInProject } from './analyses';
import { getProject } from './projects';

const DAY_MS = 86_400_000;

/** Make a link (editor). Returns the token: it is in the link and nowhere else. */
export async function createShareLink(
	actor: Actor,
	projectId: string,
	opts: { days: number; analysisId?: string }
) {
	await getProject(actor, projectId, 'editor');
	if (opts.analysisId) await analysisOf(projectId, opts.analysisId);
	const token = randomBytes(32).toString('base64url');
	const link = await getDb()
		.insert(shareLinks)
		.values({
			projectId,
			analysisId: opts.analysisId ?? null,
			tokenHash: sha256(token),
			createdBy: actor.id,
			expiresAt: new Date(Date.now() + opts.days * DAY_MS)
		})
		.returning()
		.then(oneRow);
	return { link, token };
}

async function analysisOf(projectId: string, analysisId: string) {
	const row = await analysisInProject(projectId, analysisId);
	if (!row) error(404, 'Not found.');
	return row;
}

/** The project's links still open, newest first (editor); tokens are not kept, so not shown. */
export async function listShareLinks(actor: Actor, projectId: string) {
	await getProject(actor, projectId, 'editor');
	return await getDb()
		.select({
			id: shareLinks.id,
			analysisId: shareLinks.analysisId,
			analysisName: analyses.name,
			expiresAt: shareLinks.expiresAt,
			createdAt: shareLinks.createdAt,
			createdByName: users.name
		})
		.from(shareLinks)
		.leftJoin(analyses, eq(analyses.id, shareLinks.analysisId))
		.leftJoin(users, eq(users.id, shareLinks.createdBy))
		.where(
			and(
				eq(shareLinks.projectId, projectId),
				isNull(shareLinks.revokedAt),
				gt(shareLinks.expiresAt, new Date())
			)
		)
		.orderBy(desc(shareLinks.createdAt));
}

/** Close a link for good (editor). */
export async function revokeShareLink(actor: Actor, projectId: string, linkId: string) {
	await getProject(actor, projectId, 'editor');
	const row = await getDb()
		.update(shareLinks)
		.set({ revokedAt: new Date() })
		.where(and(eq(shareLinks.id, linkId), eq(shareLinks.projectId, projectId)))
		.returning()
		.then(firstRow);
	if (!row) error(404, 'Not found.');
}

/** What an open link shows: its project and, for a one-analysis link, the analysis. Else 404. */
export async function openShareLink(token: string) {
	// base64url of 32 bytes is 43 characters; anything else cannot be one of ours
	if (!/^[A-Za-z0-9_-]{43}$/.test(token)) error(404, 'Not found.');
	const row = await getDb()
		.select()
		.from(shareLinks)
		.where(eq(shareLinks.tokenHash, sha256(token)))
		.then(firstRow);
	if (!row || row.revokedAt || row.expiresAt.getTime() <= Date.now()) error(404, 'Not found.');
	return { projectId: row.projectId, analysisId: row.analysisId, createdBy: row.createdBy };
}
