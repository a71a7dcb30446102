import { or, sql, type SQL } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';

/** Escape SQL LIKE's wildcards (`%`, `_`) and the escape character itself (`\`). */
export function escapeLike(text: string) {
	return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/**
 * "Any of these columns contains the text", with what the user typed taken literally: `50%` finds
 * "50% off", not everything starting with 50. SQLite's LIKE has no escape character unless it is
 * named, so every pattern says `escape '\'`. (LIKE is case-insensitive for ASCII in SQLite.)
 */
export function containsText(columns: (SQLiteColumn | SQL)[], text: string): SQL {
	const pattern = `%${escapeLike(text)}%`;
	return or(...columns.map((c) => sql`${c} like ${pattern} escape '\\'`))!;
}
