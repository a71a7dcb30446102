/**
 * Sending the record to the client: the PDF attached, a link to read it online (the record page
 * when the address already has access to the project, else a new share link), the editor's own
 * message, and a line in the project saying when and to whom it went. A send the mail server
 * refuses leaves no trace but the error (the share link made for it is closed again).
 */
import { and, desc, eq } from 'drizzle-orm';
import type { Actor } from './access';
import { getDb, firstRow } from './db';
import { projectAccess, recordSends, users } from './db/tables';
import { letterHtml, mailDown, sendMail } from './mail';
import { getProject } from './projects';
import { renderRecordPdf } from './record-pdf';
import { analysisRecord, projectRecord } from './records';
import { createShareLink, revokeShareLink } from './share-links';

const SHARE_DAYS = 30;

async function hasAccount(projectId: string, email: string) {
	return !!(await getDb()
		.select({ id: users.id })
		.from(projectAccess)
		.innerJoin(users, eq(users.id, projectAccess.userId))
		.where(and(eq(projectAccess.projectId, projectId), eq(users.email, email.toLowerCase())))
		.then(firstRow));
}

function fileName(name: string) {
	const slug = name
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-|-$/g, '');
	return `${slug || 'record'}-record.pdf`;
}

/** Send the record (editor). Resolves to the link mailed, or null when the mail did not go. */
export async function sendRecord(
	actor: Actor,
	projectId: string,
	body: { to: string; message: string; analysisId?: string },
	origin: string
) {
	const { project } = await getProject(actor, projectId, 'editor');
	const { record } = body.analysisId
		? await analysisRecord(actor, projectId, body.analysisId)
		: await projectRecord(actor, projectId);
	const pdf = await renderRecordPdf(record);
	let link: string;
	let share: string | null = null;
	if (await hasAccount(projectId, body.to))
		link = body.analysisId
			? `${origin}/projects/${projectId}/analyses/${body.analysisId}/record`
			: `${origin}/projects/${projectId}/record`;
	else {
		const made = await createShareLink(actor, projectId, {
			days: SHARE_DAYS,
			analysisId: body.analysisId
		});
		share = made.link.id;
		link = `${origin}/shared/${made.token}`;
	}
	const who = actor.name ?? actor.email;
	const what = body.analysisId ? `"${record.items[0]?.name}"` : `the project "${project.name}"`;
	const lines = [
		...(body.message ? [body.message] : []),
		`${who} of ${record.shop} sends you the record of ${what}. It is attached as a PDF, and you can read it online:`
	];
	const after = share
		? `The link works for ${SHARE_DAYS} days without an account. The figures are engineering estimates; the record lists its cautions and sources.`
		: 'Sign in with this address to read it. The figures are engineering estimates; the record lists its cautions and sources.';
	const sent = await sendMail({
		to: body.to,
		subject: `Record: ${body.analysisId ? record.items[0]?.name : project.name} (${record.shop})`,
		text: `${lines.join('\n\n')}\n\n${link}\n\n${after}\n`,
		html: letterHtml(lines, { href: link, label: 'Read the record' }, after),
		attachments: [
			{
				filename: fileName(body.analysisId ? (record.items[0]?.name ?? '') : project.name),
				content: pdf,
				contentType: 'application/pdf'
			}
		]
	}).catch(mailDown);
	if (!sent) {
		if (share) await revokeShareLink(actor, projectId, share);
		return null;
	}
	await getDb()
		.insert(recordSends)
		.values({
			projectId,
			analysisId: body.analysisId ?? null,
			to: body.to.toLowerCase(),
			sentBy: actor.id
		});
	return link;
}

/** When and to whom the project's records were sent, newest first (anyone who reads the project). */
export async function listRecordSends(actor: Actor, projectId: string) {
	await getProject(actor, projectId, 'viewer');
	return await getDb()
		.select({
			id: recordSends.id,
			to: recordSends.to,
			analysisId: recordSends.analysisId,
			at: recordSends.createdAt,
			byName: users.name
		})
		.from(recordSends)
		.leftJoin(users, eq(users.id, recordSends.sentBy))
		.where(eq(recordSends.projectId, projectId))
		.orderBy(desc(recordSends.createdAt))
		.limit(20);
}
