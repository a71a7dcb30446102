/**
 * Copy a shop's database from one engine to the other (SQLite → PostgreSQL, or back), then check it:
 * every table's rows counted on both sides and every row compared. The target must be
 * empty (freshly migrated); nothing is changed in the source. Used by `npm run db:copy`
 * (src/lib/server/cli/copy-db.ts).
 */
import { count, getTableName, type Table } from 'drizzle-orm';
import { SQLiteTable } from 'drizzle-orm/sqlite-core';
import * as sqliteSchema from './schema';
import * as pgSchema from './schema-pg';
import { dialectOf, sameShape, type Dialect } from './dialect';
import { openDb, openPgDb, type Db, type Opened } from './index';

type Tables = typeof sqliteSchema;
type TableName = {
	[K in keyof Tables]: Tables[K] extends SQLiteTable ? K : never;
}[keyof Tables];

/** Every table, parents before the tables whose foreign keys point at them. */
export const COPY_ORDER: TableName[] = [
	'users',
	'accounts',
	'sessions',
	'endedSessions',
	'rateLimits',
	'verificationTokens',
	'workshops',
	'memberships',
	'invitations',
	'projects',
	'apiTokens',
	'passwordResets',
	'signInFailures',
	'analyses',
	'analysisRevisions',
	'documents',
	'projectAccess',
	'projectInvitations',
	'shareLinks',
	'recordSends',
	'classSessions',
	'classSeats',
	'classAnswers'
];

export interface Side {
	dialect: Dialect;
	opened: Opened;
}

/** Open one side from a PostgreSQL URL or a SQLite file path, migrated. */
export async function openSide(where: string): Promise<Side> {
	const dialect = dialectOf(where);
	const opened = dialect === 'pg' ? openPgDb(where) : openDb(where.replace(/^sqlite:/, ''));
	await opened.ready;
	return { dialect, opened };
}

// the tables of one side's engine (this script, like tables.ts, reads both schemas)
function tablesOf(dialect: Dialect): Tables {
	return dialect === 'pg' ? sameShape<Tables>(pgSchema) : sqliteSchema;
}

const BATCH = 200;

interface TableCheck {
	table: string;
	source: number;
	target: number;
	compared: number;
	differences: string[];
}

/** A row as plain, comparable text: Dates as their instant, everything else as JSON reads it. */
function comparable(row: Record<string, unknown>) {
	const out: Record<string, unknown> = {};
	for (const key of Object.keys(row).sort()) {
		const v = row[key];
		out[key] = v instanceof Date ? `date:${v.toISOString()}` : v;
	}
	return JSON.stringify(out);
}

async function rowsOf(db: Db, table: Table) {
	return (await db.select().from(table as SQLiteTable)) as Record<string, unknown>[];
}

async function countOf(db: Db, table: Table) {
	const [row] = await db.select({ n: count() }).from(table as SQLiteTable);
	return row.n;
}

/** Copy every table from `from` into the empty `to`. */
export async function copyTables(from: Side, to: Side) {
	const source = tablesOf(from.dialect);
	const target = tablesOf(to.dialect);
	for (const name of COPY_ORDER) {
		if ((await countOf(to.opened.db, target[name])) > 0)
			throw new Error(
				`The target's ${getTableName(target[name])} table is not empty; copy into a new database.`
			);
	}
	await to.opened.db.transaction(async (tx) => {
		for (const name of COPY_ORDER) {
			const rows = await rowsOf(from.opened.db, source[name]);
			for (let i = 0; i < rows.length; i += BATCH)
				await tx.insert(target[name] as SQLiteTable).values(rows.slice(i, i + BATCH));
		}
	});
}

/** Count every table on both sides and compare every row (both sides' rows sorted as text). */
export async function checkCopy(from: Side, to: Side): Promise<TableCheck[]> {
	const source = tablesOf(from.dialect);
	const target = tablesOf(to.dialect);
	const checks: TableCheck[] = [];
	for (const name of COPY_ORDER) {
		const a = (await rowsOf(from.opened.db, source[name])).map(comparable).sort();
		const b = (await rowsOf(to.opened.db, target[name])).map(comparable).sort();
		const inB = new Set(b);
		const inA = new Set(a);
		const differences = [
			...a.filter((r) => !inB.has(r)).map((r) => `only in the source: ${r}`),
			...b.filter((r) => !inA.has(r)).map((r) => `only in the copy: ${r}`)
		];
		checks.push({
			table: getTableName(sqliteSchema[name]),
			source: a.length,
			target: b.length,
			compared: a.length,
			differences: differences.slice(0, 5)
		});
	}
	return checks;
}
