// The same tables for PostgreSQL: every table, column name, key, foreign key and index of
// schema.ts (SQLite), which tests/server/schema-parity.test.ts proves. Stored values mean the same:
// instants are JS Dates (timestamptz to the millisecond), booleans are booleans, and JSON columns are
// `json` (not jsonb), which keeps the text as written: its key order and digits.
import {
	bigint,
	boolean,
	index,
	integer,
	json,
	pgTable,
	primaryKey,
	text,
	timestamp,
	uniqueIndex
} from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { ANALYSIS_KINDS } from '../../kinds/names';
import { DOCUMENT_TYPES, ROLES } from './schema';

const instant = (name: string) =>
	timestamp(name, { mode: 'date', precision: 3, withTimezone: true });

const id = () =>
	text('id')
		.primaryKey()
		.$defaultFn(() => crypto.randomUUID());
const createdAt = () =>
	instant('created_at')
		.notNull()
		.$defaultFn(() => new Date());

// ---- Auth.js tables (shape required by @auth/drizzle-adapter), plus our password hash ----
export const users = pgTable('user', {
	id: id(),
	name: text('name'),
	email: text('email').unique(),
	emailVerified: instant('emailVerified'),
	image: text('image'),
	passwordHash: text('password_hash'),
	// 'frac32' | 'frac16' | 'frac64' | 'decimal-in' | 'mm'
	lengthUnit: text('length_unit').notNull().default('frac16'),
	currentWorkshopId: text('current_workshop_id'),
	// sessions issued before this instant are no longer honoured (a password reset, signing out everywhere)
	sessionsValidFrom: instant('sessions_valid_from'),
	createdAt: createdAt()
});

export const accounts = pgTable(
	'account',
	{
		userId: text('userId')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		type: text('type').notNull(),
		provider: text('provider').notNull(),
		providerAccountId: text('providerAccountId').notNull(),
		refresh_token: text('refresh_token'),
		access_token: text('access_token'),
		expires_at: integer('expires_at'),
		token_type: text('token_type'),
		scope: text('scope'),
		id_token: text('id_token'),
		session_state: text('session_state')
	},
	(t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })]
);

export const sessions = pgTable('session', {
	sessionToken: text('sessionToken').primaryKey(),
	userId: text('userId')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	expires: instant('expires').notNull()
});

/**
 * Sessions ended by signing out while their cookie would still be valid: a copied cookie stops
 * working. Kept until the session would have expired anyway.
 */
export const endedSessions = pgTable('ended_session', {
	id: text('id').primaryKey(),
	expiresAt: instant('expires_at').notNull()
});

/**
 * Request counts of the open compute routes per client address (rate-limiter-flexible's PostgreSQL
 * store; its shape is the library's). In the database, so several app instances share the counts.
 */
export const rateLimits = pgTable('rate_limit', {
	key: text('key').primaryKey(),
	points: integer('points').notNull().default(0),
	expire: bigint('expire', { mode: 'number' })
});

export const verificationTokens = pgTable(
	'verificationToken',
	{
		identifier: text('identifier').notNull(),
		token: text('token').notNull(),
		expires: instant('expires').notNull()
	},
	(t) => [primaryKey({ columns: [t.identifier, t.token] })]
);

// ---- Spanwright ----
export const workshops = pgTable('workshop', {
	id: id(),
	name: text('name').notNull(),
	personal: boolean('personal').notNull().default(false),
	// a class: its owner may give members the student role (src/lib/server/access.ts)
	isClass: boolean('is_class').notNull().default(false),
	createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
	createdAt: createdAt()
});

export const memberships = pgTable(
	'membership',
	{
		userId: text('user_id')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		workshopId: text('workshop_id')
			.notNull()
			.references(() => workshops.id, { onDelete: 'cascade' }),
		role: text('role', { enum: ROLES }).notNull(),
		createdAt: createdAt()
	},
	(t) => [
		primaryKey({ columns: [t.userId, t.workshopId] }),
		index('membership_workshop').on(t.workshopId)
	]
);

export const invitations = pgTable(
	'invitation',
	{
		id: id(),
		workshopId: text('workshop_id')
			.notNull()
			.references(() => workshops.id, { onDelete: 'cascade' }),
		email: text('email').notNull(),
		role: text('role', { enum: ROLES }).notNull(),
		// sha-256 of the token sent by mail; the token itself is never stored
		tokenHash: text('token_hash').notNull().unique(),
		invitedBy: text('invited_by').references(() => users.id, { onDelete: 'set null' }),
		expiresAt: instant('expires_at').notNull(),
		acceptedAt: instant('accepted_at'),
		createdAt: createdAt()
	},
	(t) => [index('invitation_workshop').on(t.workshopId)]
);

