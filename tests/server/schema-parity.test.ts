// The two schemas cannot drift: schema.ts (SQLite) and schema-pg.ts (PostgreSQL) declare the same
// tables, columns (name, not-null, primary key), keys, foreign keys and indexes, and store the same
// kinds of value (instants as Dates, booleans, JSON as its text).
import { getTableConfig as sqliteConfig, SQLiteTable } from 'drizzle-orm/sqlite-core';
import { getTableConfig as pgConfig, PgTable } from 'drizzle-orm/pg-core';
import { getTableName, is } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import * as sqlite from '../../src/lib/server/db/schema';
import * as postgres from '../../src/lib/server/db/schema-pg';

type Config = ReturnType<typeof sqliteConfig> | ReturnType<typeof pgConfig>;

/** What a table declares, in words both cores share, sorted so that order does not matter. */
function describeTable(c: Config) {
	const nameOf = (col: { name: string }) => col.name;
	return {
		name: c.name,
		columns: c.columns
			.map((col) => ({
				name: col.name,
				notNull: col.notNull,
				primary: col.primary,
				unique: col.isUnique,
				hasDefault: col.hasDefault,
				// what the application reads and writes: string, number, boolean, date, json
				dataType: col.dataType,
				enumValues: col.enumValues ?? null
			}))
			.sort((a, b) => a.name.localeCompare(b.name)),
		primaryKeys: c.primaryKeys.map((k) => k.columns.map(nameOf)).sort(),
		foreignKeys: c.foreignKeys
			.map((fk) => {
				const ref = fk.reference();
				return {
					columns: ref.columns.map(nameOf),
					table: getTableName(ref.foreignTable),
					foreignColumns: ref.foreignColumns.map(nameOf),
					onDelete: fk.onDelete ?? 'no action',
					onUpdate: fk.onUpdate ?? 'no action'
				};
			})
			.sort((a, b) => a.columns.join().localeCompare(b.columns.join())),
		indexes: c.indexes
			.map((i) => ({
				name: i.config.name,
				unique: i.config.unique,
				columns: i.config.columns.map((col) => ('name' in col ? col.name : String(col)))
			}))
			.sort((a, b) => String(a.name).localeCompare(String(b.name))),
		uniques: c.uniqueConstraints.map((u) => u.columns.map(nameOf)).sort()
	};
}

const sqliteTables = Object.values(sqlite as Record<string, unknown>)
	.filter((t): t is SQLiteTable => is(t, SQLiteTable))
	.map((t) => describeTable(sqliteConfig(t)));
const pgTables = Object.values(postgres as Record<string, unknown>)
	.filter((t): t is PgTable => is(t, PgTable))
	.map((t) => describeTable(pgConfig(t)));

describe('the SQLite and PostgreSQL schemas', () => {
	it('declare the same tables, under the same export names', () => {
		const names = (m: object, T: typeof SQLiteTable | typeof PgTable) =>
			Object.entries(m)
				.filter(([, t]) => is(t, T))
				.map(([k]) => k)
				.sort();
		expect(names(postgres, PgTable)).toEqual(names(sqlite, SQLiteTable));
		expect(pgTables.map((t) => t.name).sort()).toEqual(sqliteTables.map((t) => t.name).sort());
		// every table of the app, and not one fewer: a schema that lost a table fails here
		expect(sqliteTables.length).toBe(23);
	});

	for (const table of sqliteTables) {
		it(`declare ${table.name} alike: columns, keys, foreign keys, indexes`, () => {
			const other = pgTables.find((t) => t.name === table.name);
			expect(other).toEqual(table);
		});
	}

	it('store instants as Dates to the millisecond with time zone, and JSON as json (its text kept)', () => {
		for (const t of Object.values(postgres as Record<string, unknown>).filter((t): t is PgTable =>
			is(t, PgTable)
		)) {
			for (const col of pgConfig(t).columns) {
				if (col.dataType === 'date') {
					expect(col.getSQLType(), `${getTableName(t)}.${col.name}`).toBe(
						'timestamp (3) with time zone'
					);
				}
				if (col.dataType === 'json') expect(col.getSQLType()).toBe('json');
			}
		}
		// the JSON columns are the same ones
		const jsonColumns = (tables: ReturnType<typeof describeTable>[]) =>
			tables.flatMap((t) =>
				t.columns.filter((c) => c.dataType === 'json').map((c) => `${t.name}.${c.name}`)
			);
		expect(jsonColumns(pgTables)).toEqual(jsonColumns(sqliteTables));
		expect(jsonColumns(sqliteTables)).toEqual([
			'analysis.input',
			'analysis.result',
			'analysis_revision.input',
			'analysis_revision.result'
		]);
	});
});
