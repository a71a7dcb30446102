import { and, asc, eq } from 'drizzle-orm';
import { requireRole, type Actor } from './access';
import { getDb } from './db';
import { memberships, users, workshops, type Role } from './db/schema';

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
		const ws = tx.insert(workshops).values({ name, personal, createdBy: ownerId }).returning().get();
		tx.insert(memberships).values({ userId: ownerId, workshopId: ws.id, role: 'owner' }).run();
		tx.update(users).set({ currentWorkshopId: ws.id }).where(eq(users.id, ownerId)).run();
		return ws;
	});
}

/** Every workshop the actor belongs to, with their role in it. */
export function listWorkshops(actor: Actor): WorkshopSummary[] {
	return getDb()
		.select({ id: workshops.id, name: workshops.name, personal: workshops.personal, role: memberships.role })
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
