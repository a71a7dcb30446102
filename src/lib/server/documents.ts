import { error } from '@sveltejs/kit';
import { and, desc, eq, isNotNull, isNull, lt, sum, type SQL } from 'drizzle-orm';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { requireProjectRole, type Actor } from './access';
import { getDb, firstRow, oneRow } from './db';
import { documents, users, type DocumentType } from './db/tables';
import { analysisInProject } from './analyses';
import { getProject } from './projects';
import { getStore } from './storage';
import type { DocumentFields, DocumentPatch } from '$lib/schemas/document';

const MB = 1024 * 1024;

/** Upload limits, from the environment (megabytes) or the defaults. */
export function documentLimits(env: NodeJS.ProcessEnv = process.env) {
	return {
		fileBytes: Number(env.SPANWRIGHT_UPLOAD_MAX_MB || 20) * MB,
		projectBytes: Number(env.SPANWRIGHT_PROJECT_FILES_MAX_MB || 500) * MB
	};
}

/** A deleted document can be brought back for this long; then it and its files are removed. */
export const DOCUMENT_UNDO_MS = 10 * 60 * 1000;
const THUMB_PX = 480;

const IMAGE_FORMAT = {
	'image/jpeg': 'jpeg',
	'image/png': 'png',
	'image/webp': 'webp'
} as const;

const columns = {
	id: documents.id,
	projectId: documents.projectId,
	analysisId: documents.analysisId,
	name: documents.name,
	caption: documents.caption,
	contentType: documents.contentType,
	bytes: documents.bytes,
	width: documents.width,
	height: documents.height,
	inRecord: documents.inRecord,
	createdAt: documents.createdAt,
	createdByName: users.name
};

export type ProjectDocument = {
	id: string;
	projectId: string;
	analysisId: string | null;
	name: string;
	caption: string;
	contentType: DocumentType;
	bytes: number;
	width: number | null;
	height: number | null;
	inRecord: boolean;
	createdAt: Date;
	createdByName: string | null;
	hasThumbnail: boolean;
};

/** Documents not deleted that match `where`, newest first, as the screens and the API show them. */
async function selectDocuments(...where: SQL[]): Promise<ProjectDocument[]> {
	const rows = await getDb()
		.select({ ...columns, thumbKey: documents.thumbKey })
		.from(documents)
		.leftJoin(users, eq(users.id, documents.createdBy))
		.where(and(isNull(documents.deletedAt), ...where))
		.orderBy(desc(documents.createdAt), desc(documents.id));
	return rows.map(({ thumbKey, ...rest }) => ({ ...rest, hasThumbnail: Boolean(thumbKey) }));
}

/** The project's documents, newest first (anyone who may see the project). */
export async function listDocuments(actor: Actor, projectId: string, only?: { inRecord: true }) {
	await getProject(actor, projectId);
	return await selectDocuments(
		eq(documents.projectId, projectId),
		...(only?.inRecord ? [eq(documents.inRecord, true)] : [])
	);
}

async function documentRow(id: string) {
	const row = await getDb().select().from(documents).where(eq(documents.id, id)).then(firstRow);
	if (!row) error(404, 'Not found.');
	return row;
}

/** One document, if the actor may see its project and it is not deleted; 404 otherwise. */
export async function getDocument(actor: Actor, id: string) {
	const row = await documentRow(id);
	const { project, role } = await getProject(actor, row.projectId);
	const [shown] = await selectDocuments(eq(documents.id, id));
	if (!shown) error(404, 'Not found.');
	return { document: shown, project, role };
}

/** The stored bytes of a document (the cleaned original, or its thumbnail). */
export async function readDocumentFile(
	actor: Actor,
	id: string,
	variant: 'original' | 'thumbnail'
) {
	const row = await documentRow(id);
	await getProject(actor, row.projectId);
	if (row.deletedAt) error(404, 'Not found.');
	const key = variant === 'thumbnail' ? row.thumbKey : row.fileKey;
	if (!key) error(404, 'This document has no thumbnail.');
	const bytes = await getStore().get(key);
	if (!bytes) error(404, 'The file is missing from storage.');
	const contentType = variant === 'thumbnail' ? 'image/webp' : row.contentType;
	return { bytes, contentType, name: row.name };
}

