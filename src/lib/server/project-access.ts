/**
 * Clients and installers: people invited to single projects rather than to the workshop. They read
 * those projects and their records (access.ts ranks them below a viewer) and nothing else of the
 * workshop. Editors invite; owners revoke.
 */
import { error } from '@sveltejs/kit';
import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import type { Actor } from './access';
import { getDb, firstRow, oneRow, transaction } from './db';
import { projectAccess, projectInvitations, projects, users, workshops } from './db/tables';
import { getProject } from './projects';

const INVITATION_DAYS = 7;

export function sha256(text: string) {
	return createHash('sha256').update(text).digest('hex');
}

/** The projects the actor was invited to as a client, newest change first. */
export async function listSharedProjects(actor: Actor) {
	return await getDb()
		.select({
			id: projects.id,
			name: projects.name,
			client: projects.client,
			updatedAt: projects.updatedAt,
			workshopName: workshops.name
		})
		.from(projectAccess)
		.innerJoin(projects, eq(projects.id, projectAccess.projectId))
		.innerJoin(workshops, eq(workshops.id, projects.workshopId))
		.where(eq(projectAccess.userId, actor.id))
		.orderBy(desc(projects.updatedAt));
}

/** Invite someone to read one project (editor). Returns the one-time token, never stored. */
export async function inviteToProject(actor: Actor, projectId: string, email: string) {
	const { project } = await getProject(actor, projectId, 'editor');
	const token = randomBytes(32).toString('base64url');
	const invitation = await getDb()
		.insert(projectInvitations)
		.values({
			projectId,
			email: email.toLowerCase(),
			tokenHash: sha256(token),
			invitedBy: actor.id,
			expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000)
		})
		.returning()
		.then(oneRow);
	return { invitation, token, project };
}

/** Who may read the project as a client, and the invitations not yet accepted (editor). */
export async function listProjectAccess(actor: Actor, projectId: string) {
	await getProject(actor, projectId, 'editor');
	const db = getDb();
	const people = await db
		.select({
			userId: users.id,
			name: users.name,
			email: users.email,
			since: projectAccess.createdAt
		})
		.from(projectAccess)
		.innerJoin(users, eq(users.id, projectAccess.userId))
		.where(eq(projectAccess.projectId, projectId))
		.orderBy(asc(users.name));
	const pending = await db
		.select({
			id: projectInvitations.id,
			email: projectInvitations.email,
			expiresAt: projectInvitations.expiresAt
		})
		.from(projectInvitations)
		.where(and(eq(projectInvitations.projectId, projectId), isNull(projectInvitations.acceptedAt)))
		.orderBy(desc(projectInvitations.createdAt));
	return { people, pending };
}

/** Take a client's access to the project away (owner of the workshop). */
export async function revokeProjectAccess(actor: Actor, projectId: string, userId: string) {
	await getProject(actor, projectId, 'owner');
	const gone = await getDb()
		.delete(projectAccess)
		.where(and(eq(projectAccess.projectId, projectId), eq(projectAccess.userId, userId)))
		.returning()
		.then(firstRow);
	if (!gone) error(404, 'That person has no access to this project.');
}

/** Withdraw an invitation not yet accepted (owner). */
export async function revokeProjectInvitation(
	actor: Actor,
	projectId: string,
	invitationId: string
) {
	await getProject(actor, projectId, 'owner');
	await getDb()
		.delete(projectInvitations)
		.where(
			and(eq(projectInvitations.id, invitationId), eq(projectInvitations.projectId, projectId))
		);
}

/** Remove an invitation whose mail could not be sent (the caller just made it). */
export async function withdrawProjectInvitation(invitationId: string) {
	await getDb().delete(projectInvitations).where(eq(projectInvitations.id, invitationId));
}

/** What a project invitation link points at, for the page that offers to accept it. */
export async function findProjectInvitation(token: string) {
	const row = await getDb()
		.select({
			id: projectInvitations.id,
			email: projectInvitations.email,
			expiresAt: projectInvitations.expiresAt,
			acceptedAt: projectInvitations.acceptedAt,
			invitedBy: projectInvitations.invitedBy,
			projectId: projectInvitations.projectId,
			projectName: projects.name,
			workshopName: workshops.name
		})
		.from(projectInvitations)
		.innerJoin(projects, eq(projects.id, projectInvitations.projectId))
		.innerJoin(workshops, eq(workshops.id, projects.workshopId))
		.where(eq(projectInvitations.tokenHash, sha256(token)))
		.then(firstRow);
	if (!row) return { state: 'unknown' as const };
	if (row.acceptedAt) return { state: 'used' as const, invitation: row };
	if (row.expiresAt.getTime() < Date.now()) return { state: 'expired' as const, invitation: row };
	return { state: 'open' as const, invitation: row };
}

/** Accept a project invitation: the signed-in account must be the one it was sent to. */
export async function acceptProjectInvitation(actor: Actor, token: string) {
	const found = await findProjectInvitation(token);
	if (found.state === 'unknown') error(404, 'This invitation link is not known.');
	if (found.state !== 'open')
		error(410, `This invitation is ${found.state}. Ask the workshop for a new one.`);
	const inv = found.invitation;
	if (inv.email !== actor.email.toLowerCase())
		error(403, `This invitation was sent to ${inv.email}. Sign in with that address to accept it.`);
	await transaction(async (tx) => {
		await tx
			.insert(projectAccess)
			.values({ userId: actor.id, projectId: inv.projectId, grantedBy: inv.invitedBy })
			.onConflictDoNothing();
		await tx
			.update(projectInvitations)
			.set({ acceptedAt: new Date() })
			.where(eq(projectInvitations.id, inv.id));
	});
	return inv;
}
