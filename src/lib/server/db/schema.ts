import {
	index,
	integer,
	primaryKey,
	sqliteTable,
	text,
	uniqueIndex
} from 'drizzle-orm/sqlite-core';
import { sql } from 'drizzle-orm';
import { ANALYSIS_KINDS, type AnalysisKind } from '../../kinds/names';

// the kinds of saved analysis are named once, in src/lib/kinds/names.ts
export { ANALYSIS_KINDS, type AnalysisKind };

const id = () =>
	text('id')
		.primaryKey()
		.$defaultFn(() => crypto.randomUUID());
const createdAt = () =>
	integer('created_at', { mode: 'timestamp_ms' })
		.notNull()
		.$defaultFn(() => new Date());

// ---- Auth.js tables (shape required by @auth/drizzle-adapter), plus our password hash ----
export const users = sqliteTable('user', {
	id: id(),
	name: text('name'),
	email: text('email').unique(),
	emailVerified: integer('emailVerified', { mode: 'timestamp_ms' }),
	image: text('image'),
	passwordHash: text('password_hash'),
	// 'frac32' | 'frac16' | 'frac64' | 'decimal-in' | 'mm'
	lengthUnit: text('length_unit').notNull().default('frac16'),
	currentWorkshopId: text('current_workshop_id'),
	// sessions issued before this instant are no longer honoured (a password reset, signing out everywhere)
	sessionsValidFrom: integer('sessions_valid_from', { mode: 'timestamp_ms' }),
	createdAt: createdAt()
});

export const accounts = sqliteTable(
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

export const sessions = sqliteTable('session', {
	sessionToken: text('sessionToken').primaryKey(),
	userId: text('userId')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	expires: integer('expires', { mode: 'timestamp_ms' }).notNull()
});

/**
 * Sessions ended by signing out while their cookie would still be valid: a copied cookie stops
 * working. Kept until the session would have expired anyway.
 */
export const endedSessions = sqliteTable('ended_session', {
	id: text('id').primaryKey(),
	expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull()
});

/**
 * Request counts of the open compute routes per client address (rate-limiter-flexible's SQLite
 * store; its shape is the library's). In the database, so several app instances share the counts.
 */
export const rateLimits = sqliteTable('rate_limit', {
	key: text('key').primaryKey(),
	points: integer('points').notNull().default(0),
	expire: integer('expire')
});

export const verificationTokens = sqliteTable(
	'verificationToken',
	{
		identifier: text('identifier').notNull(),
		token: text('token').notNull(),
		expires: integer('expires', { mode: 'timestamp_ms' }).notNull()
	},
	(t) => [primaryKey({ columns: [t.identifier, t.token] })]
);

// ---- Spanwright ----
export const workshops = sqliteTable('workshop', {
	id: id(),
	name: text('name').notNull(),
	personal: integer('personal', { mode: 'boolean' }).notNull().default(false),
	// a class: its owner may give members the student role (src/lib/server/access.ts)
	isClass: integer('is_class', { mode: 'boolean' }).notNull().default(false),
	createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
	createdAt: createdAt()
});

// a student (only in a class workshop) reads like a viewer, and creates and changes analyses of
// their own in the class's projects, never anyone else's
export const ROLES = ['viewer', 'student', 'editor', 'owner'] as const;
export type Role = (typeof ROLES)[number];

export const memberships = sqliteTable(
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

export const invitations = sqliteTable(
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
		expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
		acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
		createdAt: createdAt()
	},
	(t) => [index('invitation_workshop').on(t.workshopId)]
);

export const projects = sqliteTable(
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
		updatedAt: integer('updated_at', { mode: 'timestamp_ms' })
			.notNull()
			.$defaultFn(() => new Date())
	},
	(t) => [index('project_workshop').on(t.workshopId)]
);

export const apiTokens = sqliteTable('api_token', {
	id: id(),
	userId: text('user_id')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	name: text('name').notNull(),
	// sha-256 of the secret; the secret is shown once at creation
	tokenHash: text('token_hash').notNull().unique(),
	prefix: text('prefix').notNull(),
	lastUsedAt: integer('last_used_at', { mode: 'timestamp_ms' }),
	revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
	createdAt: createdAt()
});

export const passwordResets = sqliteTable('password_reset', {
	tokenHash: text('token_hash').primaryKey(),
	userId: text('user_id')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
	usedAt: integer('used_at', { mode: 'timestamp_ms' })
});

// Failed sign-ins by key (an e-mail or a client address), for slowing and refusing guessing.
export const signInFailures = sqliteTable(
	'sign_in_failure',
	{
		key: text('key').notNull(),
		at: integer('at', { mode: 'timestamp_ms' }).notNull()
	},
	(t) => [index('sign_in_failure_key_at').on(t.key, t.at)]
);

