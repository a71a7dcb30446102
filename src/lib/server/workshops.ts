import { error } from '@sveltejs/kit';
import { and, asc, count, desc, eq, isNull } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import { requireRole, type Actor } from './access';
import { getDb } from './db';
import { invitations, memberships, users, workshops, type Role } from './db/schema';

export interface WorkshopSummary {
	id: string;
	name: string;
	personal: boolean;
	role: Role;
}

/** Create a workshop with `ownerId` as its owner. Used at sign-up (personal) and by the UI. */
export function createWorkshopFor(ownerId: string, name: string, personal = false) {
	const db = getDb();
	return db.transaction((tx) => {
		const ws = tx
			.insert(workshops)
			.values({ name, personal, createdBy: ownerId })
			.returning()
			.get();
		tx.insert(memberships).values({ userId: ownerId, workshopId: ws.id, role: 'owner' }).run();
		tx.update(users).set({ currentWorkshopId: ws.id }).where(eq(users.id, ownerId)).run();
		return ws;
	});
}

/** Every workshop the actor belongs to, with their role in it. */
export function listWorkshops(actor: Actor): WorkshopSummary[] {
	return getDb()
		.select({
			id: workshops.id,
			name: workshops.name,
			personal: workshops.personal,
			role: memberships.role
		})
		.from(memberships)
		.innerJoin(workshops, eq(workshops.id, memberships.workshopId))
		.where(eq(memberships.userId, actor.id))
		.orderBy(asc(workshops.personal), asc(workshops.name))
		.all();
}

export function getWorkshop(actor: Actor, workshopId: string) {
	const { role } = requireRole(actor, workshopId, 'viewer');
	const ws = getDb().select().from(workshops).where(eq(workshops.id, workshopId)).get();
	if (!ws) throw new Error('membership without workshop');
	return { ...ws, role };
}

export function membershipOf(userId: string, workshopId: string) {
	return getDb()
		.select()
		.from(memberships)
		.where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)))
		.get();
}

// ---- Owners' business: rename, delete, members, invitations ----

export function renameWorkshop(actor: Actor, workshopId: string, name: string) {
	requireRole(actor, workshopId, 'owner');
	return getDb()
		.update(workshops)
		.set({ name })
		.where(eq(workshops.id, workshopId))
		.returning()
		.get();
}

export function deleteWorkshop(actor: Actor, workshopId: string) {
	requireRole(actor, workshopId, 'owner');
	const db = getDb();
	const ws = db.select().from(workshops).where(eq(workshops.id, workshopId)).get();
	if (ws?.personal) error(409, 'A personal workshop cannot be deleted.');
	db.delete(workshops).where(eq(workshops.id, workshopId)).run();
	db.update(users)
		.set({ currentWorkshopId: null })
		.where(eq(users.currentWorkshopId, workshopId))
		.run();
}

/** Make a workshop the actor's current one (they must belong to it). */
export function switchWorkshop(actor: Actor, workshopId: string) {
	requireRole(actor, workshopId, 'viewer');
	getDb().update(users).set({ currentWorkshopId: workshopId }).where(eq(users.id, actor.id)).run();
}

/** The actor's current workshop: the one they chose last, else their first. */
export function currentWorkshop(actor: Actor): WorkshopSummary | null {
	const all = listWorkshops(actor);
	const chosen = getDb()
		.select({ id: users.currentWorkshopId })
		.from(users)
		.where(eq(users.id, actor.id))
		.get()?.id;
	return all.find((w) => w.id === chosen) ?? all[0] ?? null;
}

export function listMembers(actor: Actor, workshopId: string) {
	requireRole(actor, workshopId, 'viewer');
	return getDb()
		.select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
		.from(memberships)
		.innerJoin(users, eq(users.id, memberships.userId))
		.where(eq(memberships.workshopId, workshopId))
		.orderBy(asc(users.name))
		.all();
}

function ownerCount(workshopId: string) {
	return getDb()
		.select({ n: count() })
		.from(memberships)
		.where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, 'owner')))
		.get()!.n;
}

export function changeMemberRole(actor: Actor, workshopId: string, userId: string, role: Role) {
	requireRole(actor, workshopId, 'owner');
	const member = membershipOf(userId, workshopId);
	if (!member) error(404, 'That person is not a member here.');
	if (member.role === 'owner' && role !== 'owner' && ownerCount(workshopId) <= 1)
		error(409, 'A workshop needs at least one owner. Make someone else an owner first.');
	getDb()
		.update(memberships)
		.set({ role })
		.where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)))
		.run();
}

export function removeMember(actor: Actor, workshopId: string, userId: string) {
	requireRole(actor, workshopId, 'owner');
	const member = membershipOf(userId, workshopId);
	if (!member) error(404, 'That person is not a member here.');
	if (member.role === 'owner' && ownerCount(workshopId) <= 1)
		error(409, 'A workshop needs at least one owner.');
	getDb()
		.delete(memberships)
		.where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)))
		.run();
}

