/**
 * Saved analyses of a project, scoped to the actor through the project's workshop. Every write
 * recomputes with the engine (analysis-kinds.ts), bumps the version and records a revision; a
 * stale version is refused (409) and nothing is overwritten.
 */
import type { LengthUnit } from '$lib/schemas/preferences';
import { error } from '@sveltejs/kit';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';
import { and, asc, count, desc, eq, gt, inArray, isNull, sql, type SQL } from 'drizzle-orm';
import { canChangeAnalysis, type Actor } from './access';
import { computeAnalysis, describeAnalysis, describeInput } from '$lib/kinds/registry';
import { dialect, getDb, firstRow, oneRow, transaction } from './db';
import { analysisTextMatches } from './db/search';
import {
	alias,
	analyses,
	analysisRevisions,
	projects,
	users,
	type AnalysisKind
} from './db/tables';
import type { ProblemIssue } from './http';
import { lengthUnitOf } from './preferences';
import { getProject } from './projects';
import type { AnalysisListQuery } from '$lib/schemas/analysis';

/** How long after a delete the Undo notice can bring an analysis back. */
export const UNDO_WINDOW_MS = 10 * 60 * 1000;

/** A refusal that carries its status and the fields to fix (409, 422); routes answer it as JSON. */
export class AnalysisProblem extends Error {
	constructor(
		readonly status: number,
		message: string,
		readonly issues: ProblemIssue[] = []
	) {
		super(message);
		this.name = 'AnalysisProblem';
	}
}

type Row = typeof analyses.$inferSelect;
const creator = alias(users, 'creator');
const updater = alias(users, 'updater');

const sortColumn = {
	updated: analyses.updatedAt,
	name: sql`lower(${analyses.name})`,
	kind: analyses.kind,
	created: analyses.createdAt,
	pass: analyses.pass
} as const;

const listColumns = {
	id: analyses.id,
	projectId: analyses.projectId,
	kind: analyses.kind,
	name: analyses.name,
	summary: analyses.summary,
	pass: analyses.pass,
	version: analyses.version,
	engineVersion: analyses.engineVersion,
	input: analyses.input,
	result: analyses.result,
	createdAt: analyses.createdAt,
	updatedAt: analyses.updatedAt,
	createdByName: creator.name,
	updatedByName: updater.name
};

/** The summary in the reader's unit (the stored one was written in the author's). */
function present<
	T extends { kind: AnalysisKind; input: unknown; result: unknown; summary: string }
>(row: T, unit: LengthUnit) {
	const summary = describeAnalysis(row.kind, row.input, row.result, unit);
	return { ...row, summary: summary || row.summary };
}

/**
 * The sort of the list. An analysis without a verdict comes first going up and last going down on
 * both engines: SQLite's own order (which its list indexes hold), named on PostgreSQL, whose default
 * is the other way round.
 */
function sortOrder(column: SQL | SQLiteColumn, dir: 'asc' | 'desc') {
	if (dialect === 'pg')
		return dir === 'asc' ? sql`${column} asc nulls first` : sql`${column} desc nulls last`;
	return dir === 'asc' ? asc(column) : desc(column);
}

/** The query of one page's ids, and its filter (for the count); not run here. */
export function analysisPage(projectId: string, query: AnalysisListQuery) {
	const where: SQL[] = [eq(analyses.projectId, projectId), isNull(analyses.deletedAt)];
	if (query.q) where.push(analysisTextMatches(query.q));
	if (query.kind) where.push(eq(analyses.kind, query.kind));
	if (query.pass) where.push(eq(analyses.pass, query.pass === 'pass'));
	const filter = and(...where);
	const column = sortColumn[query.sort];
	const page = getDb()
		.select({ id: analyses.id })
		.from(analyses)
		.where(filter)
		.orderBy(sortOrder(column, query.dir), desc(analyses.updatedAt), asc(analyses.id))
		.limit(query.perPage)
		.offset((query.page - 1) * query.perPage);
	return { filter, page };
}

