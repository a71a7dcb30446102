import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { event, makeWorkshopWithCast } from './support/actors';
import * as projectsApi from '../../src/routes/api/v1/projects/+server';
import * as projectApi from '../../src/routes/api/v1/projects/[id]/+server';
import { createProject, listProjects } from '../../src/lib/server/projects';

useTempDb();

describe('projects', () => {
	it('lists with search, sort and pages, scoped to the workshop', async () => {
		const cast = await makeWorkshopWithCast();
		for (const [name, client] of [
			['Library wall', 'Whitlock'],
			['Pantry', 'Osei'],
			['Reading nook', 'Harbour Street'],
			['Garage racks', 'Whitlock']
		])
			await createProject(cast.editor, cast.workshopId, { name, client, siteNotes: '' });
		const all = await listProjects(cast.viewer, {
			workshop: cast.workshopId,
			q: '',
			sort: 'name',
			dir: 'asc',
			page: 1,
			perPage: 3
		});
		expect(all.total).toBe(4);
		expect(all.items.map((p) => p.name)).toEqual(['Garage racks', 'Library wall', 'Pantry']);
		const page2 = await listProjects(cast.viewer, {
			workshop: cast.workshopId,
			q: '',
			sort: 'name',
			dir: 'asc',
			page: 2,
			perPage: 3
		});
		expect(page2.items.map((p) => p.name)).toEqual(['Reading nook']);
		const found = await listProjects(cast.viewer, {
			workshop: cast.workshopId,
			q: 'whitlock',
			sort: 'name',
			dir: 'desc',
			page: 1,
			perPage: 10
		});
		expect(found.items.map((p) => p.name)).toEqual(['Library wall', 'Garage racks']);
		// a LIKE wildcard typed by a user is a literal character, not a pattern
		const literal = await listProjects(cast.viewer, {
			workshop: cast.workshopId,
			q: '%',
			sort: 'name',
			dir: 'asc',
			page: 1,
			perPage: 10
		});
		expect(literal.total).toBe(0);
	});

	it('answers bad input with a JSON problem naming the field, never a 500', async () => {
		const cast = await makeWorkshopWithCast();
		const res = await projectsApi.POST(
			event({ actor: cast.editor, method: 'POST', body: { workshopId: cast.workshopId, name: '' } })
		);
		expect(res.status).toBe(422);
		const body = await res.json();
		expect(body.error).toMatch(/attention/);
		expect(body.issues[0].path).toEqual(['name']);
		const notJson = await projectsApi.POST(
			event({ actor: cast.editor, method: 'POST', body: '{oops' })
		);
		expect(notJson.status).toBe(400);
		const badQuery = await projectsApi.GET(
			event({ actor: cast.viewer, url: `/?workshop=${cast.workshopId}&perPage=500` })
		);
		expect(badQuery.status).toBe(422);
		expect((await badQuery.json()).issues[0].path).toEqual(['perPage']);
	});

	it('creates, reads, updates and deletes through the API', async () => {
		const cast = await makeWorkshopWithCast();
		const created = await projectsApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				body: { workshopId: cast.workshopId, name: 'Hall bench', client: 'Lee' }
			})
		);
		expect(created.status).toBe(201);
		const { id } = await created.json();
		const read = await projectApi.GET(event({ actor: cast.viewer, params: { id } }));
		expect(await read.json()).toMatchObject({ name: 'Hall bench', client: 'Lee', role: 'viewer' });
		const patched = await projectApi.PATCH(
			event({ actor: cast.owner, method: 'PATCH', params: { id }, body: { siteNotes: 'Oak top' } })
		);
		expect(await patched.json()).toMatchObject({ name: 'Hall bench', siteNotes: 'Oak top' });
		expect(
			(await projectApi.DELETE(event({ actor: cast.editor, method: 'DELETE', params: { id } })))
				.status
		).toBe(204);
		expect((await projectApi.GET(event({ actor: cast.owner, params: { id } }))).status).toBe(404);
	});
});
