// The client's side: project invitations, share links (long, random, stored hashed; closed links
// are a bare 404) and sending the record by e-mail with its PDF.
import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { useTempDb } from './support/db';
import { oneRow } from '../../src/lib/server/db';
import { useMailCatcher } from './support/mail';
import { ensurePoppler, pdfText } from './support/pdf';
import { grantProject, makeWorkshopWithCast } from './support/actors';
import { saveShelf } from './support/analyses';
import { getDb } from '../../src/lib/server/db';
import { recordSends, shareLinks } from '../../src/lib/server/db/tables';
import { createProject } from '../../src/lib/server/projects';
import { getAnalysis } from '../../src/lib/server/analyses';
import {
	acceptProjectInvitation,
	inviteToProject,
	listProjectAccess,
	listSharedProjects,
	revokeProjectAccess
} from '../../src/lib/server/project-access';
import { createShareLink, listShareLinks, revokeShareLink } from '../../src/lib/server/share-links';
import { sharedRecord } from '../../src/lib/server/records';
import { listRecordSends, sendRecord } from '../../src/lib/server/record-mail';
import { latestMailTo } from '../../src/lib/server/dev/caught-mail';

useTempDb();
const mail = useMailCatcher();
beforeAll(() => ensurePoppler(), 120_000);

const status = async (fn: () => Promise<unknown>) => {
	try {
		await fn();
		return 200;
	} catch (e) {
		return (e as { status: number }).status;
	}
};

async function setting() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Library wall',
		client: 'Ada Client',
		siteNotes: 'Plaster walls'
	});
	const other = await createProject(cast.owner, cast.workshopId, {
		name: 'Pantry',
		client: 'Bo Other',
		siteNotes: ''
	});
	await grantProject(cast.otherClient, other.id);
	return { cast, project, other };
}

describe('project invitations', () => {
	it('lets an editor invite a client, who accepts and then reads that project alone', async () => {
		const { cast, project, other } = await setting();
		expect(
			await status(async () => await inviteToProject(cast.viewer, project.id, cast.client.email))
		).toBe(403);
		const { token } = await inviteToProject(cast.editor, project.id, cast.client.email);
		expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
		expect(await status(async () => await acceptProjectInvitation(cast.otherClient, token))).toBe(
			403
		);
		await acceptProjectInvitation(cast.client, token);
		expect(await status(async () => await acceptProjectInvitation(cast.client, token))).toBe(410);
		expect(
			(await getAnalysis(cast.client, (await saveShelf(cast.owner, project.id)).id)).role
		).toBe('client');
		expect(
			await status(
				async () => await getAnalysis(cast.client, (await saveShelf(cast.owner, other.id)).id)
			)
		).toBe(404);
		expect((await listSharedProjects(cast.client)).map((p) => p.name)).toEqual(['Library wall']);
		expect((await listProjectAccess(cast.editor, project.id)).people.map((p) => p.email)).toEqual([
			cast.client.email
		]);
		// only an owner takes access away
		expect(
			await status(async () => await revokeProjectAccess(cast.editor, project.id, cast.client.id))
		).toBe(403);
		await revokeProjectAccess(cast.owner, project.id, cast.client.id);
		expect(await listSharedProjects(cast.client)).toEqual([]);
	});
});

