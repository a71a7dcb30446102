/**
 * Which database engine this process uses, decided once at start-up from the environment:
 * `DATABASE_URL=postgres://…` (or `postgresql://…`) is PostgreSQL; anything else, or nothing, is the
 * SQLite file in the data folder.
 */
export type Dialect = 'sqlite' | 'pg';

export function dialectOf(url: string | undefined): Dialect {
	return url && /^postgres(ql)?:\/\//i.test(url) ? 'pg' : 'sqlite';
}

export const dialect: Dialect = dialectOf(process.env.DATABASE_URL);

/**
 * The one cast between the engines. The data modules are written once, against the SQLite schema's
 * and driver's types; on PostgreSQL the pg-core tables (schema-pg.ts) and the node-postgres handle
 * stand in for them. Their query builders take the same calls (select, insert … returning,
 * onConflict…, transaction) and give back the same values (Dates, booleans, parsed JSON): the
 * schemas are proved alike by tests/server/schema-parity.test.ts, and the whole server suite runs on
 * both engines. Only tables.ts and index.ts call this, each once, for the tables and the database
 * (and the copy script, db/copy.ts, which reads both engines at once).
 */
export function sameShape<T>(postgresSide: unknown): T {
	return postgresSide as T;
}
