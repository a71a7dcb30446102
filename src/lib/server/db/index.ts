import Database from 'better-sqlite3';
import { drizzle as drizzleSync } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { drizzle, type SqliteRemoteDatabase } from 'drizzle-orm/sqlite-proxy';
import { sql } from 'drizzle-orm';
import { AsyncLocalStorage } from 'node:async_hooks';
import { existsSync, mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as schema from './schema';

/**
 * The app's database, as every data module sees it: query builders that are awaited. On SQLite the
 * statements run on one better-sqlite3 connection (synchronous underneath) through an asynchronous
 * driver, so the same module code also runs on a network database.
 */
export type Db = SqliteRemoteDatabase<typeof schema>;

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

// ---- one writer at a time on the single SQLite connection ----
//
// A transaction on SQLite is BEGIN … COMMIT on the one connection every request shares. While it is
// open, a statement of another request would land inside it (and be rolled back with it), so
// statements from outside the open transaction wait until it ends. Which transaction a statement
// belongs to is carried by AsyncLocalStorage through the transaction's awaits.
interface OpenTransaction {
	tx: Db;
	done?: boolean;
}
const inTransaction = new AsyncLocalStorage<OpenTransaction>();
let holder: OpenTransaction | null = null;
let ended: Promise<void> = Promise.resolve();

async function waitOutsideTransaction() {
	while (holder !== null && inTransaction.getStore() !== holder) await ended;
}

type Row = unknown[];
function runner(sqlite: Database.Database) {
	return async (query: string, params: unknown[], method: 'run' | 'all' | 'values' | 'get') => {
		if (holder !== null) await waitOutsideTransaction();
		const statement = sqlite.prepare(query);
		if (!statement.reader) {
			const { changes } = statement.run(...params);
			return { rows: [] as Row[], changes };
		}
		statement.raw(true);
		if (method === 'get') return { rows: statement.get(...params) as Row };
		if (method === 'run') {
			statement.all(...params);
			return { rows: [] as Row[] };
		}
		return { rows: statement.all(...params) as Row[] };
	};
}

export interface Opened {
	db: Db;
	sqlite: Database.Database;
}

/** Open a SQLite database with the settings every connection here uses, and apply migrations. */
export function openDb(file: string): Opened {
	if (file !== ':memory:') mkdirSync(dirname(file), { recursive: true });
	const sqlite = new Database(file);
	sqlite.pragma('journal_mode = WAL');
	sqlite.pragma('foreign_keys = ON');
	sqlite.pragma('busy_timeout = 5000');
	sqlite.pragma('synchronous = NORMAL');
	migrate(drizzleSync(sqlite), { migrationsFolder: migrationsDir });
	const db = drizzle(runner(sqlite), { schema });
	return { db, sqlite };
}

let opened: Opened | undefined;

/**
 * The app's database, opened lazily so that `vite build` never creates a stray file. Inside
 * transaction(), the transaction's own handle: whatever the work calls is part of it.
 */
export function getDb(): Db {
	const open = inTransaction.getStore();
	if (open && !open.done) return open.tx;
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
export function useDb(next: Opened | undefined) {
	const previous = opened;
	opened = next;
	return previous;
}

/**
 * Run `work` as one transaction: all of it is kept, or (when it throws) none of it. `tx` is the
 * handle to query with inside. A transaction begun inside another is part of the outer one.
 */
export async function transaction<T>(work: (tx: Db) => Promise<T>): Promise<T> {
	const mine = inTransaction.getStore();
	if (mine !== undefined && mine === holder) return work(mine.tx);
	const db = getDb();
	// wait for the open transaction (and any queued before this one) to end
	let release!: () => void;
	const previous = ended;
	const done = new Promise<void>((r) => (release = r));
	ended = previous.then(() => done);
	await previous;
	const open: OpenTransaction = { tx: db };
	holder = open;
	try {
		return await inTransaction.run(open, () =>
			db.transaction(
				(tx) => {
					open.tx = tx as unknown as Db;
					return work(open.tx);
				},
				{ behavior: 'immediate' }
			)
		);
	} finally {
		open.done = true;
		holder = null;
		release();
	}
}

export { schema };

/** The first row of an awaited query, or undefined: `await db.select()…limit(1).then(firstRow)`. */
export function firstRow<T>(rows: T[]): T | undefined {
	return rows[0];
}

/** The one row an insert's `returning()` gives back: `await db.insert(t).values(v).returning().then(oneRow)`. */
export function oneRow<T>(rows: T[]): T {
	if (rows.length !== 1) throw new Error(`Expected one row, got ${rows.length}`);
	return rows[0];
}

/** One round trip to the database (the health check). */
export async function ping() {
	await getDb().run(sql`select 1`);
}

/**
 * Whether an error is a unique or primary key violation, on either engine (the driver's error may be
 * wrapped in Drizzle's, as its cause).
 */
export function isUniqueViolation(e: unknown): boolean {
	for (let err = e, depth = 0; err && typeof err === 'object' && depth < 4; depth++) {
		const code = 'code' in err ? String(err.code) : '';
		if (code.startsWith('SQLITE_CONSTRAINT') || code === '23505') return true;
		err = 'cause' in err ? err.cause : undefined;
	}
	return false;
}
