import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { event, makeWorkshopWithCast } from './support/actors';
import { failingShelf, handShelf, saveShelf } from './support/analyses';
import * as listApi from '../../src/routes/api/v1/projects/[id]/analyses/+server';
import { analyzeShelf, type ShelfRequest } from '../../src/lib/compute';
import { createProject } from '../../src/lib/server/projects';
import { createAnalysis, listAnalyses } from '../../src/lib/server/analyses';
import type { ComparisonResult } from '../../src/lib/kinds/comparison';

useTempDb();

async function setup() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Reading nook',
		client: '',
		siteNotes: ''
	});
	return { cast, projectId: project.id };
}

// one shelf, two boards: the stiffer board sags less (both from the hand-worked shelf)
const comparisonInput = {
	shelf: { ...handShelf, material: undefined, thickness: undefined },
	candidates: [
		{ material: handShelf.material, thickness: 0.02, label: '20 mm test board' },
		{ material: handShelf.material, thickness: 0.01, label: '10 mm test board' }
	]
};

describe('the analyses of a project', () => {
	it('lists with search, kind and verdict filters, sort and pages', async () => {
		const { cast, projectId } = await setup();
		await saveShelf(cast.editor, projectId, 'Left bay shelf');
		await saveShelf(cast.editor, projectId, 'Right bay shelf', failingShelf);
		await saveShelf(cast.editor, projectId, 'Window seat', failingShelf);
		await createAnalysis(cast.editor, projectId, {
			kind: 'comparison',
			name: 'Board choice',
			input: comparisonInput
		});
		const base = { q: '', sort: 'name', dir: 'asc', page: 1, perPage: 3 } as const;
		const first = await listAnalyses(cast.viewer, projectId, base);
		expect(first.total).toBe(4);
		expect(first.items.map((a) => a.name)).toEqual([
			'Board choice',
			'Left bay shelf',
			'Right bay shelf'
		]);
		expect(first.items[1].updatedByName).toBe(cast.editor.name);
		expect(
			(await listAnalyses(cast.viewer, projectId, { ...base, page: 2 })).items.map((a) => a.name)
		).toEqual(['Window seat']);
		const failing = await listAnalyses(cast.viewer, projectId, {
			...base,
			pass: 'fail',
			dir: 'desc'
		});
		expect(failing.items.map((a) => a.name)).toEqual(['Window seat', 'Right bay shelf']);
		const comparisons = await listAnalyses(cast.viewer, projectId, { ...base, kind: 'comparison' });
		expect(comparisons.items.map((a) => a.name)).toEqual(['Board choice']);
		const found = await listAnalyses(cast.viewer, projectId, { ...base, q: 'BAY' });
		expect(found.total).toBe(2);
		// a typed wildcard is a literal character: '_' (any one character to LIKE) matches nothing here,
		// and '%' matches only the summaries that say '… % to spare'
		expect((await listAnalyses(cast.viewer, projectId, { ...base, q: '_' })).total).toBe(0);
		expect((await listAnalyses(cast.viewer, projectId, { ...base, q: '% to spare' })).total).toBe(
			2
		);
		// through the API, from the query string, with the same answer
		const res = await listApi.GET(
			event({
				actor: cast.viewer,
				params: { id: projectId },
				url: '/?sort=pass&dir=asc&kind=shelf&perPage=10'
			})
		);
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body.items.map((a: { pass: boolean }) => a.pass)).toEqual([false, false, true]);
		expect(body.items[0]).not.toHaveProperty('result');
		const bad = await listApi.GET(
			event({ actor: cast.viewer, params: { id: projectId }, url: '/?sort=colour' })
		);
		expect(bad.status).toBe(422);
	});

	it('saves a comparison with each candidate computed by the shelf engine', async () => {
		const { cast, projectId } = await setup();
		const saved = await createAnalysis(cast.editor, projectId, {
			kind: 'comparison',
			name: 'Board choice',
			input: comparisonInput
		});
		const result = saved.result as ComparisonResult;
		const thick = analyzeShelf(handShelf as ShelfRequest);
		const thin = analyzeShelf({ ...handShelf, thickness: 0.01 } as ShelfRequest);
		expect(result.candidates.map((c) => c.sag.instant)).toEqual([
			thick.sag.instant,
			thin.sag.instant
		]);
		// half the thickness: eight times the bending sag (δ ∝ 1/t³), 10 mm against 6.94 mm allowed
		expect(thin.sag.instant / thick.sag.instant).toBeCloseTo(8, 6);
		expect(saved.pass).toBe(true);
		expect(saved.summary).toBe(
			'1 of 2 candidates meets L/144; least sag: 20 mm test board, 1/16", 82% to spare.'
		);
	});

	it('reports a bad candidate at its own path', async () => {
		const { cast, projectId } = await setup();
		await expect(
			createAnalysis(cast.editor, projectId, {
				kind: 'comparison',
				name: 'Bad',
				input: {
					...comparisonInput,
					candidates: [
						comparisonInput.candidates[0],
						{ material: 'no-such-board', thickness: '3/4"' }
					]
				}
			})
		).rejects.toThrow(
			expect.objectContaining({
				status: 422,
				issues: [expect.objectContaining({ path: ['input', 'candidates', 1, 'material'] })]
			})
		);
	});
});
