import { error } from '@sveltejs/kit';
import { and, asc, count, desc, eq, isNull } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import { requireRole, type Actor } from './access';
import { getDb, firstRow, oneRow, transaction } from './db';
import { invitations, memberships, users, workshops, type Role } from './db/tables';

export interface WorkshopSummary {
	id: string;
	name: string;
	personal: boolean;
	isClass: boolean;
	role: Role;
}

/** Create a workshop with `ownerId` as its owner. Used at sign-up (personal) and by the UI. */
export async function createWorkshopFor(ownerId: string, name: string, personal = false) {
	return transaction(async (tx) => {
		const ws = await tx
			.insert(workshops)
			.values({ name, personal, createdBy: ownerId })
			.returning()
			.then(oneRow);
		await tx.insert(memberships).values({ userId: ownerId, workshopId: ws.id, role: 'owner' });
		await tx.update(users).set({ currentWorkshopId: ws.id }).where(eq(users.id, ownerId));
		return ws;
	});
}

/** Every workshop the actor belongs to, with their role in it. */
export async function listWorkshops(actor: Actor): Promise<WorkshopSummary[]> {
	return await getDb()
		.select({
			id: workshops.id,
			name: workshops.name,
			personal: workshops.personal,
			isClass: workshops.isClass,
			role: memberships.role
		})
		.from(memberships)
		.innerJoin(workshops, eq(workshops.id, memberships.workshopId))
		.where(eq(memberships.userId, actor.id))
		.orderBy(asc(workshops.personal), asc(workshops.name));
}

export async function getWorkshop(actor: Actor, workshopId: string) {
	const { role } = await requireRole(actor, workshopId, 'viewer');
	const ws = await getDb()
		.select()
		.from(workshops)
		.where(eq(workshops.id, workshopId))
		.then(firstRow);
	if (!ws) throw new Error('membership without workshop');
	return { ...ws, role };
}

export async function membershipOf(userId: string, workshopId: string) {
	return await getDb()
		.select()
		.from(memberships)
		.where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)))
		.then(firstRow);
}

// ---- Owners' business: rename, delete, members, invitations ----

export async function renameWorkshop(actor: Actor, workshopId: string, name: string) {
	await requireRole(actor, workshopId, 'owner');
	return await getDb()
		.update(workshops)
		.set({ name })
		.where(eq(workshops.id, workshopId))
		.returning()
		.then(firstRow);
}

/** The student role exists only in a class: refused (422) elsewhere. */
async function requireClassFor(workshopId: string, role: Role) {
	if (role !== 'student') return;
	const ws = await getDb()
		.select()
		.from(workshops)
		.where(eq(workshops.id, workshopId))
		.then(firstRow);
	if (!ws?.isClass)
		error(422, 'Only a class has students: make this workshop a class first (its owner can).');
}

/**
 * Make a workshop a class (its owner may then give members the student role) or a shop again;
 * the latter is refused (409) while anyone is a student in it or invited as one.
 */
export async function setClassMode(actor: Actor, workshopId: string, isClass: boolean) {
	await requireRole(actor, workshopId, 'owner');
	const db = getDb();
	const ws = await db.select().from(workshops).where(eq(workshops.id, workshopId)).then(firstRow);
	if (ws?.personal && isClass)
		error(409, 'A personal workshop cannot be a class. Create a workshop for the class.');
	if (!isClass) {
		const students = await db
			.select({ n: count() })
			.from(memberships)
			.where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, 'student')))
			.then(oneRow);
		const invited = await db
			.select({ n: count() })
			.from(invitations)
			.where(
				and(
					eq(invitations.workshopId, workshopId),
					eq(invitations.role, 'student'),
					isNull(invitations.acceptedAt)
				)
			)
			.then(oneRow);
		if (students.n + invited.n > 0)
			error(
				409,
				'This class still has students (or invitations as one). Give them another role first.'
			);
	}
	return db
		.update(workshops)
		.set({ isClass })
		.where(eq(workshops.id, workshopId))
		.returning()
		.then(oneRow);
}

export async function deleteWorkshop(actor: Actor, workshopId: string) {
	await requireRole(actor, workshopId, 'owner');
	const db = getDb();
	const ws = await db.select().from(workshops).where(eq(workshops.id, workshopId)).then(firstRow);
	if (ws?.personal) error(409, 'A personal workshop cannot be deleted.');
	await db.delete(workshops).where(eq(workshops.id, workshopId));
	await db
		.update(users)
		.set({ currentWorkshopId: null })
		.where(eq(users.currentWorkshopId, workshopId));
}

/** Make a workshop the actor's current one (they must belong to it). */
export async function switchWorkshop(actor: Actor, workshopId: string) {
	await requireRole(actor, workshopId, 'viewer');
	await getDb().update(users).set({ currentWorkshopId: workshopId }).where(eq(users.id, actor.id));
}

/** The actor's current workshop: the one they chose last, else their first. */
export async function currentWorkshop(actor: Actor): Promise<WorkshopSummary | null> {
	const all = await listWorkshops(actor);
	const chosen = (
		await getDb()
			.select({ id: users.currentWorkshopId })
			.from(users)
			.where(eq(users.id, actor.id))
			.then(firstRow)
	)?.id;
	return all.find((w) => w.id === chosen) ?? all[0] ?? null;
}

export async function listMembers(actor: Actor, workshopId: string) {
	await requireRole(actor, workshopId, 'viewer');
	return await getDb()
		.select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
		.from(memberships)
		.innerJoin(users, eq(users.id, memberships.userId))
		.where(eq(memberships.workshopId, workshopId))
		.orderBy(asc(users.name));
}