describe('share links', () => {
	it('opens the record without an account, stores only a hash, and closes for good', async () => {
		const { cast, project } = await setting();
		await saveShelf(cast.owner, project.id);
		for (const who of ['viewer', 'client', 'outsider'] as const) {
			if (who === 'client') await grantProject(cast.client, project.id);
			expect(
				await status(async () => await createShareLink(cast[who], project.id, { days: 7 }))
			).toBe(who === 'outsider' ? 404 : 403);
		}
		const { link, token } = await createShareLink(cast.editor, project.id, { days: 7 });
		const stored = await getDb()
			.select()
			.from(shareLinks)
			.where(eq(shareLinks.id, link.id))
			.then(oneRow);
		expect(stored.tokenHash).toMatch(/^[0-9a-f]{64}$/);
		expect(JSON.stringify(stored)).not.toContain(token);
		const record = await sharedRecord(token);
		expect(record.project.name).toBe('Library wall');
		expect(record.items).toHaveLength(1);
		expect((await listShareLinks(cast.editor, project.id)).map((l) => l.id)).toEqual([link.id]);
		await revokeShareLink(cast.editor, project.id, link.id);
		expect(await status(async () => await sharedRecord(token))).toBe(404);
		expect(await listShareLinks(cast.editor, project.id)).toEqual([]);
	});

	it('answers an expired, unknown or malformed token with the same 404', async () => {
		const { cast, project } = await setting();
		const { link, token } = await createShareLink(cast.editor, project.id, { days: 1 });
		await getDb()
			.update(shareLinks)
			.set({ expiresAt: new Date(Date.now() - 1000) })
			.where(eq(shareLinks.id, link.id));
		expect(await status(async () => await sharedRecord(token))).toBe(404);
		expect(await status(async () => await sharedRecord('x'.repeat(43)))).toBe(404);
		expect(await status(async () => await sharedRecord('../../etc'))).toBe(404);
	});
});

describe('sending the record', () => {
	it('mails the PDF with a share link to an address without access, and the project shows it', async () => {
		const { cast, project } = await setting();
		const shelf = await saveShelf(cast.owner, project.id);
		const to = 'ada.client@example.test';
		const link = await sendRecord(
			cast.editor,
			project.id,
			{ to, message: 'Here is the shelf we talked about.' },
			'https://shop.example'
		);
		expect(link).toMatch(/^https:\/\/shop\.example\/shared\/[A-Za-z0-9_-]{43}$/);
		const caught = latestMailTo(to, mail.dir)!;
		expect(caught.text).toContain('Here is the shelf we talked about.');
		expect(caught.links).toContain(link);
		expect(caught.attachments).toHaveLength(1);
		expect(caught.attachments![0].contentType).toBe('application/pdf');
		const text = pdfText(readFileSync(caught.attachments![0].path));
		expect(text).toContain('Library wall');
		expect(text).toContain(shelf.name);
		expect(text).toContain('This shelf sags about');
		const sends = await listRecordSends(cast.owner, project.id);
		expect(sends.map((s) => s.to)).toEqual([to]);
		expect((await sharedRecord(link!.split('/').pop()!)).items[0].name).toBe(shelf.name);
	});

	it('links a client who has access to the record page, and a failed send leaves no trace', async () => {
		const { cast, project } = await setting();
		const shelf = await saveShelf(cast.owner, project.id);
		await grantProject(cast.client, project.id);
		const link = await sendRecord(
			cast.editor,
			project.id,
			{ to: cast.client.email, message: '', analysisId: shelf.id },
			'https://shop.example'
		);
		expect(link).toBe(`https://shop.example/projects/${project.id}/analyses/${shelf.id}/record`);
		await expect(
			sendRecord(cast.client, project.id, { to: 'x@example.test', message: '' }, '')
		).rejects.toMatchObject({ status: 403 });

		const before = (await listShareLinks(cast.editor, project.id)).length;
		const saved = process.env.SMTP_URL;
		process.env.SMTP_URL = 'smtp://127.0.0.1:9'; // nothing listens there
		try {
			const failed = await sendRecord(
				cast.editor,
				project.id,
				{ to: 'nobody@example.test', message: 'Hello' },
				'https://shop.example'
			);
			expect(failed).toBeNull();
		} finally {
			process.env.SMTP_URL = saved;
		}
		expect(await listShareLinks(cast.editor, project.id)).toHaveLength(before);
		const rows = await getDb()
			.select()
			.from(recordSends)
			.where(eq(recordSends.projectId, project.id));
		expect(rows.map((r) => r.to)).toEqual([cast.client.email]);
	});
});