/**
 * A page of a project's analyses, searched by name and summary, filtered by kind and verdict. The
 * page's ids are found first, from an index that holds every sort key and filter (schema.ts,
 * analysis_list_*), so paging never reads the rows with their large input and result; only the page's
 * own rows are read in full, for their summary in the reader's unit.
 */
export async function listAnalyses(actor: Actor, projectId: string, query: AnalysisListQuery) {
	await getProject(actor, projectId);
	const db = getDb();
	const { filter, page } = analysisPage(projectId, query);
	const ids = await page.then((rows) => rows.map((r) => r.id));
	const rows = ids.length
		? await db
				.select(listColumns)
				.from(analyses)
				.leftJoin(creator, eq(creator.id, analyses.createdBy))
				.leftJoin(updater, eq(updater.id, analyses.updatedBy))
				.where(inArray(analyses.id, ids))
		: [];
	const byId = new Map(rows.map((r) => [r.id, r]));
	const total =
		(await db.select({ n: count() }).from(analyses).where(filter).then(firstRow))?.n ?? 0;
	const unit = await lengthUnitOf(actor);
	const items = ids.map((id) => {
		const { input: _input, result: _result, ...rest } = present(byId.get(id)!, unit);
		void _input;
		void _result;
		return rest;
	});
	return { items, total, page: query.page, perPage: query.perPage };
}

async function findRow(id: string, includeDeleted = false) {
	const row = await getDb()
		.select({
			...listColumns,
			deletedAt: analyses.deletedAt,
			workshopId: projects.workshopId,
			createdBy: analyses.createdBy
		})
		.from(analyses)
		.innerJoin(projects, eq(projects.id, analyses.projectId))
		.leftJoin(creator, eq(creator.id, analyses.createdBy))
		.leftJoin(updater, eq(updater.id, analyses.updatedBy))
		.where(eq(analyses.id, id))
		.then(firstRow);
	if (!row || (row.deletedAt && !includeDeleted)) error(404, 'Not found.');
	return row;
}

/** One analysis with its project and the actor's role; 404 when unseen or deleted. */
export async function getAnalysis(actor: Actor, id: string) {
	const row = await findRow(id);
	const { project, role } = await getProject(actor, row.projectId);
	const {
		workshopId: _w,
		deletedAt: _d,
		createdBy: _c,
		...analysis
	} = present(row, await lengthUnitOf(actor));
	void _w;
	void _d;
	void _c;
	// whether this actor may change it: editors any, a student their own
	return { analysis, project, role, canChange: canChangeAnalysis(role, actor.id, row) };
}

export type AnalysisView = Awaited<ReturnType<typeof getAnalysis>>['analysis'];

function computed(kind: AnalysisKind, input: unknown) {
	const run = computeAnalysis(kind, input);
	if (!run.ok) throw new AnalysisProblem(422, 'Some fields need attention.', run.issues);
	return run;
}

async function summaryOf(
	actor: Actor,
	kind: AnalysisKind,
	run: { input: unknown; result: unknown }
) {
	return describeAnalysis(kind, run.input, run.result, await lengthUnitOf(actor));
}

async function touchProject(projectId: string, at: Date) {
	await getDb().update(projects).set({ updatedAt: at }).where(eq(projects.id, projectId));
}

async function recordRevision(row: Row, actor: Actor) {
	await getDb().insert(analysisRevisions).values({
		analysisId: row.id,
		version: row.version,
		name: row.name,
		input: row.input,
		result: row.result,
		engineVersion: row.engineVersion,
		changedBy: actor.id,
		createdAt: row.updatedAt
	});
}

