// PostgreSQL's plan of the analyses list's first page: once the table's statistics are known (as
// autovacuum's ANALYZE gives them after a bulk load), the page is read in order from a list index
// with no sort, because the indexes name the nulls' places as the list's ORDER BY does
// (schema-pg.ts). SQLite's plans are in analyses-list-index.test.ts.
import { describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { saveShelf } from './support/analyses';
import { createProject } from '../../src/lib/server/projects';
import { analysisPage } from '../../src/lib/server/analyses';
import { dialect, getDb } from '../../src/lib/server/db';
import { analyses } from '../../src/lib/server/db/tables';
import type { AnalysisListQuery } from '../../src/lib/schemas/analysis';

const db = useTempDb();
const base: AnalysisListQuery = { q: '', sort: 'updated', dir: 'desc', page: 1, perPage: 25 };

describe.skipIf(dialect !== 'pg')("the analyses list's first page on PostgreSQL", () => {
	it('is read in order from a list index, without a sort, for each sort as first shown and each filter', async () => {
		const cast = await makeWorkshopWithCast();
		const project = await createProject(cast.owner, cast.workshopId, {
			name: 'Plan check',
			client: '',
			siteNotes: ''
		});
		const first = await saveShelf(cast.editor, project.id, 'Bay 0');
		const [row] = await getDb().select().from(analyses).where(eq(analyses.id, first.id));
		const start = row.updatedAt.getTime();
		for (let i = 1; i < 3000; i += 500) {
			const batch = [];
			for (let j = i; j < Math.min(3000, i + 500); j++)
				batch.push({
					...row,
					id: crypto.randomUUID(),
					name: `Bay ${j}`,
					pass: j % 4 !== 0,
					createdAt: new Date(start - j * 60_000),
					updatedAt: new Date(start - j * 30_000)
				});
			await getDb().insert(analyses).values(batch);
		}
		const pool = db().pool!;
		await pool.query('analyze analysis');
		const queries: [string, AnalysisListQuery][] = [
			['newest first', base],
			['created, newest first', { ...base, sort: 'created' }],
			['by name', { ...base, sort: 'name', dir: 'asc' }],
			['shelves only', { ...base, kind: 'shelf' }],
			['failing only', { ...base, pass: 'fail' }]
		];
		for (const [label, query] of queries) {
			const { sql, params } = analysisPage(project.id, query).page.toSQL();
			const plan = (await pool.query(`explain ${sql}`, params)).rows
				.map((r) => r['QUERY PLAN'] as string)
				.join('\n');
			expect(plan, label).toMatch(/Index (Only )?Scan using analysis_list_\w+ on analysis/);
			expect(plan, label).not.toMatch(/Sort/);
		}
	});
});
