import type { Actor } from '../../../src/lib/server/access';
import { getDb } from '../../../src/lib/server/db';
import { memberships, projectAccess, users, workshops } from '../../../src/lib/server/db/schema';
import type { Role } from '../../../src/lib/server/db/schema';

let n = 0;

/** A user row without a password (server tests act for them directly). */
export function makeUser(label: string): Actor {
	n += 1;
	const email = `${label}-${n}@example.test`;
	const row = getDb()
		.insert(users)
		.values({ name: `${label} ${n}`, email })
		.returning()
		.get();
	return { id: row.id, email, name: row.name, via: 'session' };
}

/**
 * A workshop with one member in each role, an outsider who belongs to another workshop, and two
 * clients who belong to no workshop of theirs yet (grant them projects with grantProject).
 */
export function makeWorkshopWithCast() {
	const db = getDb();
	const cast = {
		owner: makeUser('owner'),
		editor: makeUser('editor'),
		viewer: makeUser('viewer'),
		outsider: makeUser('outsider'),
		client: makeUser('client'),
		otherClient: makeUser('other-client')
	};
	const ws = db
		.insert(workshops)
		.values({ name: `Shop ${n}`, createdBy: cast.owner.id })
		.returning()
		.get();
	const other = db
		.insert(workshops)
		.values({ name: `Other ${n}` })
		.returning()
		.get();
	for (const role of ['owner', 'editor', 'viewer'] as Role[])
		db.insert(memberships)
			.values({ userId: cast[role as 'owner'].id, workshopId: ws.id, role })
			.run();
	db.insert(memberships)
		.values({ userId: cast.outsider.id, workshopId: other.id, role: 'owner' })
		.run();
	return { workshopId: ws.id, ...cast };
}

/** Invite a person to one project as its client (what accepting a project invitation does). */
export function grantProject(user: Actor, projectId: string) {
	getDb().insert(projectAccess).values({ userId: user.id, projectId }).run();
}

/** A RequestEvent-like object for calling a +server.ts handler directly. */
export function event(opts: {
	actor: Actor | null;
	url?: string;
	method?: string;
	body?: unknown;
	params?: Record<string, string>;
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
		request: new Request(url, init)
		// eslint-disable-next-line @typescript-eslint/no-explicit-any
	} as any;
}