/** Save a new analysis in a project (editor, or a student of a class); the engine computes it. */
export async function createAnalysis(
	actor: Actor,
	projectId: string,
	body: { kind: AnalysisKind; name: string; input: unknown }
) {
	await getProject(actor, projectId, 'student');
	const run = computed(body.kind, body.input);
	const now = new Date();
	const id = await transaction(async () => {
		const row = await getDb()
			.insert(analyses)
			.values({
				projectId,
				kind: body.kind,
				name: body.name,
				input: run.input,
				result: run.result,
				summary: await summaryOf(actor, body.kind, run),
				pass: run.pass,
				engineVersion: run.engineVersion,
				createdBy: actor.id,
				updatedBy: actor.id,
				createdAt: now,
				updatedAt: now
			})
			.returning()
			.then(oneRow);
		await recordRevision(row, actor);
		await touchProject(projectId, now);
		return row.id;
	});
	return (await getAnalysis(actor, id)).analysis;
}

async function editable(actor: Actor, id: string, includeDeleted = false) {
	const row = await findRow(id, includeDeleted);
	const { role } = await getProject(actor, row.projectId, 'student');
	if (!canChangeAnalysis(role, actor.id, row))
		error(403, 'A student changes only the analyses they saved; this one is someone else’s.');
	return row;
}

function stale(current: { version: number; updatedByName: string | null; updatedAt: Date }) {
	return new AnalysisProblem(
		409,
		`This analysis was changed by ${current.updatedByName ?? 'someone'} since you opened it ` +
			`(it is now version ${current.version}). Nothing was overwritten: reload to see their ` +
			'change, then make yours again.',
		[{ path: ['version'], message: `The current version is ${current.version}.` }]
	);
}

/**
 * Change the name and/or input, only if `version` is still the stored one (else 409, nothing
 * written). A new input is recomputed; the result is never taken from the caller.
 */
export async function updateAnalysis(
	actor: Actor,
	id: string,
	patch: { name?: string; input?: unknown; version: number }
) {
	const current = await editable(actor, id);
	if (current.version !== patch.version) throw stale(current);
	const run = patch.input !== undefined ? computed(current.kind, patch.input) : null;
	const now = new Date();
	await transaction(async () => {
		const values = {
			name: patch.name ?? current.name,
			version: current.version + 1,
			updatedBy: actor.id,
			updatedAt: now,
			...(run
				? {
						input: run.input,
						result: run.result,
						pass: run.pass,
						engineVersion: run.engineVersion,
						summary: await summaryOf(actor, current.kind, run)
					}
				: {})
		};
		// the version in the WHERE makes the check and the write one step: a concurrent writer loses
		const row = await getDb()
			.update(analyses)
			.set(values)
			.where(
				and(eq(analyses.id, id), eq(analyses.version, patch.version), isNull(analyses.deletedAt))
			)
			.returning()
			.then(firstRow);
		if (!row) throw stale(await findRow(id));
		await recordRevision(row, actor);
		await touchProject(row.projectId, now);
	});
	return (await getAnalysis(actor, id)).analysis;
}

/** Saved versions of analyses, with who saved each. */
function revisions(where: SQL | undefined) {
	return getDb()
		.select({
			version: analysisRevisions.version,
			name: analysisRevisions.name,
			input: analysisRevisions.input,
			result: analysisRevisions.result,
			engineVersion: analysisRevisions.engineVersion,
			createdAt: analysisRevisions.createdAt,
			changedByName: users.name
		})
		.from(analysisRevisions)
		.leftJoin(users, eq(users.id, analysisRevisions.changedBy))
		.where(where);
}

/** An analysis of this project that is not deleted (its id and name), or undefined. */
export async function analysisInProject(projectId: string, analysisId: string) {
	return await getDb()
		.select({ id: analyses.id, name: analyses.name })
		.from(analyses)
		.where(
			and(
				eq(analyses.id, analysisId),
				eq(analyses.projectId, projectId),
				isNull(analyses.deletedAt)
			)
		)
		.then(firstRow);
}

