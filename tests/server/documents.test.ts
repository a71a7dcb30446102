import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import S3rver from 's3rver';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import {
	DOCUMENT_UNDO_MS,
	addDocument,
	cleanFileName,
	deleteDocument,
	getDocument,
	listDocuments,
	readDocumentFile,
	sweepOrphanFiles,
	undoDeleteDocument,
	updateDocument
} from '../../src/lib/server/documents';
import { deleteProject } from '../../src/lib/server/projects';
import { folderStore } from '../../src/lib/server/storage/folder';
import { s3Store } from '../../src/lib/server/storage/s3';
import { useStore, type FileStore } from '../../src/lib/server/storage';
import { makeWorkshopWithCast } from './support/actors';
import { useTempDb } from './support/db';
import { createProject } from '../../src/lib/server/projects';

useTempDb();

const noFields = { caption: '', analysisId: null };

async function freePort() {
	return new Promise<number>((done) => {
		const server = createServer().listen(0, '127.0.0.1', () => {
			const { port } = server.address() as { port: number };
			server.close(() => done(port));
		});
	});
}

/** A small photo as a phone writes it: EXIF with a GPS position, turned by its orientation tag. */
async function phonePhoto() {
	return new Uint8Array(
		await sharp({ create: { width: 64, height: 32, channels: 3, background: '#a0522d' } })
			.jpeg()
			.withMetadata({ orientation: 6 })
			.withExifMerge({
				IFD0: { Make: 'Example', Model: 'Phone' },
				IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '45/1 30/1 0/1' }
			})
			.toBuffer()
	);
}

const png = async () =>
	new Uint8Array(
		await sharp({ create: { width: 8, height: 8, channels: 4, background: '#fff' } })
			.png()
			.toBuffer()
	);
