import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { openDb, useDb } from '../../../src/lib/server/db';

/** Give this test file its own temporary SQLite database file, migrated, for its whole run. */
export function useTempDb() {
	let dir = '';
	let opened: ReturnType<typeof openDb> | undefined;
	beforeAll(() => {
		dir = mkdtempSync(join(tmpdir(), 'spanwright-test-'));
		opened = openDb(join(dir, 'test.db'));
		useDb(opened);
	});
	afterAll(() => {
		useDb(undefined);
		opened?.sqlite.close();
		rmSync(dir, { recursive: true, force: true });
	});
	return () => opened!;
}
