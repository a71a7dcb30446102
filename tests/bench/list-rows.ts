// The list rows of issue 12: a project's analyses list (the data module behind
// GET /api/v1/projects/:id/analyses) at 200 and at 10,000 analyses, first and last page, sorted by
// name, searched (a long and a short search), and one save into the full project. Each figure is the
// median of ROUNDS calls, beside the goal (< 20 ms at any page, flat in N). Reports; never fails on a
// slow number. Runs on the database the app would use (a temporary SQLite file unless DATABASE_URL
// says otherwise). On PostgreSQL it runs ANALYZE after each bulk load, as autovacuum would, and
// BENCH_LIST_EXPLAIN=1 prints the plan of each page's query.
//
//   npx tsx tests/bench/list-rows.ts
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const work = mkdtempSync(join(tmpdir(), 'spanwright-list-bench-'));
process.env.SPANWRIGHT_DATA_DIR = work;

const { closeDb, dbReady, dialect, getDb, getOpened, oneRow } =
	await import('../../src/lib/server/db');
const { analyses, memberships, users, workshops } = await import('../../src/lib/server/db/tables');
const { createProject } = await import('../../src/lib/server/projects');
const { analysisPage, createAnalysis, listAnalyses } =
	await import('../../src/lib/server/analyses');
type Actor = import('../../src/lib/server/access').Actor;
type Query = import('../../src/lib/schemas/analysis').AnalysisListQuery;

const ROUNDS = Number(process.env.BENCH_LIST_ROUNDS ?? 15);
const GOAL_MS = 20;
const PER_PAGE = 25;

// the demo's kind of shelf: 3/4" plywood over 32", books (invented bench data)
const SHELF = {
	span: '32"',
	depth: '11 1/4"',
	thickness: '3/4"',
	material: 'red-oak',
	loads: [{ kind: 'area', pressure: '40 psf' }]
};

async function actor(): Promise<{ actor: Actor; workshopId: string }> {
	const db = getDb();
	const user = await db
		.insert(users)
		.values({ name: 'Bench owner', email: `bench-${crypto.randomUUID()}@example.test` })
		.returning()
		.then(oneRow);
	const workshop = await db
		.insert(workshops)
		.values({ name: 'Bench shop', createdBy: user.id })
		.returning()
		.then(oneRow);
	await db.insert(memberships).values({ userId: user.id, workshopId: workshop.id, role: 'owner' });
	return {
		actor: { id: user.id, email: user.email!, name: user.name, via: 'session' },
		workshopId: workshop.id
	};
}

/** A project holding n analyses: one saved for real, the rest copies of its row with their own names. */
async function projectWith(owner: Actor, workshopId: string, n: number) {
	const project = await createProject(owner, workshopId, {
		name: `${n} analyses`,
		client: '',
		siteNotes: ''
	});
	const first = await createAnalysis(owner, project.id, {
		kind: 'shelf',
		name: 'Bay 0',
		input: SHELF
	});
	const row = await getDb()
		.select()
		.from(analyses)
		.where((await import('drizzle-orm')).eq(analyses.id, first.id))
		.then(oneRow);
	const start = row.updatedAt.getTime();
	for (let i = 1; i < n; i += 500) {
		const batch = [];
		for (let j = i; j < Math.min(n, i + 500); j++)
			batch.push({
				...row,
				id: crypto.randomUUID(),
				name: `Bay ${j} ${j % 3 === 0 ? 'upper' : 'lower'} shelf`,
				pass: j % 4 !== 0,
				createdAt: new Date(start - j * 60_000),
				updatedAt: new Date(start - j * 30_000)
			});
		await getDb().insert(analyses).values(batch);
	}
	// as PostgreSQL's autovacuum would after a bulk load: statistics, so that its planner knows the
	// table's size and picks the list indexes (SQLite's planner needs none for these)
	if (dialect === 'pg') await getOpened().pool!.query('analyze analysis');
	return project.id;
}

function median(xs: number[]) {
	const s = [...xs].sort((a, b) => a - b);
	return s[Math.floor(s.length / 2)];
}

async function time(work: () => Promise<unknown>) {
	await work(); // warm
	const ms: number[] = [];
	for (let i = 0; i < ROUNDS; i++) {
		const t = performance.now();
		await work();
		ms.push(performance.now() - t);
	}
	return median(ms);
}

await dbReady(); // migrated (at once on SQLite; PostgreSQL migrates on open)
const rows: string[][] = [];
const { actor: owner, workshopId } = await actor();
for (const n of [200, 10_000]) {
	const projectId = await projectWith(owner, workshopId, n);
	const base: Query = { q: '', sort: 'updated', dir: 'desc', page: 1, perPage: PER_PAGE };
	const last = Math.ceil(n / PER_PAGE);
	const cases: [string, Query][] = [
		['page 1, newest first', base],
		[`page ${last} (the last)`, { ...base, page: last }],
		['page 1 by name', { ...base, sort: 'name', dir: 'asc' }],
		[`page ${last} by name`, { ...base, sort: 'name', dir: 'asc', page: last }],
		['failing only, page 1', { ...base, pass: 'fail' }],
		['search "upper" (a third of them)', { ...base, q: 'upper' }],
		['search "ay 12" (a few)', { ...base, q: 'ay 12' }],
		['search "12" (two letters: no index)', { ...base, q: '12' }]
	];
	for (const [label, query] of cases) {
		if (process.env.BENCH_LIST_EXPLAIN && dialect === 'pg') {
			// BENCH_LIST_EXPLAIN=1: the plan of each page's query, to see which index it reads
			const { sql: text, params } = analysisPage(projectId, query).page.toSQL();
			const plan = await getOpened().pool!.query(`explain ${text}`, params);
			console.log(`\n${label} at ${n}:\n  ${plan.rows.map((r) => r['QUERY PLAN']).join('\n  ')}`);
		}
		const ms = await time(() => listAnalyses(owner, projectId, query));
		rows.push([`list at ${n.toLocaleString('en')}: ${label}`, ms.toFixed(2), `< ${GOAL_MS}`]);
	}
	let k = 0;
	const save = await time(() =>
		createAnalysis(owner, projectId, { kind: 'shelf', name: `Added ${k++}`, input: SHELF })
	);
	rows.push([`save one shelf into ${n.toLocaleString('en')}`, save.toFixed(2), '(no goal)']);
}

const engine = process.env.DATABASE_URL?.startsWith('postgres') ? 'PostgreSQL' : 'SQLite';
console.log(`\nAnalyses list (${engine}, median of ${ROUNDS}, ms)`);
const width = Math.max(...rows.map((r) => r[0].length));
for (const [label, ms, goal] of rows)
	console.log(`  ${label.padEnd(width)}  ${ms.padStart(8)}  goal ${goal}`);
await closeDb();
rmSync(work, { recursive: true, force: true });
