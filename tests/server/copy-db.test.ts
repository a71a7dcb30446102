// The copy script's round trip: a shop's database (the demo scenario, with its saved analyses) copied
// from one engine to the other and back is the same, table by table and row by row. It needs both
// engines, so it runs under `npm run test:pg` (on SQLite alone it is skipped).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { dialect, getOpened } from '../../src/lib/server/db';
import {
	checkCopy,
	copyTables,
	COPY_ORDER,
	openSide,
	type Side
} from '../../src/lib/server/db/copy';
import { seedDemo } from '../../src/lib/server/demo/seed';
import { makePgDatabase, useTempDb } from './support/db';

useTempDb();

const cleanups: (() => Promise<void>)[] = [];
afterAll(async () => {
	for (const c of cleanups.reverse()) await c();
});

describe.skipIf(dialect !== 'pg')('copying a database between the engines', () => {
	it('copies PostgreSQL into SQLite and back, every table counted and every row alike', async () => {
		await seedDemo();
		const original: Side = { dialect: 'pg', opened: getOpened() };

		const dir = mkdtempSync(join(tmpdir(), 'spanwright-copy-'));
		cleanups.push(async () => rmSync(dir, { recursive: true, force: true }));
		const file = await openSide(join(dir, 'shop.db'));
		cleanups.push(() => file.opened.close());
		await copyTables(original, file);

		const made = await makePgDatabase(process.env.DATABASE_URL!);
		cleanups.push(made.drop);
		const back = await openSide(made.url);
		cleanups.push(() => back.opened.close());
		await copyTables(file, back);

		for (const [a, b] of [
			[original, file],
			[file, back],
			[original, back]
		]) {
			const checks = await checkCopy(a, b);
			expect(checks).toHaveLength(COPY_ORDER.length);
			for (const c of checks) {
				expect(c.differences, c.table).toEqual([]);
				expect(c.target, c.table).toBe(c.source);
			}
		}
		const rows = Object.fromEntries(
			(await checkCopy(original, back)).map((c) => [c.table, c.source])
		);
		// the demo scenario's own numbers (src/lib/server/demo): its accounts, its workshop's projects and
		// the analyses saved in them all crossed
		expect(rows.user).toBeGreaterThanOrEqual(4);
		expect(rows.project).toBeGreaterThanOrEqual(3);
		expect(rows.analysis).toBeGreaterThan(0);
		expect(rows.analysis_revision).toBeGreaterThanOrEqual(rows.analysis);
	});

	it('refuses to copy into a database that already holds rows', async () => {
		const original: Side = { dialect: 'pg', opened: getOpened() };
		await expect(copyTables(original, original)).rejects.toThrow(/not empty/);
	});
});