export const projects = pgTable(
	'project',
	{
		id: id(),
		workshopId: text('workshop_id')
			.notNull()
			.references(() => workshops.id, { onDelete: 'cascade' }),
		name: text('name').notNull(),
		client: text('client').notNull().default(''),
		siteNotes: text('site_notes').notNull().default(''),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: instant('updated_at')
			.notNull()
			.$defaultFn(() => new Date())
	},
	(t) => [index('project_workshop').on(t.workshopId)]
);

export const apiTokens = pgTable('api_token', {
	id: id(),
	userId: text('user_id')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	name: text('name').notNull(),
	// sha-256 of the secret; the secret is shown once at creation
	tokenHash: text('token_hash').notNull().unique(),
	prefix: text('prefix').notNull(),
	lastUsedAt: instant('last_used_at'),
	revokedAt: instant('revoked_at'),
	createdAt: createdAt()
});

export const passwordResets = pgTable('password_reset', {
	tokenHash: text('token_hash').primaryKey(),
	userId: text('user_id')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	expiresAt: instant('expires_at').notNull(),
	usedAt: instant('used_at')
});

// Failed sign-ins by key (an e-mail or a client address), for slowing and refusing guessing.
export const signInFailures = pgTable(
	'sign_in_failure',
	{
		key: text('key').notNull(),
		at: instant('at').notNull()
	},
	(t) => [index('sign_in_failure_key_at').on(t.key, t.at)]
);

// ---- Analyses (workbench): inputs, results, engine version, revisions ----

