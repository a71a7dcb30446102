// The answer to a form that e-mails a link (a sign-in link, a password reset): mail is down, the
// address has had too many links, or the same words whether or not the address has an account.
import { message, type SuperValidated } from 'sveltekit-superforms';
import { MAIL_UNAVAILABLE_MESSAGE } from '$lib/server/mail';

type Mailed = { ok: true } | { ok: false; retryAfterMinutes: number } | null;

export function linkMailedMessage<T extends Record<string, unknown>>(
	form: SuperValidated<T>,
	mailed: Mailed,
	sent: string
) {
	if (!mailed) return message(form, MAIL_UNAVAILABLE_MESSAGE, { status: 503 });
	if (!mailed.ok)
		return message(
			form,
			`We have sent several links to that address already; try again in ${mailed.retryAfterMinutes} minutes.`,
			{ status: 429 }
		);
	return message(form, sent);
}