/** Every version of an analysis, newest first, with who saved it. */
export async function listRevisions(actor: Actor, id: string) {
	const { analysis } = await getAnalysis(actor, id);
	const rows = await revisions(eq(analysisRevisions.analysisId, id)).orderBy(
		desc(analysisRevisions.version)
	);
	const unit = await lengthUnitOf(actor);
	return rows.map(({ input, result, ...r }) => ({
		...r,
		summary: describeAnalysis(analysis.kind, input, result, unit),
		current: r.version === analysis.version
	}));
}

/** One earlier version: its inputs (stored and as readable rows), result and summary. */
export async function getRevision(actor: Actor, id: string, version: number) {
	const { analysis, project, role } = await getAnalysis(actor, id);
	const row = await revisions(
		and(eq(analysisRevisions.analysisId, id), eq(analysisRevisions.version, version))
	).then(firstRow);
	if (!row) error(404, 'Not found.');
	const unit = await lengthUnitOf(actor);
	return {
		analysis,
		project,
		role,
		revision: {
			...row,
			summary: describeAnalysis(analysis.kind, row.input, row.result, unit),
			inputRows: describeInput(analysis.kind, row.input, unit)
		}
	};
}

/** Bring back an earlier version's name and input as a new version, recomputed now. */
export async function restoreRevision(
	actor: Actor,
	id: string,
	version: number,
	expected?: number
) {
	const current = await editable(actor, id);
	if (expected !== undefined && expected !== current.version) throw stale(current);
	const { revision } = await getRevision(actor, id, version);
	return await updateAnalysis(actor, id, {
		name: revision.name,
		input: revision.input,
		version: current.version
	});
}

/** A copy in the same project, recomputed with the current engine, starting at version 1. */
export async function duplicateAnalysis(actor: Actor, id: string, body: { name?: string } = {}) {
	// a student may start from anyone's analysis: the copy is theirs
	const source = await findRow(id);
	await getProject(actor, source.projectId, 'student');
	const name = body.name ?? `${source.name} (copy)`.slice(0, 120);
	return await createAnalysis(actor, source.projectId, {
		kind: source.kind,
		name,
		input: source.input
	});
}

/** Move to another project of the same workshop (editor); other workshops are refused (422). */
export async function moveAnalysis(actor: Actor, id: string, projectId: string) {
	const row = await editable(actor, id);
	const { project: target } = await getProject(actor, projectId, 'student');
	if (target.workshopId !== row.workshopId)
		throw new AnalysisProblem(422, 'An analysis moves only between projects of its workshop.', [
			{ path: ['projectId'], message: 'Pick a project of the same workshop.' }
		]);
	const now = new Date();
	await getDb()
		.update(analyses)
		.set({ projectId, updatedBy: actor.id, updatedAt: now })
		.where(eq(analyses.id, id));
	await touchProject(row.projectId, now);
	await touchProject(projectId, now);
	return (await getAnalysis(actor, id)).analysis;
}

/** Soft delete (editor): hidden at once, and back with undoDelete within UNDO_WINDOW_MS. */
export async function deleteAnalysis(actor: Actor, id: string) {
	const row = await editable(actor, id);
	const deletedAt = new Date();
	await getDb().update(analyses).set({ deletedAt }).where(eq(analyses.id, id));
	return {
		id,
		projectId: row.projectId,
		deletedAt,
		undoUntil: new Date(+deletedAt + UNDO_WINDOW_MS)
	};
}

/** Undo a delete made within the window (editor); later deletes stay deleted (409). */
export async function undoDelete(actor: Actor, id: string, now = new Date()) {
	const row = await editable(actor, id, true);
	if (!row.deletedAt) return (await getAnalysis(actor, id)).analysis;
	if (+now - +row.deletedAt > UNDO_WINDOW_MS)
		throw new AnalysisProblem(409, 'This analysis was deleted too long ago to undo.');
	await getDb()
		.update(analyses)
		.set({ deletedAt: null })
		.where(and(eq(analyses.id, id), gt(analyses.deletedAt, new Date(+now - UNDO_WINDOW_MS))));
	return (await getAnalysis(actor, id)).analysis;
}
