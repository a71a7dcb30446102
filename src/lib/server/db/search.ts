import { sql, type SQL } from 'drizzle-orm';
import { analyses } from './tables';
import { dialect } from './dialect';
import { containsText } from './contains';

/** The shortest search the trigram index can answer; shorter ones are read row by row. */
const TRIGRAM = 3;

/** FTS5's string literal: the text in double quotes, a double quote doubled. */
function ftsString(text: string) {
	return `"${text.replaceAll('"', '""')}"`;
}

/**
 * "The analysis's name or summary contains the text", case-insensitively and with every character
 * taken literally (`50%` finds "50% off", not everything starting with 50): the one search of the
 * analyses list. On SQLite, three characters or more are looked up in the FTS5 trigram index
 * (migration 0008, analysis_search over analysis_text); fewer fall back to LIKE over the small
 * analysis_text table, never over the analyses with their large input and result. On PostgreSQL,
 * ILIKE with the same escaping over the analysis's own name and summary, answered by a pg_trgm
 * trigram index (drizzle/pg, analysis_search_trgm) for three characters or more: the same rows.
 */
export function analysisTextMatches(text: string): SQL {
	if (dialect === 'pg') return containsText([analyses.name, analyses.summary], text);
	if ([...text].length >= TRIGRAM)
		return sql`${analyses.id} in (select t.analysis_id from analysis_search s join analysis_text t on t.row = s.rowid where analysis_search match ${`{name summary}: ${ftsString(text)}`})`;
	return sql`${analyses.id} in (select t.analysis_id from analysis_text t where ${containsText([sql`t.name`, sql`t.summary`], text)})`;
}
