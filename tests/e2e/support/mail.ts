import { waitForMailTo } from '../../../src/lib/server/dev/caught-mail';
import { E2E_MAIL_DIR } from './env';

/** The first link of the newest mail to `email` that arrived after `after`. */
export async function linkFromMail(email: string, after: Date, subject?: RegExp) {
	const mail = await waitForMailTo(email, { dir: E2E_MAIL_DIR, after, subject, timeoutMs: 15000 });
	const link = mail.links.find((l) => l.includes('localhost'));
	if (!link) throw new Error(`No link in the mail "${mail.subject}" to ${email}`);
	return { mail, link };
}
