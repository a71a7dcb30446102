import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll } from 'vitest';
import { dialect, openDb, openPgDb, useDb, type Opened } from '../../../src/lib/server/db';

/**
 * Give this test file its own database for its whole run, migrated: a temporary SQLite file, or,
 * when DATABASE_URL names PostgreSQL (tests/support/with-postgres.sh), a database of its own made
 * from a migrated template database and dropped afterwards.
 */
export function useTempDb() {
	let opened: Opened | undefined;
	let drop = async () => {};
	beforeAll(async () => {
		if (dialect === 'pg') {
			const made = await makePgDatabase(process.env.DATABASE_URL!);
			opened = openPgDb(made.url);
			drop = made.drop;
		} else {
			const dir = mkdtempSync(join(tmpdir(), 'spanwright-test-'));
			opened = openDb(join(dir, 'test.db'));
			drop = async () => rmSync(dir, { recursive: true, force: true });
		}
		await opened.ready;
		useDb(opened);
	});
	afterAll(async () => {
		useDb(undefined);
		await opened?.close();
		await drop();
	});
	return () => opened!;
}

// any number; the test files of one run take turns making their databases with it
const TEMPLATE_LOCK = 7_421_002;

function withDatabase(url: string, database: string) {
	const u = new URL(url);
	u.pathname = `/${database}`;
	return u.toString();
}

/**
 * A new PostgreSQL database for one test file, copied from `<name>_template` (migrated here first,
 * once per run and again whenever a migration was added), on the server DATABASE_URL names.
 */
export async function makePgDatabase(url: string) {
	const base = decodeURIComponent(new URL(url).pathname.slice(1)) || 'spanwright';
	const template = `${base}_template`;
	const name = `${base}_t${process.pid}_${Math.random().toString(36).slice(2, 8)}`;
	const admin = new pg.Client({ connectionString: withDatabase(url, 'postgres') });
	await admin.connect();
	try {
		await admin.query('select pg_advisory_lock($1)', [TEMPLATE_LOCK]);
		const { rowCount } = await admin.query('select 1 from pg_database where datname = $1', [
			template
		]);
		if (!rowCount) await admin.query(`create database "${template}"`);
		const migrating = openPgDb(withDatabase(url, template));
		try {
			await migrating.ready;
		} finally {
			await migrating.close();
		}
		await admin.query(`create database "${name}" template "${template}"`);
	} finally {
		await admin.query('select pg_advisory_unlock($1)', [TEMPLATE_LOCK]).catch(() => {});
		await admin.end();
	}
	return {
		url: withDatabase(url, name),
		async drop() {
			const client = new pg.Client({ connectionString: withDatabase(url, 'postgres') });
			await client.connect();
			try {
				await client.query(`drop database if exists "${name}" with (force)`);
			} finally {
				await client.end();
			}
		}
	};
}