const INVITATION_DAYS = 7;

function sha256(text: string) {
	return createHash('sha256').update(text).digest('hex');
}

/** Invite someone by e-mail with a role. Returns the one-time token (sent by mail, never stored). */
export function createInvitation(actor: Actor, workshopId: string, email: string, role: Role) {
	requireRole(actor, workshopId, 'owner');
	const token = randomBytes(24).toString('base64url');
	const invitation = getDb()
		.insert(invitations)
		.values({
			workshopId,
			email: email.toLowerCase(),
			role,
			tokenHash: sha256(token),
			invitedBy: actor.id,
			expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000)
		})
		.returning()
		.get();
	return { invitation, token };
}

export function listInvitations(actor: Actor, workshopId: string) {
	requireRole(actor, workshopId, 'owner');
	return getDb()
		.select()
		.from(invitations)
		.where(and(eq(invitations.workshopId, workshopId), isNull(invitations.acceptedAt)))
		.orderBy(desc(invitations.createdAt))
		.all();
}

export function revokeInvitation(actor: Actor, workshopId: string, invitationId: string) {
	requireRole(actor, workshopId, 'owner');
	getDb()
		.delete(invitations)
		.where(and(eq(invitations.id, invitationId), eq(invitations.workshopId, workshopId)))
		.run();
}

/** What an invitation link points at, for the page that offers to accept it. */
export function findInvitation(token: string) {
	const row = getDb()
		.select({
			id: invitations.id,
			email: invitations.email,
			role: invitations.role,
			expiresAt: invitations.expiresAt,
			acceptedAt: invitations.acceptedAt,
			workshopId: invitations.workshopId,
			workshopName: workshops.name
		})
		.from(invitations)
		.innerJoin(workshops, eq(workshops.id, invitations.workshopId))
		.where(eq(invitations.tokenHash, sha256(token)))
		.get();
	if (!row) return { state: 'unknown' as const };
	if (row.acceptedAt) return { state: 'used' as const, invitation: row };
	if (row.expiresAt.getTime() < Date.now()) return { state: 'expired' as const, invitation: row };
	return { state: 'open' as const, invitation: row };
}

/** Accept an invitation: the signed-in account must be the one it was sent to. */
/** What accepting did: joined with the invited role, changed an existing role, or kept it. */
export type InvitationOutcome =
	| { kind: 'joined'; role: Role }
	| { kind: 'role-changed'; from: Role; role: Role }
	| { kind: 'unchanged'; role: Role }
	| { kind: 'kept-last-owner'; role: 'owner'; invited: Role };

/**
 * Accept an invitation as the person it was sent to. A member already in the workshop gets the
 * role the owner chose in the invitation, except that the last owner stays owner (a workshop keeps
 * at least one); the answer says which of these happened.
 */
export function acceptInvitation(actor: Actor, token: string) {
	const found = findInvitation(token);
	if (found.state === 'unknown') error(404, 'This invitation link is not known.');
	if (found.state !== 'open')
		error(410, `This invitation is ${found.state}. Ask the owner for a new one.`);
	const inv = found.invitation;
	if (inv.email !== actor.email.toLowerCase())
		error(403, `This invitation was sent to ${inv.email}. Sign in with that address to accept it.`);
	const db = getDb();
	const outcome = db.transaction((tx): InvitationOutcome => {
		const existing = tx
			.select()
			.from(memberships)
			.where(and(eq(memberships.userId, actor.id), eq(memberships.workshopId, inv.workshopId)))
			.get();
		let result: InvitationOutcome;
		if (!existing) {
			tx.insert(memberships)
				.values({ userId: actor.id, workshopId: inv.workshopId, role: inv.role })
				.run();
			result = { kind: 'joined', role: inv.role };
		} else if (existing.role === inv.role) result = { kind: 'unchanged', role: inv.role };
		else {
			const owners = tx
				.select({ userId: memberships.userId })
				.from(memberships)
				.where(and(eq(memberships.workshopId, inv.workshopId), eq(memberships.role, 'owner')))
				.all();
			if (existing.role === 'owner' && owners.length === 1)
				result = { kind: 'kept-last-owner', role: 'owner', invited: inv.role };
			else {
				tx.update(memberships)
					.set({ role: inv.role })
					.where(and(eq(memberships.userId, actor.id), eq(memberships.workshopId, inv.workshopId)))
					.run();
				result = { kind: 'role-changed', from: existing.role, role: inv.role };
			}
		}
		tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, inv.id)).run();
		tx.update(users).set({ currentWorkshopId: inv.workshopId }).where(eq(users.id, actor.id)).run();
		return result;
	});
	return { ...inv, outcome };
}
