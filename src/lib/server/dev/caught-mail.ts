/**
 * Reading what the dev mail catcher kept (see mail-catcher.ts): for the /dev/mail page and for tests
 * that follow links from mail. Plain Node, so Playwright tests can import it too.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { defaultMailDir, type CaughtMail } from './mail-catcher';

export type { CaughtMail };

/** Every caught message, newest first. */
export function listCaughtMail(dir = defaultMailDir()): CaughtMail[] {
	if (!existsSync(dir)) return [];
	return readdirSync(dir)
		.filter((f) => f.endsWith('.json'))
		.sort()
		.reverse()
		.map((f) => JSON.parse(readFileSync(join(dir, f), 'utf8')) as CaughtMail);
}

/** The newest message to this address (with its links), or null. */
export function latestMailTo(email: string, dir = defaultMailDir()): CaughtMail | null {
	const to = email.trim().toLowerCase();
	return listCaughtMail(dir).find((m) => m.to.includes(to)) ?? null;
}

/**
 * Wait for a message to this address that arrived after `after` (default: any), e.g. right after
 * submitting a form. Mail is sent while the request runs, but the catcher writes it a moment later.
 */
export async function waitForMailTo(
	email: string,
	{
		dir = defaultMailDir(),
		after = new Date(0),
		timeoutMs = 10000,
		subject
	}: {
		dir?: string;
		after?: Date;
		timeoutMs?: number;
		subject?: RegExp;
	} = {}
): Promise<CaughtMail> {
	const to = email.trim().toLowerCase();
	const deadline = Date.now() + timeoutMs;
	for (;;) {
		const found = listCaughtMail(dir).find(
			(m) =>
				m.to.includes(to) &&
				new Date(m.receivedAt) >= after &&
				(!subject || subject.test(m.subject))
		);
		if (found) return found;
		if (Date.now() > deadline)
			throw new Error(`No mail to ${to} arrived within ${timeoutMs} ms in ${dir}`);
		await new Promise((r) => setTimeout(r, 100));
	}
}
