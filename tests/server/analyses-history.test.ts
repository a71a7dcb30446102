import { describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { useTempDb } from './support/db';
import { oneRow } from '../../src/lib/server/db';
import { event, makeWorkshopWithCast } from './support/actors';
import { failingShelf, HAND_SAG_M, saveShelf } from './support/analyses';
import * as revisionApi from '../../src/routes/api/v1/analyses/[id]/revisions/[version]/+server';
import * as oneApi from '../../src/routes/api/v1/analyses/[id]/+server';
import * as undeleteApi from '../../src/routes/api/v1/analyses/[id]/undelete/+server';
import * as moveApi from '../../src/routes/api/v1/analyses/[id]/move/+server';
import type { ShelfResult } from '../../src/lib/engine';
import { getDb } from '../../src/lib/server/db';
import { analyses, memberships } from '../../src/lib/server/db/tables';
import { createProject } from '../../src/lib/server/projects';
import {
	deleteAnalysis,
	duplicateAnalysis,
	getRevision,
	listAnalyses,
	listRevisions,
	moveAnalysis,
	undoDelete,
	UNDO_WINDOW_MS,
	updateAnalysis
} from '../../src/lib/server/analyses';

useTempDb();

async function setup() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Pantry',
		client: '',
		siteNotes: ''
	});
	return { cast, projectId: project.id };
}
const stored = async (id: string) =>
	await getDb().select().from(analyses).where(eq(analyses.id, id)).then(oneRow);
const sagOf = async (id: string) => ((await stored(id)).result as ShelfResult).sag.instant;

describe('revisions', () => {
	it('keeps every version with who saved it, and restores an earlier one as a new version', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		await updateAnalysis(cast.owner, saved.id, { input: failingShelf, version: 1 });
		await updateAnalysis(cast.editor, saved.id, { name: 'Renamed', version: 2 });
		const revisions = await listRevisions(cast.viewer, saved.id);
		expect(revisions.map((r) => [r.version, r.name, r.current])).toEqual([
			[3, 'Renamed', true],
			[2, 'Hand-worked shelf', false],
			[1, 'Hand-worked shelf', false]
		]);
		expect(revisions[1].changedByName).toBe(cast.owner.name);
		const first = (await getRevision(cast.viewer, saved.id, 1)).revision;
		expect(first.summary).toBe('Sags 1/16" under a brief load; within L/144 with 82% to spare.');
		expect(first.inputRows).toContainEqual(['Span', '39 3/8"']);
		expect(first.inputRows).toContainEqual(['Loads', '22.5 lbf at 19 11/16"']);

		const res = await revisionApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				params: { id: saved.id, version: '1' },
				body: {}
			})
		);
		expect(res.status).toBe(200);
		expect(res.headers.get('etag')).toBe('"v4"');
		const row = await stored(saved.id);
		expect(row.version).toBe(4);
		expect(row.name).toBe('Hand-worked shelf');
		expect(await sagOf(saved.id)).toBeCloseTo(HAND_SAG_M, 7);
		expect(row.pass).toBe(true);
		expect(await listRevisions(cast.viewer, saved.id)).toHaveLength(4);
	});

	it('refuses a restore based on a stale version, and an unknown version is 404', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		await updateAnalysis(cast.editor, saved.id, { name: 'Two', version: 1 });
		const stale = await revisionApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				params: { id: saved.id, version: '1' },
				body: { version: 1 }
			})
		);
		expect(stale.status).toBe(409);
		expect((await stored(saved.id)).version).toBe(2);
		const missing = await revisionApi.GET(
			event({ actor: cast.viewer, params: { id: saved.id, version: '9' } })
		);
		expect(missing.status).toBe(404);
	});
});

