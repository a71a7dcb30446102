import { error } from '@sveltejs/kit';
import { and, eq } from 'drizzle-orm';
import { getDb, firstRow } from './db';
import { memberships, projectAccess, type Role } from './db/tables';
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

const RANK: Record<Role, number> = { viewer: 1, student: 2, editor: 3, owner: 4 };

function roleAtLeast(role: Role, needed: Role) {
	return RANK[role] >= RANK[needed];
}

/** The actor's role in a workshop, or null when they are not a member. */
async function roleIn(actor: Actor, workshopId: string): Promise<Role | null> {
	const row = await getDb()
		.select({ role: memberships.role })
		.from(memberships)
		.where(and(eq(memberships.userId, actor.id), eq(memberships.workshopId, workshopId)))
		.then(firstRow);
	return row?.role ?? null;
}

/**
 * The one role check used by every load, action and endpoint.
 * 401 without an actor; 404 when the actor is not a member (the workshop's existence is not
 * revealed); 403 when the actor's role is below what is needed.
 */
export async function requireRole(
	actor: Actor | null,
	workshopId: string,
	needed: Role
): Promise<{ actor: Actor; role: Role }> {
	if (!actor) error(401, 'Sign in to continue.');
	const role = await roleIn(actor, workshopId);
	if (!role) error(404, 'Not found.');
	if (!roleAtLeast(role, needed))
		error(403, `This needs the ${needed} role; you are a ${role} here.`);
	return { actor, role };
}

export function requireActor(actor: Actor | null): Actor {
	if (!actor) error(401, 'Sign in to continue.');
	return actor;
}

/**
 * What someone may do in one project. Workshop members keep their workshop role; a client (or an
 * installer) invited to this project alone reads it and nothing else of the workshop.
 */
export type ProjectRole = Role | 'client';

const PROJECT_RANK: Record<ProjectRole, number> = {
	client: 0,
	viewer: 1,
	student: 2,
	editor: 3,
	owner: 4
};

/** True for the roles that change a project and all its analyses (editor, owner). */
export function canEdit(role: ProjectRole) {
	return PROJECT_RANK[role] >= PROJECT_RANK.editor;
}

/**
 * Whether someone with this role may change (rename, recompute, move, delete) one analysis:
 * editors and owners any, a student only one they created.
 */
export function canChangeAnalysis(
	role: ProjectRole,
	actorId: string,
	analysis: { createdBy: string | null }
) {
	return canEdit(role) || (role === 'student' && analysis.createdBy === actorId);
}

/** The actor's role in a project: their workshop role, else 'client' when invited to it, else null. */
async function projectRoleIn(
	actor: Actor,
	project: { id: string; workshopId: string }
): Promise<ProjectRole | null> {
	const role = await roleIn(actor, project.workshopId);
	if (role) return role;
	const invited = await getDb()
		.select({ userId: projectAccess.userId })
		.from(projectAccess)
		.where(and(eq(projectAccess.userId, actor.id), eq(projectAccess.projectId, project.id)))
		.then(firstRow);
	return invited ? 'client' : null;
}

/**
 * requireRole for one project: 401 without an actor, 404 when the actor may not see the project
 * (neither a member of its workshop nor invited to it), 403 when their role is too low.
 */
export async function requireProjectRole(
	actor: Actor | null,
	project: { id: string; workshopId: string },
	needed: ProjectRole
): Promise<{ actor: Actor; role: ProjectRole }> {
	if (!actor) error(401, 'Sign in to continue.');
	const role = await projectRoleIn(actor, project);
	if (!role) error(404, 'Not found.');
	if (PROJECT_RANK[role] < PROJECT_RANK[needed])
		error(403, `This needs the ${needed} role; you are a ${role} here.`);
	return { actor, role };
}
