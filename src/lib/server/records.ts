/**
 * The record: what a client reads, prints, downloads as a PDF and receives by e-mail. One document
 * per project (every saved analysis) or per analysis, built from the stored inputs and results in
 * the reader's units. Reached by a member or a client of the project (records.ts checks through
 * getProject), or by a share link (share-links.ts) without an account.
 */
import { error } from '@sveltejs/kit';
import { and, asc, eq, isNull } from 'drizzle-orm';
import type { Actor } from './access';
import { getDb, firstRow } from './db';
import { analyses, projects, workshops, type AnalysisKind } from './db/tables';

type Project = typeof projects.$inferSelect;
import { lengthUnitOf } from './preferences';
import { getProject } from './projects';
import { GENERAL_CAUTION, GLOSSARY, isUnverified, recordWords } from './record-words';
import { openShareLink } from './share-links';
import type { LengthUnit } from '$lib/schemas/preferences';
import type { RecordItemView, RecordView } from '$lib/components/record/types';
import { kindLabel } from '$lib/kinds/names';

/** The record as the page receives it, with the server's own types for the kind and dates. */
export interface RecordItem extends Omit<RecordItemView, 'kind' | 'updatedAt'> {
	kind: AnalysisKind;
	updatedAt: Date;
}

export type RecordNote = RecordView['notes'][number];

export interface RecordDoc extends Omit<RecordView, 'date' | 'items'> {
	date: Date;
	items: RecordItem[];
}

type Row = typeof analyses.$inferSelect;

async function buildRecord(
	project: Project,
	rows: Row[],
	unit: LengthUnit,
	scope: RecordDoc['scope']
): Promise<RecordDoc> {
	const shop =
		(
			await getDb()
				.select({ name: workshops.name })
				.from(workshops)
				.where(eq(workshops.id, project.workshopId))
				.then(firstRow)
		)?.name ?? '';
	const notes: RecordNote[] = [];
	const noteOf = (text: string) => {
		let note = notes.find((x) => x.text === text);
		if (!note) notes.push((note = { n: notes.length + 1, text, unverified: isUnverified(text) }));
		return note.n;
	};
	const terms = new Set<string>();
	const items = rows.map((row): RecordItem => {
		const words = recordWords(row.kind, row.input, row.result, unit);
		words.terms.forEach((t) => terms.add(t));
		return {
			id: row.id,
			kind: row.kind,
			kindLabel: kindLabel(row.kind),
			name: row.name,
			version: row.version,
			engineVersion: row.engineVersion,
			updatedAt: row.updatedAt,
			pass: row.pass,
			verdict: words.verdict,
			inputs: words.inputs,
			steps: words.steps,
			cautions: words.cautions,
			notes: [...new Set(words.sources.map(noteOf))],
			input: row.input,
			result: row.result
		};
	});
	return {
		shop,
		project: { id: project.id, name: project.name, client: project.client },
		scope,
		date: new Date(),
		unit,
		items,
		cautions: [GENERAL_CAUTION],
		notes,
		glossary: [...terms].map((t) => [t, GLOSSARY[t]])
	};
}

async function savedRows(projectId: string, analysisId?: string | null) {
	const where = [eq(analyses.projectId, projectId), isNull(analyses.deletedAt)];
	if (analysisId) where.push(eq(analyses.id, analysisId));
	const rows = await getDb()
		.select()
		.from(analyses)
		.where(and(...where))
		.orderBy(asc(analyses.createdAt), asc(analyses.id));
	if (analysisId && !rows.length) error(404, 'Not found.');
	return rows;
}

/** The record of every saved analysis of a project (anyone who may read the project). */
export async function projectRecord(actor: Actor, projectId: string) {
	const { project, role } = await getProject(actor, projectId);
	return {
		record: await buildRecord(
			project,
			await savedRows(projectId),
			await lengthUnitOf(actor),
			'project'
		),
		role
	};
}

/** The record of one analysis of a project. */
export async function analysisRecord(actor: Actor, projectId: string, analysisId: string) {
	const { project, role } = await getProject(actor, projectId);
	const rows = await savedRows(projectId, analysisId);
	return { record: await buildRecord(project, rows, await lengthUnitOf(actor), 'analysis'), role };
}

/** The record a share link opens, in the units of whoever made the link; 404 when it is closed. */
export async function sharedRecord(token: string) {
	const link = await openShareLink(token);
	const project = await getDb()
		.select()
		.from(projects)
		.where(eq(projects.id, link.projectId))
		.then(firstRow);
	if (!project) error(404, 'Not found.');
	const unit = link.createdBy ? await lengthUnitOf({ id: link.createdBy } as Actor) : 'frac16';
	const rows = await savedRows(project.id, link.analysisId);
	return await buildRecord(project, rows, unit, link.analysisId ? 'analysis' : 'project');
}
