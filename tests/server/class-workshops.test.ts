// A workshop made a class: its owner may give members the student role; a student reads the
// class's projects, saves analyses of their own and changes no one else's (the full matrix of
// API routes is in authorization.test.ts, where the cast includes a student).
import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeUser, makeWorkshopWithCast } from './support/actors';
import { handShelf, saveShelf } from './support/analyses';
import {
	createAnalysis,
	deleteAnalysis,
	duplicateAnalysis,
	getAnalysis,
	updateAnalysis
} from '../../src/lib/server/analyses';
import { createProject } from '../../src/lib/server/projects';
import {
	changeMemberRole,
	createInvitation,
	createWorkshopFor,
	listWorkshops,
	setClassMode
} from '../../src/lib/server/workshops';
import { getDb } from '../../src/lib/server/db';
import { memberships } from '../../src/lib/server/db/tables';

useTempDb();

async function status(run: () => Promise<unknown>) {
	try {
		await run();
		return 200;
	} catch (e) {
		return (e as { status?: number }).status ?? 500;
	}
}

type Cast = Awaited<ReturnType<typeof makeWorkshopWithCast>>;
const newProject = (c: Cast) =>
	createProject(c.owner, c.workshopId, { name: 'Library wall', client: '', siteNotes: '' });

describe('a student in a class', () => {
	it('saves and changes their own analyses, reads everyone’s, and changes no one else’s', async () => {
		const c = await makeWorkshopWithCast();
		const project = await newProject(c);
		const teachers = await saveShelf(c.owner, project.id);
		const mine = await createAnalysis(c.student, project.id, {
			kind: 'shelf',
			name: 'My shelf',
			input: handShelf
		});
		expect((await getAnalysis(c.student, mine.id)).canChange).toBe(true);
		expect((await getAnalysis(c.student, teachers.id)).canChange).toBe(false);
		expect((await getAnalysis(c.owner, mine.id)).canChange).toBe(true); // the teacher may correct it
		expect((await getAnalysis(c.viewer, mine.id)).canChange).toBe(false);

		const renamed = await updateAnalysis(c.student, mine.id, {
			name: 'My thicker shelf',
			version: 1
		});
		expect(renamed.name).toBe('My thicker shelf');
		expect(
			await status(() => updateAnalysis(c.student, teachers.id, { name: 'x', version: 1 }))
		).toBe(403);
		expect(await status(() => deleteAnalysis(c.student, teachers.id))).toBe(403);
		// another student's work is someone else's too
		const other = await makeUser('student');
		await getDb()
			.insert(memberships)
			.values({ userId: other.id, workshopId: c.workshopId, role: 'student' });
		expect(await status(() => deleteAnalysis(other, mine.id))).toBe(403);

		// starting from the teacher's analysis makes a copy of the student's own
		const copy = await duplicateAnalysis(c.student, teachers.id);
		expect((await getAnalysis(c.student, copy.id)).canChange).toBe(true);
		expect(await status(() => deleteAnalysis(c.student, copy.id))).toBe(200);

		// projects and members stay the teacher's
		expect(
			await status(() =>
				createProject(c.student, c.workshopId, { name: 'x', client: '', siteNotes: '' })
			)
		).toBe(403);
		expect(
			await status(() => createInvitation(c.student, c.workshopId, 'a@example.test', 'student'))
		).toBe(403);
	});
});

describe('making a workshop a class', () => {
	it('is the owner’s, and the student role exists only in a class', async () => {
		const owner = await makeUser('teacher');
		const ws = await createWorkshopFor(owner.id, 'Evening joinery');
		const pupil = await makeUser('pupil');
		await getDb()
			.insert(memberships)
			.values({ userId: pupil.id, workshopId: ws.id, role: 'viewer' });
		expect(await status(() => changeMemberRole(owner, ws.id, pupil.id, 'student'))).toBe(422);
		expect(await status(() => createInvitation(owner, ws.id, 'b@example.test', 'student'))).toBe(
			422
		);

		expect((await setClassMode(owner, ws.id, true))?.isClass).toBe(true);
		expect((await listWorkshops(owner)).find((w) => w.id === ws.id)?.isClass).toBe(true);
		await changeMemberRole(owner, ws.id, pupil.id, 'student');
		expect((await listWorkshops(pupil))[0]).toMatchObject({ role: 'student', isClass: true });
		// a class with a student in it stays a class until the student has another role
		expect(await status(() => setClassMode(owner, ws.id, false))).toBe(409);
		await changeMemberRole(owner, ws.id, pupil.id, 'viewer');
		await createInvitation(owner, ws.id, 'c@example.test', 'student');
		expect(await status(() => setClassMode(owner, ws.id, false))).toBe(409);
	});

	it('is refused to editors and for a personal workshop', async () => {
		const c = await makeWorkshopWithCast();
		expect(await status(() => setClassMode(c.editor, c.workshopId, false))).toBe(403);
		const solo = await makeUser('solo');
		const personal = await createWorkshopFor(solo.id, 'Solo', true);
		expect(await status(() => setClassMode(solo, personal.id, true))).toBe(409);
	});
});
