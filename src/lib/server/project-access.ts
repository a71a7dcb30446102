/**
 * Clients and installers: people invited to single projects rather than to the workshop. They read
 * those projects and their records (access.ts ranks them below a viewer) and nothing else of the
 * workshop. Editors invite; owners revoke.
 */
import { error } from '@sveltejs/kit';
import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import type { Actor } from './access';
import { getDb } from './db';
import { projectAccess, projectInvitations, projects, users, workshops } from './db/schema';
import { getProject } from './projects';

const INVITATION_DAYS = 7;

export function sha256(text: string) {
	return createHash('sha256').update(text).digest('hex');
}

/** The projects the actor was invited to as a client, newest change first. */
export function listSharedProjects(actor: Actor) {
	return getDb()
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
		.orderBy(desc(projects.updatedAt))
		.all();
}

/** Invite someone to read one project (editor). Returns the one-time token, never stored. */
export function inviteToProject(actor: Actor, projectId: string, email: string) {
	const { project } = getProject(actor, projectId, 'editor');
	const token = randomBytes(32).toString('base64url');
	const invitation = getDb()
		.insert(projectInvitations)
		.values({
			projectId,
			email: email.toLowerCase(),
			tokenHash: sha256(token),
			invitedBy: actor.id,
			expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000)
		})
		.returning()
		.get();
	return { invitation, token, project };
}

/** Who may read the project as a client, and the invitations not yet accepted (editor). */
export function listProjectAccess(actor: Actor, projectId: string) {
	getProject(actor, projectId, 'editor');
	const db = getDb();
	const people = db
		.select({
			userId: users.id,
			name: users.name,
			email: users.email,
			since: projectAccess.createdAt
		})
		.from(projectAccess)
		.innerJoin(users, eq(users.id, projectAccess.userId))
		.where(eq(projectAccess.projectId, projectId))
		.orderBy(asc(users.name))
		.all();
	const pending = db
		.select({
			id: projectInvitations.id,
			email: projectInvitations.email,
			expiresAt: projectInvitations.expiresAt
		})
		.from(projectInvitations)
		.where(and(eq(projectInvitations.projectId, projectId), isNull(projectInvitations.acceptedAt)))
		.orderBy(desc(projectInvitations.createdAt))
		.all();
	return { people, pending };
}

/** Take a client's access to the project away (owner of the workshop). */
export function revokeProjectAccess(actor: Actor, projectId: string, userId: string) {
	getProject(actor, projectId, 'owner');
	const gone = getDb()
		.delete(projectAccess)
		.where(and(eq(projectAccess.projectId, projectId), eq(projectAccess.userId, userId)))
		.returning()
		.get();
	if (!gone) error(404, 'That person has no access to this project.');
}

/** Withdraw an invitation not yet accepted (owner). */
export function revokeProjectInvitation(actor: Actor, projectId: string, invitationId: string) {
	getProject(actor, projectId, 'owner');
	getDb()
		.delete(projectInvitations)
		.where(
			and(eq(projectInvitations.id, invitationId), eq(projectInvitations.projectId, projectId))
		)
		.run();
}

/** Remove an invitation whose mail could not be sent (the caller just made it). */
export function withdrawProjectInvitation(invitationId: string) {
	getDb().delete(projectInvitations).where(eq(projectInvitations.id, invitationId)).run();
}

/** What a project invitation link points at, for the page that offers to accept it. */
export function findProjectInvitation(token: string) {
	const row = getDb()
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
		.get();
	if (!row) return { state: 'unknown' as const };
	if (row.acceptedAt) return { state: 'used' as const, invitation: row };
	if (row.expiresAt.getTime() < Date.now()) return { state: 'expired' as const, invitation: row };
	return { state: 'open' as const, invitation: row };
}

/** Accept a project invitation: the signed-in account must be the one it was sent to. */
export function acceptProjectInvitation(actor: Actor, token: string) {
	const found = findProjectInvitation(token);
	if (found.state === 'unknown') error(404, 'This invitation link is not known.');
	if (found.state !== 'open')
		error(410, `This invitation is ${found.state}. Ask the workshop for a new one.`);
	const inv = found.invitation;
	if (inv.email !== actor.email.toLowerCase())
		error(403, `This invitation was sent to ${inv.email}. Sign in with that address to accept it.`);
	getDb().transaction((tx) => {
		tx.insert(projectAccess)
			.values({ userId: actor.id, projectId: inv.projectId, grantedBy: inv.invitedBy })
			.onConflictDoNothing()
			.run();
		tx.update(projectInvitations)
			.set({ acceptedAt: new Date() })
			.where(eq(projectInvitations.id, inv.id))
			.run();
	});
	return inv;
}