async function ownerCount(workshopId: string) {
	const row = await getDb()
		.select({ n: count() })
		.from(memberships)
		.where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, 'owner')))
		.then(oneRow);
	return row.n;
}

export async function changeMemberRole(
	actor: Actor,
	workshopId: string,
	userId: string,
	role: Role
) {
	await requireRole(actor, workshopId, 'owner');
	const member = await membershipOf(userId, workshopId);
	if (!member) error(404, 'That person is not a member here.');
	await requireClassFor(workshopId, role);
	if (member.role === 'owner' && role !== 'owner' && (await ownerCount(workshopId)) <= 1)
		error(409, 'A workshop needs at least one owner. Make someone else an owner first.');
	await getDb()
		.update(memberships)
		.set({ role })
		.where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)));
}

export async function removeMember(actor: Actor, workshopId: string, userId: string) {
	await requireRole(actor, workshopId, 'owner');
	const member = await membershipOf(userId, workshopId);
	if (!member) error(404, 'That person is not a member here.');
	if (member.role === 'owner' && (await ownerCount(workshopId)) <= 1)
		error(409, 'A workshop needs at least one owner.');
	await getDb()
		.delete(memberships)
		.where(and(eq(memberships.userId, userId), eq(memberships.workshopId, workshopId)));
}

const INVITATION_DAYS = 7;

function sha256(text: string) {
	return createHash('sha256').update(text).digest('hex');
}

/** Invite someone by e-mail with a role. Returns the one-time token (sent by mail, never stored). */
export async function createInvitation(
	actor: Actor,
	workshopId: string,
	email: string,
	role: Role
) {
	await requireRole(actor, workshopId, 'owner');
	await requireClassFor(workshopId, role);
	const token = randomBytes(24).toString('base64url');
	const invitation = await getDb()
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
		.then(oneRow);
	return { invitation, token };
}

export async function listInvitations(actor: Actor, workshopId: string) {
	await requireRole(actor, workshopId, 'owner');
	return await getDb()
		.select()
		.from(invitations)
		.where(and(eq(invitations.workshopId, workshopId), isNull(invitations.acceptedAt)))
		.orderBy(desc(invitations.createdAt));
}

export async function revokeInvitation(actor: Actor, workshopId: string, invitationId: string) {
	await requireRole(actor, workshopId, 'owner');
	await getDb()
		.delete(invitations)
		.where(and(eq(invitations.id, invitationId), eq(invitations.workshopId, workshopId)));
}

/** What an invitation link points at, for the page that offers to accept it. */
export async function findInvitation(token: string) {
	const row = await getDb()
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
		.then(firstRow);
	if (!row) return { state: 'unknown' as const };
	if (row.acceptedAt) return { state: 'used' as const, invitation: row };
	if (row.expiresAt.getTime() < Date.now()) return { state: 'expired' as const, invitation: row };
	return { state: 'open' as const, invitation: row };
}

/** Accept an invitation: the signed-in account must be the one it was sent to. */
/** What accepting did: joined with the invited role, changed an existing role, or kept it. */
type InvitationOutcome =
	| { kind: 'joined'; role: Role }
	| { kind: 'role-changed'; from: Role; role: Role }
	| { kind: 'unchanged'; role: Role }
	| { kind: 'kept-last-owner'; role: 'owner'; invited: Role };

/**
 * Accept an invitation as the person it was sent to. A member already in the workshop gets the
 * role the owner chose in the invitation, except that the last owner stays owner (a workshop keeps
 * at least one); the answer says which of these happened.
 */
export async function acceptInvitation(actor: Actor, token: string) {
	const found = await findInvitation(token);
	if (found.state === 'unknown') error(404, 'This invitation link is not known.');
	if (found.state !== 'open')
		error(410, `This invitation is ${found.state}. Ask the owner for a new one.`);
	const inv = found.invitation;
	if (inv.email !== actor.email.toLowerCase())
		error(403, `This invitation was sent to ${inv.email}. Sign in with that address to accept it.`);
	const outcome = await transaction(async (tx): Promise<InvitationOutcome> => {
		const existing = await tx
			.select()
			.from(memberships)
			.where(and(eq(memberships.userId, actor.id), eq(memberships.workshopId, inv.workshopId)))
			.then(firstRow);
		let result: InvitationOutcome;
		if (!existing) {
			await tx
				.insert(memberships)
				.values({ userId: actor.id, workshopId: inv.workshopId, role: inv.role });
			result = { kind: 'joined', role: inv.role };
		} else if (existing.role === inv.role) result = { kind: 'unchanged', role: inv.role };
		else {
			const owners = await tx
				.select({ userId: memberships.userId })
				.from(memberships)
				.where(and(eq(memberships.workshopId, inv.workshopId), eq(memberships.role, 'owner')));
			if (existing.role === 'owner' && owners.length === 1)
				result = { kind: 'kept-last-owner', role: 'owner', invited: inv.role };
			else {
				await tx
					.update(memberships)
					.set({ role: inv.role })
					.where(and(eq(memberships.userId, actor.id), eq(memberships.workshopId, inv.workshopId)));
				result = { kind: 'role-changed', from: existing.role, role: inv.role };
			}
		}
		await tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, inv.id));
		await tx.update(users).set({ currentWorkshopId: inv.workshopId }).where(eq(users.id, actor.id));
		return result;
	});
	return { ...inv, outcome };
}