const pdf = new TextEncoder().encode(
	'%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);

type Store = {
	name: string;
	make: () => Promise<{ store: FileStore; close: () => Promise<void> }>;
};

const stores: Store[] = [
	{
		name: 'the data folder',
		make: async () => {
			const dir = mkdtempSync(join(tmpdir(), 'spanwright-files-'));
			return {
				store: folderStore(dir),
				close: async () => rmSync(dir, { recursive: true, force: true })
			};
		}
	},
	{
		name: 'an S3 bucket (local fake server)',
		make: async () => {
			const dir = mkdtempSync(join(tmpdir(), 'spanwright-s3-'));
			const port = await freePort();
			const fake = new S3rver({
				port,
				address: '127.0.0.1',
				silent: true,
				directory: dir,
				configureBuckets: [{ name: 'spanwright-test', configs: [] }]
			});
			await fake.run();
			return {
				store: s3Store({
					endpoint: `http://127.0.0.1:${port}`,
					region: 'us-east-1',
					bucket: 'spanwright-test',
					accessKeyId: 'S3RVER',
					secretAccessKey: 'S3RVER',
					forcePathStyle: true
				}),
				close: async () => {
					await fake.close();
					rmSync(dir, { recursive: true, force: true });
				}
			};
		}
	}
];

describe.each(stores)('project documents kept in $name', ({ make }) => {
	let store: FileStore;
	let close: () => Promise<void>;
	let cast: Awaited<ReturnType<typeof makeWorkshopWithCast>>;
	let projectId: string;

	beforeAll(async () => {
		({ store, close } = await make());
		useStore(store);
		cast = await makeWorkshopWithCast();
		projectId = (
			await createProject(cast.editor, cast.workshopId, {
				name: 'Library wall',
				client: 'The Ferrands',
				siteNotes: ''
			})
		).id;
	});
	afterAll(async () => {
		useStore(undefined);
		await close();
	});
	afterEach(() => {
		delete process.env.SPANWRIGHT_UPLOAD_MAX_MB;
		delete process.env.SPANWRIGHT_PROJECT_FILES_MAX_MB;
	});

	it('keeps a photo upright, without its camera and location metadata, with a thumbnail', async () => {
		const original = await phonePhoto();
		const before = await sharp(original).metadata();
		expect(before.exif).toBeDefined();
		expect(before.orientation).toBe(6);
		expect(before.exif?.toString('latin1')).toContain('Phone');

		const doc = await addDocument(
			cast.editor,
			projectId,
			{ bytes: original, name: 'IMG_0412.JPG' },
			{ caption: 'Left wall, outlet at 12"', analysisId: null }
		);
		expect(doc).toMatchObject({
			name: 'IMG_0412.JPG',
			caption: 'Left wall, outlet at 12"',
			contentType: 'image/jpeg',
			// turned by the orientation tag: 64 × 32 lying on its side becomes 32 wide, 64 high
			width: 32,
			height: 64,
			hasThumbnail: true
		});
		const kept = await readDocumentFile(cast.viewer, doc.id, 'original');
		const after = await sharp(kept.bytes).metadata();
		expect(after.exif).toBeUndefined();
		expect(after.orientation).toBeUndefined();
		expect([after.width, after.height]).toEqual([32, 64]);
		const thumb = await readDocumentFile(cast.viewer, doc.id, 'thumbnail');
		expect(thumb.contentType).toBe('image/webp');
		expect((await sharp(thumb.bytes).metadata()).format).toBe('webp');
	});

	it('takes PNG and PDF by their bytes; a PDF has no thumbnail', async () => {
		const image = await addDocument(
			cast.editor,
			projectId,
			{ bytes: await png(), name: 'a.png' },
			noFields
		);
		expect(image.contentType).toBe('image/png');
		const drawing = await addDocument(
			cast.editor,
			projectId,
			{ bytes: pdf, name: 'elevation.bin' },
			noFields
		);
		expect(drawing).toMatchObject({ contentType: 'application/pdf', hasThumbnail: false });
		await expect(readDocumentFile(cast.viewer, drawing.id, 'thumbnail')).rejects.toMatchObject({
			status: 404
		});
		const bytes = (await readDocumentFile(cast.viewer, drawing.id, 'original')).bytes;
		expect(new TextDecoder().decode(bytes)).toBe(new TextDecoder().decode(pdf));
	});

	it('refuses what its bytes show is not an image or PDF, whatever its name', async () => {
		const text = new TextEncoder().encode('just some notes, renamed');
		await expect(
			addDocument(cast.editor, projectId, { bytes: text, name: 'photo.jpg' }, noFields)
		).rejects.toMatchObject({ status: 415 });
		const svg = new TextEncoder().encode(
			'<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'
		);
		await expect(
			addDocument(cast.editor, projectId, { bytes: svg, name: 'plan.svg' }, noFields)
		).rejects.toMatchObject({ status: 415, body: { message: expect.stringMatching(/SVG/) } });
		// an HEIC photo (its ftyp box names the brand) is refused with the way round it
		const heic = new Uint8Array([
			0,
			0,
			0,
			24,
			...new TextEncoder().encode('ftypheic'),
			0,
			0,
			0,
			0,
			...new TextEncoder().encode('mif1heic')
		]);
		await expect(
			addDocument(cast.editor, projectId, { bytes: heic, name: 'IMG.HEIC' }, noFields)
		).rejects.toMatchObject({ status: 415, body: { message: expect.stringMatching(/JPEG/) } });
	});

	it('answers 413 past the size of one file and past the project’s share', async () => {
		process.env.SPANWRIGHT_UPLOAD_MAX_MB = String(100 / (1024 * 1024)); // 100 bytes
		await expect(
			addDocument(cast.editor, projectId, { bytes: await phonePhoto(), name: 'big.jpg' }, noFields)
		).rejects.toMatchObject({ status: 413 });
		delete process.env.SPANWRIGHT_UPLOAD_MAX_MB;
		process.env.SPANWRIGHT_PROJECT_FILES_MAX_MB = String(100 / (1024 * 1024)); // 100 bytes, already used
		await expect(
			addDocument(cast.editor, projectId, { bytes: pdf, name: 'more.pdf' }, noFields)
		).rejects.toMatchObject({ status: 413 });
	});

	it('never uses the name it was sent as a path', async () => {
		const doc = await addDocument(
			cast.editor,
			projectId,
			{ bytes: pdf, name: '../../../etc/passwd.pdf' },
			noFields
		);
		expect(doc.name).toBe('passwd.pdf');
		const keys = (await store.list('documents/')).map((f) => f.key);
		for (const key of keys)
			expect(key).toMatch(new RegExp(`^documents/${projectId}/[0-9a-f-]{36}(\\.webp)?$`));
		expect(cleanFileName('..\\..\\boot.ini')).toBe('boot.ini');
		expect(cleanFileName('\u0000\n')).toBe('file');
	});

	it('lets viewers read, refuses their changes, and hides the project from other workshops', async () => {
		const [doc] = await listDocuments(cast.viewer, projectId);
		expect(doc).toBeDefined();
		await expect(
			addDocument(cast.viewer, projectId, { bytes: pdf, name: 'x.pdf' }, noFields)
		).rejects.toMatchObject({ status: 403 });
		await expect(updateDocument(cast.viewer, doc.id, { caption: 'mine' })).rejects.toMatchObject({
			status: 403
		});
		await expect(deleteDocument(cast.viewer, doc.id)).rejects.toMatchObject({ status: 403 });
		await expect(listDocuments(cast.outsider, projectId)).rejects.toMatchObject({ status: 404 });
		await expect(readDocumentFile(cast.outsider, doc.id, 'original')).rejects.toMatchObject({
			status: 404
		});
		await expect(
			addDocument(cast.outsider, projectId, { bytes: pdf, name: 'x.pdf' }, noFields)
		).rejects.toMatchObject({ status: 404 });
	});

	it('changes a caption and the record mark, and refuses an analysis of another project', async () => {
		const [doc] = await listDocuments(cast.editor, projectId);
		const changed = await updateDocument(cast.editor, doc.id, {
			caption: 'Site, north wall',
			inRecord: true
		});
		expect(changed).toMatchObject({ caption: 'Site, north wall', inRecord: true });
		expect(
			(await listDocuments(cast.viewer, projectId, { inRecord: true })).map((d) => d.id)
		).toEqual([doc.id]);
		await expect(
			updateDocument(cast.editor, doc.id, { analysisId: crypto.randomUUID() })
		).rejects.toMatchObject({ status: 422 });
	});

	it('deletes with undo, then removes the row and its files after the undo window', async () => {
		const doc = await addDocument(
			cast.editor,
			projectId,
			{ bytes: await png(), name: 'gone.png' },
			noFields
		);
		const t0 = new Date();
		const { undoUntil } = await deleteDocument(cast.editor, doc.id, t0);
		expect(+undoUntil - +t0).toBe(DOCUMENT_UNDO_MS);
		await expect(getDocument(cast.viewer, doc.id)).rejects.toMatchObject({ status: 404 });
		expect((await undoDeleteDocument(cast.editor, doc.id, new Date(+t0 + 1000))).id).toBe(doc.id);

		const keysBefore = (await store.list('documents/')).length;
		await deleteDocument(cast.editor, doc.id, t0);
		await expect(
			undoDeleteDocument(cast.editor, doc.id, new Date(+t0 + DOCUMENT_UNDO_MS + 1))
		).rejects.toMatchObject({ status: 409 });
		// the purge runs at the next delete or sweep past the window
		await sweepOrphanFiles(new Date(+t0 + DOCUMENT_UNDO_MS + 1));
		expect((await store.list('documents/')).length).toBe(keysBefore - 2);
		await expect(getDocument(cast.editor, doc.id)).rejects.toMatchObject({ status: 404 });
	});

	it('sweeps files that no document names (a crash between the two steps), but not young ones', async () => {
		const known = (await store.list('documents/')).length;
		await store.put(`documents/${projectId}/${crypto.randomUUID()}`, pdf, 'application/pdf');
		expect(await sweepOrphanFiles(new Date())).toBe(0); // younger than the grace period
		expect(await sweepOrphanFiles(new Date(Date.now() + 11 * 60 * 1000))).toBe(1);
		expect((await store.list('documents/')).length).toBe(known);
	});

	it('removes a deleted project’s files', async () => {
		const other = await createProject(cast.editor, cast.workshopId, {
			name: 'Pantry',
			client: '',
			siteNotes: ''
		});
		await addDocument(cast.editor, other.id, { bytes: pdf, name: 'p.pdf' }, noFields);
		expect((await store.list(`documents/${other.id}/`)).length).toBe(1);
		await deleteProject(cast.editor, other.id);
		expect(await store.list(`documents/${other.id}/`)).toEqual([]);
	});
});

describe('the documents API', () => {
	it('answers 415 to a body that is not multipart, and 201 with the document for a file', async () => {
		const { POST } = await import('../../src/routes/api/v1/projects/[id]/documents/+server');
		const dir = mkdtempSync(join(tmpdir(), 'spanwright-files-'));
		useStore(folderStore(dir));
		const cast = await makeWorkshopWithCast();
		const project = await createProject(cast.editor, cast.workshopId, {
			name: 'Nook',
			client: '',
			siteNotes: ''
		});
		const call = (body: BodyInit, type?: string) =>
			POST({
				locals: { actor: cast.editor },
				params: { id: project.id },
				url: new URL('http://localhost/'),
				request: new Request('http://localhost/', {
					method: 'POST',
					body,
					headers: type ? { 'content-type': type } : undefined
				})
				// eslint-disable-next-line @typescript-eslint/no-explicit-any
			} as any);
		expect((await call('hello', 'text/plain')).status).toBe(415);
		expect((await call('--x\r\nbroken', 'multipart/form-data')).status).toBe(400);
		const form = new FormData();
		form.append('file', new Blob([pdf]), 'drawing.pdf');
		form.append('caption', 'Elevation A');
		const added = await call(form);
		expect(added.status).toBe(201);
		expect(await added.json()).toMatchObject({ name: 'drawing.pdf', caption: 'Elevation A' });
		useStore(undefined);
		rmSync(dir, { recursive: true, force: true });
	});
});
