import { error } from '@sveltejs/kit';
import { and, eq } from 'drizzle-orm';
import { getDb } from './db';
import { memberships, type Role } from './db/schema';
import type { LengthUnit } from '$lib/schemas/preferences';

/** Who is acting: the signed-in user, however they proved it (session cookie or API token). */
export interface Actor {
	id: string;
	email: string;
	name: string | null;
	via: 'session' | 'token';
	/**
	 * How the actor writes lengths, read with the actor once per request (so a list does not ask
	 * again for every row). Absent on actors made by hand (scripts, tests): then read when needed.
	 */
	lengthUnit?: LengthUnit;
}

const RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

export function roleAtLeast(role: Role, needed: Role) {
	return RANK[role] >= RANK[needed];
}

/** The actor's role in a workshop, or null when they are not a member. */
export function roleIn(actor: Actor, workshopId: string): Role | null {
	const row = getDb()
		.select({ role: memberships.role })
		.from(memberships)
		.where(and(eq(memberships.userId, actor.id), eq(memberships.workshopId, workshopId)))
		.get();
	return row?.role ?? null;
}

/**
 * The one role check used by every load, action and endpoint.
 * 401 without an actor; 404 when the actor is not a member (the workshop's existence is not
 * revealed); 403 when the actor's role is below what is needed.
 */
export function requireRole(
	actor: Actor | null,
	workshopId: string,
	needed: Role
): { actor: Actor; role: Role } {
	if (!actor) error(401, 'Sign in to continue.');
	const role = roleIn(actor, workshopId);
	if (!role) error(404, 'Not found.');
	if (!roleAtLeast(role, needed))
		error(403, `This needs the ${needed} role; you are a ${role} here.`);
	return { actor, role };
}

export function requireActor(actor: Actor | null): Actor {
	if (!actor) error(401, 'Sign in to continue.');
	return actor;
}