/** A file name to show and offer on download: the last part of what was sent, without controls. */
export function cleanFileName(name: string) {
	const base = name.split(/[/\\]/).pop() ?? '';
	const clean = base
		// eslint-disable-next-line no-control-regex -- control characters are what it removes
		.replace(/[\u0000-\u001f\u007f"<>|:*?]/g, '')
		.trim()
		.slice(-120);
	return clean.replace(/^\.+/, '') || 'file';
}

function refuse(status: number, message: string): never {
	error(status, message);
}

/** Decide what a file is from its bytes; refuse what we do not keep. */
async function kindOf(bytes: Uint8Array): Promise<DocumentType> {
	const found = await fileTypeFromBuffer(bytes);
	const mime = found?.mime;
	if (mime === 'image/jpeg' || mime === 'image/png' || mime === 'image/webp') return mime;
	if (mime === 'application/pdf') return mime;
	if (mime === 'image/heic' || mime === 'image/heif')
		refuse(
			415,
			'HEIC photos cannot be read here yet. Set the phone to take “most compatible” (JPEG) photos, or export the photo as JPEG, and add it again.'
		);
	refuse(
		415,
		`Only JPEG, PNG and WebP images and PDF drawings can be added${
			found
				? ` (this file's contents are ${found.mime})`
				: ' (this file’s contents are not one of them)'
		}. SVG and other files that can hold scripts are refused.`
	);
}

/**
 * An image as we keep it: turned upright by its orientation tag, then written again without any
 * metadata (camera, location, dates); its colour profile is kept so it looks the same.
 */
async function cleanImage(bytes: Uint8Array, type: keyof typeof IMAGE_FORMAT) {
	try {
		const upright = sharp(bytes, { failOn: 'error' }).rotate().keepIccProfile();
		const { data, info } = await upright
			.toFormat(IMAGE_FORMAT[type])
			.toBuffer({ resolveWithObject: true });
		const thumb = await sharp(data)
			.resize(THUMB_PX, THUMB_PX, { fit: 'inside', withoutEnlargement: true })
			.webp({ quality: 78 })
			.toBuffer();
		return {
			data: new Uint8Array(data),
			thumb: new Uint8Array(thumb),
			width: info.width,
			height: info.height
		};
	} catch {
		refuse(422, 'This image could not be read; it may be damaged or incomplete.');
	}
}

async function projectBytesInUse(projectId: string) {
	const row = await getDb()
		.select({ total: sum(documents.bytes) })
		.from(documents)
		.where(eq(documents.projectId, projectId))
		.then(firstRow);
	return Number(row?.total ?? 0);
}

async function checkAnalysis(projectId: string, analysisId: string | null) {
	if (!analysisId) return;
	if (!(await analysisInProject(projectId, analysisId)))
		refuse(422, 'Choose one of this project’s analyses.');
}

/** Add a file to a project (editors): checked, cleaned, stored under random keys, then recorded. */
export async function addDocument(
	actor: Actor,
	projectId: string,
	file: { bytes: Uint8Array; name: string },
	fields: DocumentFields
) {
	const { project } = await getProject(actor, projectId);
	await requireProjectRole(actor, project, 'editor');
	const limits = documentLimits();
	if (file.bytes.length > limits.fileBytes)
		refuse(
			413,
			`A file may be at most ${limits.fileBytes / MB} MB; this one is ${(file.bytes.length / MB).toFixed(1)} MB.`
		);
	if (file.bytes.length === 0) refuse(422, 'The file is empty.');
	await checkAnalysis(projectId, fields.analysisId);
	const type = await kindOf(file.bytes);
	const cleaned =
		type === 'application/pdf'
			? { data: file.bytes, thumb: null, width: null, height: null }
			: await cleanImage(file.bytes, type);
	if ((await projectBytesInUse(projectId)) + cleaned.data.length > limits.projectBytes)
		refuse(
			413,
			`This project's files may take at most ${limits.projectBytes / MB} MB; delete some before adding more.`
		);

	const store = getStore();
	const fileKey = `documents/${projectId}/${crypto.randomUUID()}`;
	const thumbKey = cleaned.thumb ? `documents/${projectId}/${crypto.randomUUID()}.webp` : null;
	// files first, then the row: a crash in between leaves an orphan file, which the sweep removes
	await store.put(fileKey, cleaned.data, type);
	if (thumbKey && cleaned.thumb) await store.put(thumbKey, cleaned.thumb, 'image/webp');
	try {
		const row = await getDb()
			.insert(documents)
			.values({
				projectId,
				analysisId: fields.analysisId,
				name: cleanFileName(file.name),
				caption: fields.caption,
				contentType: type,
				bytes: cleaned.data.length,
				width: cleaned.width,
				height: cleaned.height,
				fileKey,
				thumbKey,
				createdBy: actor.id
			})
			.returning({ id: documents.id })
			.then(oneRow);
		return (await getDocument(actor, row.id)).document;
	} catch (e) {
		await Promise.all([store.delete(fileKey), thumbKey ? store.delete(thumbKey) : null]);
		throw e;
	}
}

/** Change a document's caption, its analysis or whether the client's record shows it (editors). */
export async function updateDocument(actor: Actor, id: string, patch: DocumentPatch) {
	const { project } = await getDocument(actor, id);
	await requireProjectRole(actor, project, 'editor');
	if (patch.analysisId !== undefined) await checkAnalysis(project.id, patch.analysisId);
	if (Object.keys(patch).length)
		await getDb().update(documents).set(patch).where(eq(documents.id, id));
	return (await getDocument(actor, id)).document;
}

/** Hide a document at once (editors); it can be brought back within DOCUMENT_UNDO_MS. */
export async function deleteDocument(actor: Actor, id: string, now = new Date()) {
	const { project, document } = await getDocument(actor, id);
	await requireProjectRole(actor, project, 'editor');
	await getDb().update(documents).set({ deletedAt: now }).where(eq(documents.id, id));
	await purgeDeletedDocuments(now);
	return { document, undoUntil: new Date(+now + DOCUMENT_UNDO_MS) };
}

export async function undoDeleteDocument(actor: Actor, id: string, now = new Date()) {
	const row = await documentRow(id);
	const { project } = await getProject(actor, row.projectId);
	await requireProjectRole(actor, project, 'editor');
	if (row.deletedAt && +now - +row.deletedAt > DOCUMENT_UNDO_MS)
		refuse(409, 'This document was deleted too long ago to undo.');
	await getDb().update(documents).set({ deletedAt: null }).where(eq(documents.id, id));
	return (await getDocument(actor, id)).document;
}

/** Remove the rows and files of documents deleted longer ago than the undo window. */
export async function purgeDeletedDocuments(now = new Date()) {
	const db = getDb();
	const old = await db
		.select({ id: documents.id, fileKey: documents.fileKey, thumbKey: documents.thumbKey })
		.from(documents)
		.where(
			and(
				isNotNull(documents.deletedAt),
				lt(documents.deletedAt, new Date(+now - DOCUMENT_UNDO_MS))
			)
		);
	for (const doc of old) {
		// the row first: a crash after it leaves an orphan file for the sweep, never a row without a file
		await db.delete(documents).where(eq(documents.id, doc.id));
		await removeFiles([doc.fileKey, doc.thumbKey]);
	}
	return old.length;
}

async function removeFiles(keys: (string | null)[]) {
	const store = getStore();
	await Promise.all(keys.filter((k): k is string => Boolean(k)).map((k) => store.delete(k)));
}

/**
 * At start-up: remove stored files that no document row names (left by a crash between writing a
 * file and recording it, or after a project was deleted). Files younger than `graceMs` are left
 * alone, as an upload may be between its two steps right now.
 */
export async function sweepOrphanFiles(now = new Date(), graceMs = 10 * 60 * 1000) {
	await purgeDeletedDocuments(now);
	const rows = await getDb()
		.select({ fileKey: documents.fileKey, thumbKey: documents.thumbKey })
		.from(documents);
	const known = new Set(rows.flatMap((d) => [d.fileKey, d.thumbKey]));
	const store = getStore();
	const stored = await store.list('documents/');
	const orphans = stored.filter((f) => !known.has(f.key) && +now - +f.modified > graceMs);
	for (const f of orphans) await store.delete(f.key);
	return orphans.length;
}
