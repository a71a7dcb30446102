import { describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { useTempDb } from './support/db';
import { oneRow } from '../../src/lib/server/db';
import { event, makeWorkshopWithCast } from './support/actors';
import { failingShelf, HAND_SAG_M, handShelf, saveShelf } from './support/analyses';
import * as listApi from '../../src/routes/api/v1/projects/[id]/analyses/+server';
import * as oneApi from '../../src/routes/api/v1/analyses/[id]/+server';
import { type ShelfResult } from '../../src/lib/engine';
import { analyzeShelf, type ShelfRequest } from '../../src/lib/compute';
import { getDb } from '../../src/lib/server/db';
import { analyses, users } from '../../src/lib/server/db/tables';
import { createProject } from '../../src/lib/server/projects';
import { getAnalysis, updateAnalysis } from '../../src/lib/server/analyses';

useTempDb();

async function setup() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Library wall',
		client: '',
		siteNotes: ''
	});
	return { cast, projectId: project.id };
}

const stored = async (id: string) =>
	await getDb().select().from(analyses).where(eq(analyses.id, id)).then(oneRow);

describe('saving an analysis', () => {
	it('computes the result on the server and ignores a result sent by the client', async () => {
		const { cast, projectId } = await setup();
		const res = await listApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				params: { id: projectId },
				body: {
					kind: 'shelf',
					name: 'Centre load',
					input: handShelf,
					result: { sag: { instant: 0 } },
					pass: false
				}
			})
		);
		expect(res.status).toBe(201);
		expect(res.headers.get('etag')).toBe('"v1"');
		const body = await res.json();
		const row = await stored(body.id);
		const result = row.result as ShelfResult;
		// the hand-worked sag (support/analyses.ts), and exactly what the engine gives
		expect(result.sag.instant).toBeCloseTo(HAND_SAG_M, 7);
		expect(result.sag.instant).toBe(analyzeShelf(handShelf as ShelfRequest).sag.instant);
		expect(row.pass).toBe(true);
		expect(row.version).toBe(1);
		expect(row.engineVersion).toBe(result.engineVersion);
		// L/144 of 1 m is 6.94 mm; 1.25 mm leaves 1 − 1.25/6.944 = 82% to spare
		expect(body.summary).toBe('Sags 1/16" under a brief load; within L/144 with 82% to spare.');
	});

	it('says a failing shelf fails, in the reader’s own unit', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId, 'Overloaded', failingShelf);
		expect(saved.pass).toBe(false);
		// 700 N at mid-span: 7 × 1.25 = 8.75 mm (0.344", nearest 1/16" is 3/8") against
		// 6.94 mm (0.273", nearest 1/4") allowed: (6.94 − 8.75) / 6.94 = 26% over
		expect((await stored(saved.id)).summary).toBe(
			'Sags 3/8" under a brief load; over L/144 by 26% (1/4" allowed).'
		);
		await getDb().update(users).set({ lengthUnit: 'mm' }).where(eq(users.id, cast.viewer.id));
		expect((await getAnalysis(cast.viewer, saved.id)).analysis.summary).toMatch(
			/^Sags 8\.[78] mm under a brief load; over L\/144 by 26% \(6\.9 mm allowed\)\.$/
		);
	});

	it('answers a bad input with a 422 naming the field inside the input, never a 500', async () => {
		const { cast, projectId } = await setup();
		const res = await listApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				params: { id: projectId },
				body: { kind: 'shelf', name: 'Typo', input: { ...handShelf, span: '35 1/2 furlongs' } }
			})
		);
		expect(res.status).toBe(422);
		const body = await res.json();
		expect(body.issues[0].path).toEqual(['input', 'span']);
		expect(body.issues[0].message).toMatch(/^Expected/);
		const badKind = await listApi.POST(
			event({
				actor: cast.editor,
				method: 'POST',
				params: { id: projectId },
				body: { kind: 'bookend', name: 'x', input: {} }
			})
		);
		expect(badKind.status).toBe(422);
	});
});

describe('optimistic concurrency', () => {
	it('refuses a stale version with 409 and leaves the stored analysis as it was', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		const get = await oneApi.GET(event({ actor: cast.viewer, params: { id: saved.id } }));
		expect(get.headers.get('etag')).toBe('"v1"');
		// the owner saves first, from version 1
		const first = await oneApi.PATCH(
			event({
				actor: cast.owner,
				method: 'PATCH',
				params: { id: saved.id },
				body: { version: 1, input: failingShelf }
			})
		);
		expect(first.status).toBe(200);
		expect(first.headers.get('etag')).toBe('"v2"');
		const before = await stored(saved.id);
		// the editor still holds version 1
		const req = event({
			actor: cast.editor,
			method: 'PATCH',
			params: { id: saved.id },
			body: { name: 'My rename', input: handShelf }
		});
		req.request.headers.set('if-match', '"v1"');
		const stale = await oneApi.PATCH(req);
		expect(stale.status).toBe(409);
		const problemBody = await stale.json();
		expect(problemBody.error).toMatch(/Nothing was overwritten/);
		expect(await stored(saved.id)).toEqual(before);
		expect(before.version).toBe(2);
		expect(before.pass).toBe(false);
	});

	it('needs a version: without If-Match or version a write is refused (428)', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		const res = await oneApi.PATCH(
			event({ actor: cast.editor, method: 'PATCH', params: { id: saved.id }, body: { name: 'x' } })
		);
		expect(res.status).toBe(428);
		expect((await stored(saved.id)).name).toBe('Hand-worked shelf');
	});

	it('the data module refuses a stale version too', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		await updateAnalysis(cast.editor, saved.id, { name: 'Second', version: 1 });
		await expect(
			updateAnalysis(cast.owner, saved.id, { name: 'Third', version: 1 })
		).rejects.toThrow(/Nothing was overwritten/);
		expect((await stored(saved.id)).name).toBe('Second');
	});

	it('PUT replaces name and input and recomputes', async () => {
		const { cast, projectId } = await setup();
		const saved = await saveShelf(cast.editor, projectId);
		const res = await oneApi.PUT(
			event({
				actor: cast.editor,
				method: 'PUT',
				params: { id: saved.id },
				body: { version: 1, name: 'Heavier', input: failingShelf }
			})
		);
		expect(res.status).toBe(200);
		const row = await stored(saved.id);
		expect((row.result as ShelfResult).sag.instant).toBeCloseTo(7 * HAND_SAG_M, 7);
		expect(row.name).toBe('Heavier');
	});
});
