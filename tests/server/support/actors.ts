import type { Actor } from '../../../src/lib/server/access';
import { getDb, oneRow } from '../../../src/lib/server/db';
import { memberships, projectAccess, users, workshops } from '../../../src/lib/server/db/tables';
import type { Role } from '../../../src/lib/server/db/tables';

let n = 0;

/** A user row without a password (server tests act for them directly). */
export async function makeUser(label: string): Promise<Actor> {
	n += 1;
	const email = `${label}-${n}@example.test`;
	const row = await getDb()
		.insert(users)
		.values({ name: `${label} ${n}`, email })
		.returning()
		.then(oneRow);
	return { id: row.id, email, name: row.name, via: 'session' };
}

/**
 * A workshop (a class) with one member in each role, a student among them, an outsider who
 * belongs to another workshop, and two clients who belong to no workshop of theirs yet (grant
 * them projects with grantProject).
 */
export async function makeWorkshopWithCast() {
	const db = getDb();
	const cast = {
		owner: await makeUser('owner'),
		editor: await makeUser('editor'),
		viewer: await makeUser('viewer'),
		student: await makeUser('student'),
		outsider: await makeUser('outsider'),
		client: await makeUser('client'),
		otherClient: await makeUser('other-client')
	};
	const ws = await db
		.insert(workshops)
		.values({ name: `Shop ${n}`, createdBy: cast.owner.id, isClass: true })
		.returning()
		.then(oneRow);
	const other = await db
		.insert(workshops)
		.values({ name: `Other ${n}` })
		.returning()
		.then(oneRow);
	for (const role of ['owner', 'editor', 'viewer', 'student'] as Role[])
		await db
			.insert(memberships)
			.values({ userId: cast[role as 'owner'].id, workshopId: ws.id, role });
	await db
		.insert(memberships)
		.values({ userId: cast.outsider.id, workshopId: other.id, role: 'owner' });
	return { workshopId: ws.id, ...cast };
}

/** Invite a person to one project as its client (what accepting a project invitation does). */
export async function grantProject(user: Actor, projectId: string) {
	await getDb().insert(projectAccess).values({ userId: user.id, projectId });
}

/** A RequestEvent-like object for calling a +server.ts handler directly. */
export function event(opts: {
	actor: Actor | null;
	url?: string;
	method?: string;
	body?: unknown;
	params?: Record<string, string>;
	/** the client's address (the documentation range of RFC 5737 unless given) */
	address?: string;
}) {
	const url = new URL(opts.url ?? '/', 'http://localhost');
	const init: RequestInit = { method: opts.method ?? 'GET' };
	if (opts.body !== undefined) {
		init.body = typeof opts.body === 'string' ? opts.body : JSON.stringify(opts.body);
		init.headers = { 'content-type': 'application/json' };
	}
	return {
		locals: { actor: opts.actor },
		url,
		params: opts.params ?? {},
		request: new Request(url, init),
		getClientAddress: () => opts.address ?? '192.0.2.10'
		// eslint-disable-next-line @typescript-eslint/no-explicit-any
	} as any;
}
