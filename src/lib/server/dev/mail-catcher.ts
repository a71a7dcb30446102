/**
 * A local SMTP server for dev and tests: it accepts every message on 127.0.0.1 and keeps each one as
 * a JSON file ({ id, to, from, subject, text, html, links, receivedAt }) in <data folder>/mail/.
 * Run it with `npx tsx src/lib/server/dev/mail-catcher.ts`, or call startMailCatcher() in a test.
 * No framework imports here: it runs as a plain Node program.
 */
import { simpleParser, type AddressObject } from 'mailparser';
import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { SMTPServer } from 'smtp-server';
import { dataDir } from '../db';

export interface CaughtMail {
	id: string;
	to: string[];
	from: string;
	subject: string;
	text: string;
	html: string;
	links: string[];
	receivedAt: string;
	/** files that came with it (a record's PDF), each kept beside the message */
	attachments?: { filename: string; contentType: string; size: number; path: string }[];
}

/** <data folder>/mail, the data folder being SPANWRIGHT_DATA_DIR or the project's data/. */
export function defaultMailDir() {
	return join(dataDir, 'mail');
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
	const list = Array.isArray(field) ? field : field ? [field] : [];
	return list.flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase())).filter(Boolean);
}

/** Every http(s) link in the text and the html hrefs, in order, without repeats. */
export function linksIn(text: string, html: string): string[] {
	const found = [
		...(text.match(/https?:\/\/[^\s<>"')]+/g) ?? []),
		...[...html.matchAll(/href="(https?:\/\/[^"]+)"/g)].map((m) =>
			m[1].replace(/&(amp|#38|#x26);/gi, '&')
		)
	];
	return [...new Set(found)];
}

export async function startMailCatcher({
	port = 2525,
	dir = defaultMailDir(),
	host = '127.0.0.1'
}: { port?: number; dir?: string; host?: string } = {}) {
	mkdirSync(dir, { recursive: true });
	const server = new SMTPServer({
		authOptional: true,
		disabledCommands: ['STARTTLS', 'AUTH'],
		banner: 'Spanwright mail catcher',
		logger: false,
		onData(stream, session, callback) {
			simpleParser(stream)
				.then((parsed) => {
					const text = parsed.text ?? '';
					const html = typeof parsed.html === 'string' ? parsed.html : '';
					const envelopeTo = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
					const receivedAt = new Date();
					const id = randomUUID();
					const attachments = parsed.attachments.map((a, n) => {
						const safe = (a.filename ?? `file-${n}`).replace(/[^A-Za-z0-9._-]+/g, '-');
						const path = join(dir, `${receivedAt.getTime()}-${id}-${n}-${safe}`);
						writeFileSync(path, a.content);
						return { filename: a.filename ?? safe, contentType: a.contentType, size: a.size, path };
					});
					const mail: CaughtMail = {
						id,
						to: envelopeTo.length ? envelopeTo : addresses(parsed.to),
						from: addresses(parsed.from)[0] ?? '',
						subject: parsed.subject ?? '',
						text,
						html,
						links: linksIn(text, html),
						receivedAt: receivedAt.toISOString(),
						attachments
					};
					// the time first, so the files sort oldest to newest by name
					writeFileSync(
						join(dir, `${receivedAt.getTime()}-${mail.id}.json`),
						JSON.stringify(mail, null, 2)
					);
					callback();
				})
				.catch((e: Error) => callback(e));
		}
	});
	await new Promise<void>((ok, fail) => {
		server.once('error', fail);
		server.listen(port, host, () => ok());
	});
	const address = server.server.address() as AddressInfo;
	return {
		port: address.port,
		dir,
		close: () => new Promise<void>((ok) => server.close(() => ok()))
	};
}

// Run directly: `npx tsx src/lib/server/dev/mail-catcher.ts`
if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) {
	const port = Number(process.env.MAIL_CATCHER_PORT ?? 2525);
	startMailCatcher({ port }).then(
		(c) => console.log(`Mail catcher on smtp://127.0.0.1:${c.port}, keeping mail in ${c.dir}`),
		(e) => {
			console.error(`Mail catcher could not start: ${e.message}`);
			process.exit(1);
		}
	);
}
