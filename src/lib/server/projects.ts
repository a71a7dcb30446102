import { and, asc, count, desc, eq, type SQL } from 'drizzle-orm';
import { requireProjectRole, requireRole, type Actor, type ProjectRole } from './access';
import { getDb, firstRow, oneRow } from './db';
import { containsText } from './db/contains';
import { documents, projects, users } from './db/tables';
import { getStore } from './storage';
import type { ProjectInput, ProjectListQuery } from '$lib/schemas/project';
import { error } from '@sveltejs/kit';

export type Project = typeof projects.$inferSelect;

const sortColumn = {
	updated: projects.updatedAt,
	name: projects.name,
	client: projects.client,
	created: projects.createdAt
} as const;

/** A page of the workshop's projects, searched by name, client and site notes. */
export async function listProjects(actor: Actor, query: ProjectListQuery) {
	await requireRole(actor, query.workshop, 'viewer');
	const db = getDb();
	const where: SQL[] = [eq(projects.workshopId, query.workshop)];
	if (query.q)
		where.push(containsText([projects.name, projects.client, projects.siteNotes], query.q));
	const filter = and(...where);
	const order = query.dir === 'asc' ? asc(sortColumn[query.sort]) : desc(sortColumn[query.sort]);
	const items = await db
		.select({
			id: projects.id,
			workshopId: projects.workshopId,
			name: projects.name,
			client: projects.client,
			siteNotes: projects.siteNotes,
			createdAt: projects.createdAt,
			updatedAt: projects.updatedAt,
			createdByName: users.name
		})
		.from(projects)
		.leftJoin(users, eq(users.id, projects.createdBy))
		.where(filter)
		.orderBy(order, asc(projects.id))
		.limit(query.perPage)
		.offset((query.page - 1) * query.perPage);
	const total =
		(await db.select({ n: count() }).from(projects).where(filter).then(firstRow))?.n ?? 0;
	return { items, total, page: query.page, perPage: query.perPage };
}

/**
 * One project, if the actor is a member of its workshop or was invited to it (a client); 404
 * otherwise. `needed` raises the bar (403 below it).
 */
export async function getProject(actor: Actor, projectId: string, needed: ProjectRole = 'client') {
	const row = await getDb()
		.select()
		.from(projects)
		.where(eq(projects.id, projectId))
		.then(firstRow);
	if (!row) error(404, 'Not found.');
	const { role } = await requireProjectRole(actor, row, needed);
	return { project: row, role };
}

export async function createProject(actor: Actor, workshopId: string, input: ProjectInput) {
	await requireRole(actor, workshopId, 'editor');
	return await getDb()
		.insert(projects)
		.values({ ...input, workshopId, createdBy: actor.id })
		.returning()
		.then(oneRow);
}

export async function updateProject(actor: Actor, projectId: string, patch: Partial<ProjectInput>) {
	await getProject(actor, projectId, 'editor');
	return await getDb()
		.update(projects)
		.set({ ...patch, updatedAt: new Date() })
		.where(eq(projects.id, projectId))
		.returning()
		.then(firstRow);
}

/** Delete a project (editors) with its analyses and documents, then its stored files. */
export async function deleteProject(actor: Actor, projectId: string) {
	const { project } = await getProject(actor, projectId, 'editor');
	const db = getDb();
	const rows = await db
		.select({ fileKey: documents.fileKey, thumbKey: documents.thumbKey })
		.from(documents)
		.where(eq(documents.projectId, projectId));
	const files = rows.flatMap((d) => [d.fileKey, d.thumbKey ?? []].flat());
	// the rows go first: a crash before the files are removed leaves orphans for the start-up sweep
	await db.delete(projects).where(eq(projects.id, projectId));
	const store = getStore();
	await Promise.all(files.map((key) => store.delete(key)));
	return project;
}
