import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { existsSync, mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as schema from './schema';

export type Db = BetterSQLite3Database<typeof schema>;

// One configured root for data (database, uploads); migrations resolve from the project root,
// never from the caller's working directory.
const projectRoot = resolveProjectRoot();
export const dataDir = resolve(process.env.SPANWRIGHT_DATA_DIR ?? join(projectRoot, 'data'));
export const migrationsDir = resolve(
	process.env.SPANWRIGHT_MIGRATIONS_DIR ?? join(projectRoot, 'drizzle')
);

function resolveProjectRoot(): string {
	// src/lib/server/db/index.ts in dev and tests; build/server/chunks/… once built.
	let dir = dirname(fileURLToPath(import.meta.url));
	for (let i = 0; i < 8; i++) {
		// the folder that holds drizzle/ and package.json is the root
		if (existsSync(join(dir, 'drizzle')) && existsSync(join(dir, 'package.json'))) return dir;
		dir = dirname(dir);
	}
	return process.cwd();
}

/** Open a SQLite database with the settings every connection here uses, and apply migrations. */
export function openDb(file: string): { db: Db; sqlite: Database.Database } {
	if (file !== ':memory:') mkdirSync(dirname(file), { recursive: true });
	const sqlite = new Database(file);
	sqlite.pragma('journal_mode = WAL');
	sqlite.pragma('foreign_keys = ON');
	sqlite.pragma('busy_timeout = 5000');
	sqlite.pragma('synchronous = NORMAL');
	const db = drizzle(sqlite, { schema });
	migrate(db, { migrationsFolder: migrationsDir });
	return { db, sqlite };
}

let opened: { db: Db; sqlite: Database.Database } | undefined;

/** The app's database, opened lazily so that `vite build` never creates a stray file. */
export function getDb(): Db {
	if (!opened) {
		const file = process.env.SPANWRIGHT_DB_FILE ?? join(dataDir, 'spanwright.db');
		opened = openDb(file);
	}
	return opened.db;
}

/** The SQLite connection under getDb(), for libraries that take one (the rate limiter). */
export function getSqlite(): Database.Database {
	getDb();
	return opened!.sqlite;
}

/** For tests: swap in a database (e.g. a temporary file) and get back the one it replaced. */
export function useDb(next: { db: Db; sqlite: Database.Database } | undefined) {
	const previous = opened;
	opened = next;
	return previous;
}

export { schema };
