import { eq, inArray } from 'drizzle-orm';
import { createUser } from '../accounts/users';
import { getDb, firstRow, oneRow } from '../db';
import { memberships, projectAccess, projects, users, workshops } from '../db/tables';
import { DEMO_ACCOUNTS } from './accounts';
import { seedDemoAnalyses } from './analyses';

// The demo scenario (invented): Quillfeather Casework, a two-person built-in shop with an apprentice, and Dana
// Whitlock, a client invited to her library wall alone: she never sees the shop's other clients.
const DEMO_WORKSHOP = 'Quillfeather Casework';

const DEMO_PROJECTS = [
	{
		name: 'Whitlock library wall',
		client: 'Dana Whitlock',
		siteNotes:
			'Built-in bookcases either side of the fireplace, 94" tall to the crown. Plaster over lath; studs at 16" on centre found on the left wall only. Oak-faced plywood carcases, painted poplar face frame.'
	},
	{
		name: 'Harbour Street school reading nook',
		client: 'Harbour Street Primary (facilities office)',
		siteNotes:
			'Low open shelving for picture books and a tall teacher cabinet. Children climb: every tall unit anchored. Design load for school shelving.'
	},
	{
		name: 'Kiln Lane pantry',
		client: 'R. and M. Osei',
		siteNotes:
			'Deep pantry shelves for jars and small appliances, melamine-faced particleboard with hardwood nosings. Masonry back wall.'
	}
];

/** Remove the demo accounts (and what only they own), then create the scenario afresh. */
export async function seedDemo() {
	const db = getDb();
	const emails = DEMO_ACCOUNTS.map((a) => a.email);
	const old = await db.select({ id: users.id }).from(users).where(inArray(users.email, emails));
	if (old.length) {
		const ids = old.map((u) => u.id);
		await db.delete(workshops).where(inArray(workshops.createdBy, ids));
		await db.delete(users).where(inArray(users.id, ids));
	}

	const created = [];
	for (const account of DEMO_ACCOUNTS) {
		const user = await createUser({
			name: account.name,
			email: account.email,
			password: account.password
		});
		await db.update(users).set({ emailVerified: new Date() }).where(eq(users.id, user.id));
		created.push({ ...account, id: user.id });
	}
	const owner = created.find((a) => a.role === 'owner')!;
	const shop = await db
		.insert(workshops)
		.values({ name: DEMO_WORKSHOP, createdBy: owner.id })
		.returning()
		.then(oneRow);
	for (const member of created) {
		if (member.role === 'client') continue;
		await db
			.insert(memberships)
			.values({ userId: member.id, workshopId: shop.id, role: member.role });
		await db.update(users).set({ currentWorkshopId: shop.id }).where(eq(users.id, member.id));
	}
	// Dana is a client, not a builder: she reads her own project of Quillfeather's; her own
	// workshop remains empty.
	const editor = created.find((a) => a.role === 'editor')!;
	const projectIds: Record<string, string> = {};
	for (const [i, p] of DEMO_PROJECTS.entries()) {
		const row = await db
			.insert(projects)
			.values({
				...p,
				workshopId: shop.id,
				createdBy: i === 0 ? owner.id : editor.id,
				updatedAt: new Date(Date.now() - i * 86_400_000)
			})
			.returning()
			.then(oneRow);
		projectIds[p.name] = row.id;
	}
	const client = created.find((a) => a.role === 'client')!;
	await db.insert(projectAccess).values({
		userId: client.id,
		projectId: projectIds['Whitlock library wall'],
		grantedBy: owner.id
	});
	const analysisIds = await seedDemoAnalyses(projectIds, created);
	return { workshopId: shop.id, users: created, projectIds, analysisIds };
}

/** True when the demo scenario is already in the database. */
export async function demoIsSeeded() {
	return !!(await getDb()
		.select({ id: users.id })
		.from(users)
		.where(eq(users.email, DEMO_ACCOUNTS[0].email))
		.then(firstRow));
}
