import {
	RateLimiterMemory,
	RateLimiterPostgres,
	RateLimiterRes,
	RateLimiterSQLite
} from 'rate-limiter-flexible';
import type Database from 'better-sqlite3';
import { getOpened, type Opened } from './db';
import { problem } from './http';

/**
 * The open compute routes (/shelf*, /joints, /stability, /cases/check) are free to call without an
 * account, so each client address gets a budget: COMPUTE_REQUESTS per COMPUTE_WINDOW_S seconds.
 * On PostgreSQL it is counted in the database (the `rate_limit` table) so that several app servers
 * share it; on SQLite, where one server owns the database file, in that server's memory (the same
 * counts without a write per request). Common practice, no source: generous for a person or a
 * script, small for a flood.
 */
export const COMPUTE_REQUESTS = 120;
export const COMPUTE_WINDOW_S = 60;

/** A budget: so many points per so many seconds, counted per key under its own prefix. */
export interface Budget {
	prefix: string;
	points: number;
	seconds: number;
	/** counted on every request of a hot path: on SQLite in the server's memory, not the table */
	perRequest?: boolean;
}

export const COMPUTE_BUDGET: Budget = {
	prefix: 'compute',
	points: COMPUTE_REQUESTS,
	seconds: COMPUTE_WINDOW_S,
	perRequest: true
};

type Limiter = RateLimiterSQLite | RateLimiterPostgres | RateLimiterMemory;
let current: { opened: Opened; limiters: Map<string, Limiter> } | undefined;

/**
 * The connection as the limiter sees it: the same database, but each statement it prepares is
 * prepared once and kept (better-sqlite3 has no statement cache, and the limiter prepares its upsert
 * on every call, which cost more than the upsert itself).
 */
function keepingStatements(db: Database.Database): Database.Database {
	const kept = new Map<string, Database.Statement>();
	const prepare = (sql: string) => {
		let statement = kept.get(sql);
		if (!statement) kept.set(sql, (statement = db.prepare(sql)));
		return statement;
	};
	return new Proxy(db, {
		get(target, name) {
			if (name === 'prepare') return prepare;
			const value = Reflect.get(target, name, target);
			return typeof value === 'function' ? value.bind(target) : value;
		}
	});
}

const sqliteClients = new WeakMap<Database.Database, Database.Database>();

/**
 * The limiter of one budget, made once per database: over the `rate_limit` table, the library's
 * SQLite store on the SQLite connection, its PostgreSQL store (named prepared statements) on the
 * pool, so every app server on one PostgreSQL database counts against the same rows.
 *
 * A per-request budget (the compute routes) is counted differently: on SQLite in this process's
 * memory, which is the same count since only one server opens the file (a restart starts the
 * window afresh); on PostgreSQL in the table as above, but an address already over its budget is
 * refused from memory until that window ends, with the wait the table gave, instead of asking
 * the database again on every refused request.
 */
export function limiterFor(budget: Budget): Limiter {
	const opened = getOpened();
	if (current?.opened !== opened) current = { opened, limiters: new Map() };
	let limiter = current.limiters.get(budget.prefix);
	if (!limiter) {
		const options = {
			tableName: 'rate_limit',
			tableCreated: true, // by the migrations
			clearExpiredByTimeout: true,
			keyPrefix: budget.prefix,
			points: budget.points,
			duration: budget.seconds
		};
		if (opened.pool) {
			limiter = new RateLimiterPostgres({
				...options,
				storeClient: opened.pool,
				storeType: 'pool',
				// refused from memory after the first refusal the table gives, until its window ends
				...(budget.perRequest ? { inMemoryBlockOnConsumed: budget.points + 1 } : {})
			});
		} else if (budget.perRequest) {
			limiter = new RateLimiterMemory({
				keyPrefix: budget.prefix,
				points: budget.points,
				duration: budget.seconds
			});
		} else {
			const db = opened.sqlite!;
			let client = sqliteClients.get(db);
			if (!client) sqliteClients.set(db, (client = keepingStatements(db)));
			limiter = new RateLimiterSQLite({
				...options,
				storeClient: client,
				storeType: 'better-sqlite3'
			});
		}
		current.limiters.set(budget.prefix, limiter);
	}
	return limiter;
}

/** The 429 answer, with Retry-After in whole seconds. */
export function tooMany(message: (seconds: number) => string, msBeforeNext: number) {
	const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
	const res = problem(429, message(seconds));
	res.headers.set('Retry-After', String(seconds));
	return res;
}

/**
 * Count one request against a budget. Null when it may go ahead; otherwise the 429 answer.
 */
export async function consume(
	budget: Budget,
	key: string,
	message: (seconds: number) => string
): Promise<Response | null> {
	try {
		await limiterFor(budget).consume(key);
		return null;
	} catch (e) {
		if (!(e instanceof RateLimiterRes)) throw e;
		return tooMany(message, e.msBeforeNext);
	}
}

/**
 * Count one compute request from this address. Null when it may go ahead; otherwise the 429
 * answer, with Retry-After in whole seconds.
 */
export function limitCompute(address: string): Promise<Response | null> {
	return consume(
		COMPUTE_BUDGET,
		address,
		(seconds) =>
			`Too many calculations from your address: at most ${COMPUTE_REQUESTS} a minute. Try again in ${seconds} s.`
	);
}
