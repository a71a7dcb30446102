/**
 * The active engine's tables, picked once at start-up: every data module imports its tables from
 * here, never from schema.ts (SQLite) or schema-pg.ts (PostgreSQL) directly, so there is one code path.
 */
import * as sqliteTables from './schema';
import * as pgTables from './schema-pg';
import { dialect, sameShape } from './dialect';

const active = dialect === 'pg' ? sameShape<typeof sqliteTables>(pgTables) : sqliteTables;

export const {
	users,
	accounts,
	sessions,
	endedSessions,
	rateLimits,
	verificationTokens,
	workshops,
	memberships,
	invitations,
	projects,
	apiTokens,
	passwordResets,
	signInFailures,
	analyses,
	analysisRevisions,
	documents,
	projectAccess,
	projectInvitations,
	shareLinks,
	recordSends,
	classSessions,
	classSeats,
	classAnswers
} = active;

export {
	ANALYSIS_KINDS,
	DOCUMENT_TYPES,
	ROLES,
	type AnalysisKind,
	type DocumentType,
	type Role
} from './schema';

/** A second name for a table in one query (e.g. two joins to users): the same proxy in both engines' cores. */
export { alias } from 'drizzle-orm/sqlite-core';