export const analyses = pgTable(
	'analysis',
	{
		id: id(),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		kind: text('kind', { enum: ANALYSIS_KINDS }).notNull(),
		name: text('name').notNull(),
		input: json('input').notNull(),
		result: json('result'),
		summary: text('summary').notNull().default(''),
		pass: boolean('pass'),
		engineVersion: text('engine_version').notNull(),
		version: integer('version').notNull().default(1),
		deletedAt: instant('deleted_at'),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		updatedBy: text('updated_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: instant('updated_at')
			.notNull()
			.$defaultFn(() => new Date())
	},
	(t) => {
		// the same list indexes as SQLite's (schema.ts): every sort key and filter of the list, each
		// column in the order the list's ORDER BY names it (analyses.ts, sortOrder: a column going up
		// puts nulls first, going down last; then updated_at going down and id going up), since
		// PostgreSQL reads an index in place of a sort only when the nulls' places agree too. A list
		// the other way reads the index backwards and sorts only the rows of equal sort key.
		const live = sql`${t.deletedAt} is null`;
		// made afresh for each index: an index takes a column's order and resets it
		const newest = () => [t.updatedAt.desc().nullsLast(), t.id.asc()] as const;
		const ties = () => [t.updatedAt.desc().nullsFirst(), t.id.asc()] as const;
		return [
			index('analysis_project').on(t.projectId),
			index('analysis_list_updated')
				.on(t.projectId, ...newest(), t.kind, t.pass, t.deletedAt)
				.where(live),
			index('analysis_list_created')
				.on(t.projectId, t.createdAt.desc().nullsLast(), ...ties(), t.kind, t.pass, t.deletedAt)
				.where(live),
			index('analysis_list_name')
				.on(t.projectId, sql`lower(${t.name}) nulls first`, ...ties(), t.kind, t.pass, t.deletedAt)
				.where(live),
			// filtered by kind (or verdict) the list is newest first; sorted by it, the index gives
			// the kinds in order and the rows of one kind are sorted
			index('analysis_list_kind')
				.on(t.projectId, t.kind.asc().nullsFirst(), ...newest(), t.pass, t.deletedAt)
				.where(live),
			index('analysis_list_pass')
				.on(t.projectId, t.pass.asc().nullsFirst(), ...newest(), t.kind, t.deletedAt)
				.where(live)
		];
	}
);

export const analysisRevisions = pgTable(
	'analysis_revision',
	{
		id: id(),
		analysisId: text('analysis_id')
			.notNull()
			.references(() => analyses.id, { onDelete: 'cascade' }),
		version: integer('version').notNull(),
		name: text('name').notNull(),
		input: json('input').notNull(),
		result: json('result'),
		engineVersion: text('engine_version').notNull(),
		changedBy: text('changed_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(t) => [uniqueIndex('analysis_revision_version').on(t.analysisId, t.version)]
);

// ---- Project documents: drawings, site photos and measurements ----

export const documents = pgTable(
	'document',
	{
		id: id(),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		// optionally about one analysis of the same project
		analysisId: text('analysis_id').references(() => analyses.id, { onDelete: 'set null' }),
		// the uploaded file's own name, cleaned; shown and offered on download, never a path
		name: text('name').notNull(),
		caption: text('caption').notNull().default(''),
		// decided from the file's bytes, never from its name or the browser's claim
		contentType: text('content_type', { enum: DOCUMENT_TYPES }).notNull(),
		bytes: integer('bytes').notNull(),
		width: integer('width'),
		height: integer('height'),
		// random keys in the file store
		fileKey: text('file_key').notNull(),
		thumbKey: text('thumb_key'),
		// shown in the client's record
		inRecord: boolean('in_record').notNull().default(false),
		deletedAt: instant('deleted_at'),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(t) => [index('document_project').on(t.projectId, t.createdAt)]
);

// ---- The client's side: access to single projects, share links, records sent ----

/** A person (a client or an installer) who may read one project of a workshop they do not belong to. */
export const projectAccess = pgTable(
	'project_access',
	{
		userId: text('user_id')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		grantedBy: text('granted_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(t) => [
		primaryKey({ columns: [t.userId, t.projectId] }),
		index('project_access_project').on(t.projectId)
	]
);

export const projectInvitations = pgTable(
	'project_invitation',
	{
		id: id(),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		email: text('email').notNull(),
		// sha-256 of the token sent by mail; the token itself is never stored
		tokenHash: text('token_hash').notNull().unique(),
		invitedBy: text('invited_by').references(() => users.id, { onDelete: 'set null' }),
		expiresAt: instant('expires_at').notNull(),
		acceptedAt: instant('accepted_at'),
		createdAt: createdAt()
	},
	(t) => [index('project_invitation_project').on(t.projectId)]
);

/** A read-only link to a project's record (or one analysis's), for someone without an account. */
export const shareLinks = pgTable(
	'share_link',
	{
		id: id(),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		analysisId: text('analysis_id').references(() => analyses.id, { onDelete: 'cascade' }),
		// sha-256 of the token in the link; the token itself is never stored
		tokenHash: text('token_hash').notNull().unique(),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		expiresAt: instant('expires_at').notNull(),
		revokedAt: instant('revoked_at'),
		createdAt: createdAt()
	},
	(t) => [index('share_link_project').on(t.projectId)]
);

/** A record sent by e-mail: when, to whom, by whom, and whether the mail server took it. */
export const recordSends = pgTable(
	'record_send',
	{
		id: id(),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		analysisId: text('analysis_id').references(() => analyses.id, { onDelete: 'set null' }),
		to: text('to').notNull(),
		sentBy: text('sent_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(t) => [index('record_send_project').on(t.projectId)]
);

// ---- Class sessions: a teacher's live question to a class; nothing here outlives the session ----

/**
 * A session a signed-in teacher runs from one of the lab's experiments. Students join with the
 * short code; the row (and with it every seat and answer) is deleted when the teacher ends it or
 * once `expiresAt` has passed.
 */
export const classSessions = pgTable(
	'class_session',
	{
		id: id(),
		// six letters and digits a student types (see src/lib/schemas/class-session.ts)
		code: text('code').notNull().unique(),
		hostId: text('host_id')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		experimentId: text('experiment_id').notNull(),
		// the experiment's step on the screen (0-based)
		step: integer('step').notNull().default(0),
		revealed: boolean('revealed').notNull().default(false),
		expiresAt: instant('expires_at').notNull(),
		createdAt: createdAt()
	},
	(t) => [index('class_session_host').on(t.hostId), index('class_session_expires').on(t.expiresAt)]
);

/** A student in a session: a nickname and the hash of the seat token their phone keeps. */
export const classSeats = pgTable(
	'class_seat',
	{
		id: id(),
		sessionId: text('session_id')
			.notNull()
			.references(() => classSessions.id, { onDelete: 'cascade' }),
		nickname: text('nickname').notNull(),
		// the nickname folded to lower case: two students cannot both be "Sam"
		nicknameKey: text('nickname_key').notNull(),
		// sha-256 of the seat token; the token itself is never stored
		tokenHash: text('token_hash').notNull().unique(),
		createdAt: createdAt()
	},
	(t) => [uniqueIndex('class_seat_nickname').on(t.sessionId, t.nicknameKey)]
);

/** One student's answer to one step's question (changed freely until the answer is revealed). */
export const classAnswers = pgTable(
	'class_answer',
	{
		seatId: text('seat_id')
			.notNull()
			.references(() => classSeats.id, { onDelete: 'cascade' }),
		sessionId: text('session_id')
			.notNull()
			.references(() => classSessions.id, { onDelete: 'cascade' }),
		step: integer('step').notNull(),
		choice: text('choice').notNull(),
		answeredAt: instant('answered_at').notNull()
	},
	(t) => [
		primaryKey({ columns: [t.seatId, t.step] }),
		index('class_answer_session').on(t.sessionId, t.step)
	]
);
