import { or, sql, type SQL } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';
import { dialect } from './dialect';

/** Escape SQL LIKE's wildcards (`%`, `_`) and the escape character itself (`\`). */
export function escapeLike(text: string) {
	return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

// SQLite's LIKE ignores case (for ASCII); PostgreSQL's ILIKE is the same search there
const like = sql.raw(dialect === 'pg' ? 'ilike' : 'like');

/**
 * "Any of these columns contains the text", with what the user typed taken literally: `50%` finds
 * "50% off", not everything starting with 50. SQLite's LIKE has no escape character unless it is
 * named, so every pattern says `escape '\'` (PostgreSQL's default is the same character; it is
 * named there too). Case is ignored: LIKE in SQLite (ASCII), ILIKE in PostgreSQL.
 */
export function containsText(columns: (SQLiteColumn | SQL)[], text: string): SQL {
	const pattern = `%${escapeLike(text)}%`;
	return or(...columns.map((c) => sql`${c} ${like} ${pattern} escape '\\'`))!;
}
