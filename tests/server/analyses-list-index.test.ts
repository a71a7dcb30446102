import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { eq } from 'drizzle-orm';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { saveShelf } from './support/analyses';
import { createProject } from '../../src/lib/server/projects';
import {
	analysisPage,
	deleteAnalysis,
	listAnalyses,
	updateAnalysis
} from '../../src/lib/server/analyses';
import { dialect, getDb } from '../../src/lib/server/db';
import { analyses } from '../../src/lib/server/db/tables';
import { ANALYSIS_SORTS, type AnalysisListQuery } from '../../src/lib/schemas/analysis';

const db = useTempDb();

async function newProject() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Search bench',
		client: '',
		siteNotes: ''
	});
	return { cast, projectId: project.id };
}

const base: AnalysisListQuery = { q: '', sort: 'updated', dir: 'desc', page: 1, perPage: 100 };

// SQLite's query plan (PostgreSQL chooses its plan by its statistics; the same indexes exist there)
describe.skipIf(dialect === 'pg')("the analyses list's page of ids", () => {
	it('is read from one of the list indexes alone, for every sort, direction and filter', () => {
		const sqlite = db().sqlite!;
		const plans: string[] = [];
		for (const sort of ANALYSIS_SORTS)
			for (const dir of ['asc', 'desc'] as const)
				for (const filters of [{}, { kind: 'shelf' as const }, { pass: 'fail' as const }]) {
					const { sql, params } = analysisPage('p', {
						...base,
						sort,
						dir,
						...filters
					}).page.toSQL();
					const plan = sqlite
						.prepare(`explain query plan ${sql}`)
						.all(...params)
						.map((r) => (r as { detail: string }).detail)
						.join('; ');
					plans.push(plan);
					// a covering index: the rows themselves (with input and result) are never read
					expect(plan, `${sort} ${dir} ${JSON.stringify(filters)}`).toMatch(
						/USING COVERING INDEX analysis_list_/
					);
					expect(plan).not.toMatch(/SCAN analysis\b(?! USING)/);
				}
		expect(plans).toHaveLength(ANALYSIS_SORTS.length * 2 * 3);
	});
});

describe('searching the analyses list', () => {
	it('finds what LIKE would, case-insensitively and with every character literal, short or long', async () => {
		// names from a small alphabet so that searches hit; ASCII only (the trigram index folds the
		// case of every letter, LIKE only of ASCII ones)
		const char = fc.constantFrom('a', 'B', 'b', 'c', '%', '_', '\\', '"', ' ', '*', ':', '-');
		const name = fc.array(char, { minLength: 1, maxLength: 8 }).map((cs) => cs.join(''));
		await fc.assert(
			fc.asyncProperty(
				fc.array(name, { minLength: 1, maxLength: 5 }),
				fc.array(char, { minLength: 1, maxLength: 4 }).map((cs) => cs.join('')),
				async (names, q) => {
					if (q.trim() !== q) return; // the list's schema trims what is typed
					const { cast, projectId } = await newProject();
					for (const n of names) await saveShelf(cast.editor, projectId, n);
					const stored = await getDb()
						.select({ name: analyses.name, summary: analyses.summary })
						.from(analyses)
						.where(eq(analyses.projectId, projectId));
					const needle = q.toLowerCase();
					const expected = stored
						.filter(
							(r) =>
								r.name.toLowerCase().includes(needle) || r.summary.toLowerCase().includes(needle)
						)
						.map((r) => r.name)
						.sort();
					const found = await listAnalyses(cast.viewer, projectId, { ...base, q, sort: 'name' });
					expect(found.items.map((a) => a.name).sort()).toEqual(expected);
					expect(found.total).toBe(expected.length);
				}
			),
			{ numRuns: 25 }
		);
	});

	it('follows a rename and forgets a deleted analysis', async () => {
		const { cast, projectId } = await newProject();
		const saved = await saveShelf(cast.editor, projectId, 'Window seat');
		const find = async (q: string) =>
			(await listAnalyses(cast.viewer, projectId, { ...base, q })).items.map((a) => a.name);
		expect(await find('window')).toEqual(['Window seat']);
		await updateAnalysis(cast.editor, saved.id, { name: 'Hall bench', version: saved.version });
		expect(await find('window')).toEqual([]);
		expect(await find('hall b')).toEqual(['Hall bench']);
		await deleteAnalysis(cast.editor, saved.id);
		expect(await find('hall b')).toEqual([]);
	});

	// SQLite's FTS5 tables (PostgreSQL searches the analysis rows themselves, through a trigram index)
	it.skipIf(dialect === 'pg')(
		'keeps the search index whole when an analysis row is removed outright',
		async () => {
			const { cast, projectId } = await newProject();
			const saved = await saveShelf(cast.editor, projectId, 'Pantry shelf');
			await getDb().delete(analyses).where(eq(analyses.id, saved.id));
			const sqlite = db().sqlite!;
			const left = sqlite
				.prepare('select count(*) n from analysis_text where analysis_id = ?')
				.get(saved.id) as { n: number };
			expect(left.n).toBe(0);
			// FTS5's own check that the index matches its content table
			expect(() =>
				sqlite
					.prepare("insert into analysis_search(analysis_search) values ('integrity-check')")
					.run()
			).not.toThrow();
		}
	);
});