// ---- Analyses (workbench): inputs, results, engine version, revisions ----

export const analyses = sqliteTable(
	'analysis',
	{
		id: id(),
		projectId: text('project_id')
			.notNull()
			.references(() => projects.id, { onDelete: 'cascade' }),
		kind: text('kind', { enum: ANALYSIS_KINDS }).notNull(),
		name: text('name').notNull(),
		input: text('input', { mode: 'json' }).notNull(),
		result: text('result', { mode: 'json' }),
		summary: text('summary').notNull().default(''),
		pass: integer('pass', { mode: 'boolean' }),
		engineVersion: text('engine_version').notNull(),
		version: integer('version').notNull().default(1),
		deletedAt: integer('deleted_at', { mode: 'timestamp_ms' }),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		updatedBy: text('updated_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: integer('updated_at', { mode: 'timestamp_ms' })
			.notNull()
			.$defaultFn(() => new Date())
	},
	(t) => {
		// The list of a project's analyses (src/lib/server/analyses.ts) pages through one of these: each
		// holds the sort key and everything the page query filters and orders by, so finding a page reads
		// the index alone, never the rows with their large input and result.
		const live = sql`${t.deletedAt} is null`;
		// (deleted_at is null in all of them, but the page query names it, and SQLite reads an index
		// alone only when it holds every column the query names)
		const rest = [t.updatedAt, t.id, t.kind, t.pass, t.deletedAt] as const;
		return [
			index('analysis_project').on(t.projectId),
			index('analysis_list_updated')
				.on(t.projectId, ...rest)
				.where(live),
			index('analysis_list_created')
				.on(t.projectId, t.createdAt, ...rest)
				.where(live),
			index('analysis_list_name')
				.on(t.projectId, sql`lower(${t.name})`, ...rest)
				.where(live),
			index('analysis_list_kind')
				.on(t.projectId, t.kind, t.updatedAt, t.id, t.pass, t.deletedAt)
				.where(live),
			index('analysis_list_pass')
				.on(t.projectId, t.pass, t.updatedAt, t.id, t.kind, t.deletedAt)
				.where(live)
		];
	}
);

export const analysisRevisions = sqliteTable(
	'analysis_revision',
	{
		id: id(),
		analysisId: text('analysis_id')
			.notNull()
			.references(() => analyses.id, { onDelete: 'cascade' }),
		version: integer('version').notNull(),
		name: text('name').notNull(),
		input: text('input', { mode: 'json' }).notNull(),
		result: text('result', { mode: 'json' }),
		engineVersion: text('engine_version').notNull(),
		changedBy: text('changed_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(t) => [uniqueIndex('analysis_revision_version').on(t.analysisId, t.version)]
);

// ---- Project documents: drawings, site photos and measurements ----
export const DOCUMENT_TYPES = ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'] as const;
export type DocumentType = (typeof DOCUMENT_TYPES)[number];

export const documents = sqliteTable(
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
		inRecord: integer('in_record', { mode: 'boolean' }).notNull().default(false),
		deletedAt: integer('deleted_at', { mode: 'timestamp_ms' }),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(t) => [index('document_project').on(t.projectId, t.createdAt)]
);

// ---- The client's side: access to single projects, share links, records sent ----

/** A person (a client or an installer) who may read one project of a workshop they do not belong to. */
export const projectAccess = sqliteTable(
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

export const projectInvitations = sqliteTable(
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
		expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
		acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
		createdAt: createdAt()
	},
	(t) => [index('project_invitation_project').on(t.projectId)]
);

/** A read-only link to a project's record (or one analysis's), for someone without an account. */
export const shareLinks = sqliteTable(
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
		expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
		revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
		createdAt: createdAt()
	},
	(t) => [index('share_link_project').on(t.projectId)]
);

/** A record sent by e-mail: when, to whom, by whom, and whether the mail server took it. */
export const recordSends = sqliteTable(
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
export const classSessions = sqliteTable(
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
		revealed: integer('revealed', { mode: 'boolean' }).notNull().default(false),
		expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
		createdAt: createdAt()
	},
	(t) => [index('class_session_host').on(t.hostId), index('class_session_expires').on(t.expiresAt)]
);

/** A student in a session: a nickname and the hash of the seat token their phone keeps. */
export const classSeats = sqliteTable(
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
export const classAnswers = sqliteTable(
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
		answeredAt: integer('answered_at', { mode: 'timestamp_ms' }).notNull()
	},
	(t) => [
		primaryKey({ columns: [t.seatId, t.step] }),
		index('class_answer_session').on(t.sessionId, t.step)
	]
);