describe('duplicate and move', () => {
	it('duplicates within the project, recomputed, at version 1', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId, 'Jar shelf', failingShelf);
		await updateAnalysis(cast.editor, saved.id, { name: 'Jar shelf', version: 1 });
		const copy = await duplicateAnalysis(cast.editor, saved.id);
		expect(copy.id).not.toBe(saved.id);
		expect(copy.name).toBe('Jar shelf (copy)');
		expect(copy.version).toBe(1);
		expect(copy.projectId).toBe(projectId);
		expect(await sagOf(copy.id)).toBe(await sagOf(saved.id));
		expect(await listRevisions(cast.viewer, copy.id)).toHaveLength(1);
	});

	it('moves to another project of the workshop, and refuses one in another workshop', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		const sibling = await createProject(cast.editor, cast.workshopId, {
			name: 'Garage',
			client: '',
			siteNotes: ''
		});
		expect((await moveAnalysis(cast.editor, saved.id, sibling.id)).projectId).toBe(sibling.id);
		// the editor also edits in a second workshop: still no moving across
		const elsewhere = await setup();
		await getDb()
			.insert(memberships)
			.values({ userId: cast.editor.id, workshopId: elsewhere.cast.workshopId, role: 'editor' });
		const res = await moveApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				params: { id: saved.id },
				body: { projectId: elsewhere.projectId }
			})
		);
		expect(res.status).toBe(422);
		expect((await res.json()).issues[0].path).toEqual(['projectId']);
		expect((await stored(saved.id)).projectId).toBe(sibling.id);
		// a project the actor cannot see is not found
		const outsider = await moveApi.POST(
			event({
				actor: cast.owner,
				method: 'POST',
				params: { id: saved.id },
				body: { projectId: elsewhere.projectId }
			})
		);
		expect(outsider.status).toBe(404);
	});
});

describe('delete and undo', () => {
	it('hides a deleted analysis at once and brings it back with undo', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		const del = await oneApi.DELETE(
			event({ actor: cast.editor, method: 'DELETE', params: { id: saved.id } })
		);
		expect(del.status).toBe(200);
		const body = await del.json();
		expect(new Date(body.undoUntil).getTime() - new Date(body.deletedAt).getTime()).toBe(
			UNDO_WINDOW_MS
		);
		const gone = await oneApi.GET(event({ actor: cast.viewer, params: { id: saved.id } }));
		expect(gone.status).toBe(404);
		const query = { q: '', sort: 'updated', dir: 'desc', page: 1, perPage: 20 } as const;
		expect((await listAnalyses(cast.viewer, projectId, query)).total).toBe(0);
		const undo = await undeleteApi.POST(
			event({ actor: cast.editor, method: 'POST', params: { id: saved.id } })
		);
		expect(undo.status).toBe(200);
		expect((await listAnalyses(cast.viewer, projectId, query)).total).toBe(1);
		expect((await stored(saved.id)).deletedAt).toBeNull();
	});

	it('refuses an undo after the window (409) and keeps it deleted', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		await deleteAnalysis(cast.editor, saved.id);
		const later = new Date(Date.now() + UNDO_WINDOW_MS + 1000);
		await expect(undoDelete(cast.editor, saved.id, later)).rejects.toThrow(/too long ago/);
		expect((await stored(saved.id)).deletedAt).not.toBeNull();
	});
});

describe('viewers read and never write', () => {
	it('refuses every write of a viewer with 403 and changes nothing', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		const other = await createProject(cast.owner, cast.workshopId, {
			name: 'Other',
			client: '',
			siteNotes: ''
		});
		const before = await stored(saved.id);
		const v = cast.viewer;
		const writes: [string, () => Promise<unknown>][] = [
			['create', async () => await saveShelf(v, projectId)],
			['update', async () => await updateAnalysis(v, saved.id, { name: 'x', version: 1 })],
			['duplicate', async () => await duplicateAnalysis(v, saved.id)],
			['move', async () => await moveAnalysis(v, saved.id, other.id)],
			['delete', async () => await deleteAnalysis(v, saved.id)],
			['undo', async () => await undoDelete(v, saved.id)]
		];
		for (const [what, write] of writes)
			await expect(write(), what).rejects.toMatchObject({ status: 403 });
		expect(await stored(saved.id)).toEqual(before);
		expect(await listRevisions(v, saved.id)).toHaveLength(1);
	});
});
