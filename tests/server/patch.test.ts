// A PATCH changes the fields it names and no other (zod 4's `.partial()` still applied
// `.default('')`, so a PATCH of a project's name wiped its client and site notes).
import { describe, expect, it } from 'vitest';
import { operations } from '../../src/lib/server/openapi';
import { createProject } from '../../src/lib/server/projects';
import { getAnalysis } from '../../src/lib/server/analyses';
import { PATCH as patchProject } from '../../src/routes/api/v1/projects/[id]/+server';
import { PATCH as patchAnalysis } from '../../src/routes/api/v1/analyses/[id]/+server';
import { PATCH as patchWorkshop } from '../../src/routes/api/v1/workshops/[id]/+server';
import { event, makeWorkshopWithCast } from './support/actors';
import { saveShelf } from './support/analyses';
import { useTempDb } from './support/db';

useTempDb();

describe('every PATCH body schema', () => {
	const patches = operations.filter((op) => op.method === 'patch');

	it('is there for each PATCH operation', () => {
		expect(patches.map((op) => op.path).sort()).toEqual([
			'/analyses/{id}',
			'/class-sessions/{id}',
			'/documents/{id}',
			'/projects/{id}',
			'/workshops/{id}'
		]);
	});

	for (const op of patches)
		it(`${op.path}: an empty body adds no field of its own`, () => {
			const parsed = op.body!.safeParse({});
			// a schema may refuse an empty patch; if it takes one, nothing may appear in it
			if (parsed.success)
				expect(Object.entries(parsed.data as object).filter(([, v]) => v !== undefined)).toEqual(
					[]
				);
		});
});

describe('PATCH /projects/{id}', () => {
	const fields = { name: 'Bookcase', client: 'Ines Ortega', siteNotes: 'Stair hall, plaster wall' };

	for (const [changed, value] of [
		['name', 'Tall bookcase'],
		['client', 'Ines & Jo Ortega'],
		['siteNotes', 'Stair hall, stud wall']
	] as const)
		it(`with only ${changed} leaves the other fields as they were`, async () => {
			const cast = await makeWorkshopWithCast();
			const project = await createProject(cast.owner, cast.workshopId, fields);
			const res = await patchProject(
				event({
					actor: cast.editor,
					method: 'PATCH',
					params: { id: project.id },
					body: { [changed]: value }
				})
			);
			expect(res.status).toBe(200);
			expect(await res.json()).toMatchObject({ ...fields, [changed]: value });
		});
});

describe('PATCH /analyses/{id} and /workshops/{id}', () => {
	it('a new analysis name keeps its input and result', async () => {
		const cast = await makeWorkshopWithCast();
		const project = await createProject(cast.owner, cast.workshopId, {
			name: 'Hall',
			client: '',
			siteNotes: ''
		});
		const saved = await saveShelf(cast.owner, project.id);
		const before = (await getAnalysis(cast.owner, saved.id)).analysis;
		const res = await patchAnalysis(
			event({
				actor: cast.owner,
				method: 'PATCH',
				params: { id: saved.id },
				body: { version: 1, name: 'Renamed shelf' }
			})
		);
		expect(res.status).toBe(200);
		const after = (await getAnalysis(cast.owner, saved.id)).analysis;
		expect(after.name).toBe('Renamed shelf');
		expect(after.input).toEqual(before.input);
		expect(after.kind).toBe(before.kind);
	});

	it('a new workshop name keeps whether it is personal', async () => {
		const cast = await makeWorkshopWithCast();
		const res = await patchWorkshop(
			event({
				actor: cast.owner,
				method: 'PATCH',
				params: { id: cast.workshopId },
				body: { name: 'Renamed shop' }
			})
		);
		expect(res.status).toBe(200);
		expect(await res.json()).toMatchObject({ name: 'Renamed shop', personal: false });
	});
});
