import { DrizzleAdapter } from '@auth/drizzle-adapter';
import {
	AuthError,
	CredentialsSignin,
	SvelteKitAuth,
	type SvelteKitAuthConfig
} from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import Nodemailer from '@auth/sveltekit/providers/nodemailer';
import { isRedirect, type Handle, type RequestEvent } from '@sveltejs/kit';
import { AsyncLocalStorage } from 'node:async_hooks';
import { dev } from '$app/environment';
import { env } from '$env/dynamic/private';
import { signInSchema } from '$lib/schemas/account';
import { safeRedirectPath } from '$lib/schemas/return-path';
import { allowMailTo } from './accounts/mail-allowance';
import { endSession, newSessionId, sessionIsCurrent } from './accounts/sessions';
import { passwordSignIn } from './accounts/sign-in';
import { throttleMessage } from './accounts/throttle';
import { findUserByEmail } from './accounts/users';
import { getDb, type Db } from './db';
import { accounts, sessions, users, verificationTokens } from './db/tables';
import {
	linkOrigin,
	MailUnavailable,
	mailFrom,
	sendAddressConfirmation,
	sendNoAccountNotice,
	sendSignInLink,
	smtpUrl
} from './mail';

/** Thrown by the password check when the throttle refuses; carries the wait for the message. */
class SignInThrottled extends CredentialsSignin {
	code = 'throttled';
	constructor(readonly retryAfterMinutes: number) {
		super(throttleMessage(retryAfterMinutes));
	}
}

/** Thrown when the password is right but the address has not been confirmed by a mailed link. */
class EmailUnconfirmed extends CredentialsSignin {
	code = 'unconfirmed';
}

const SIGN_IN_LINK_MAX_AGE_S = 60 * 60;

const DEV_SECRET = 'spanwright-dev-only-secret-never-use-in-production';
let warnedDevSecret = false;

export function authSecret(): string {
	const secret = env.AUTH_SECRET || process.env.AUTH_SECRET;
	if (secret) return secret;
	if (!dev)
		throw new Error(
			'AUTH_SECRET is not set. Spanwright signs its session cookies with it: generate one with ' +
				'`openssl rand -base64 33` and set AUTH_SECRET in the environment before starting the server.'
		);
	if (!warnedDevSecret) {
		warnedDevSecret = true;
		console.warn('AUTH_SECRET is not set; using a fixed development secret (dev only).');
	}
	return DEV_SECRET;
}

/** Auth.js puts the request's host into the link; mail it with our configured origin instead. */
function rebase(url: string, event: RequestEvent) {
	const u = new URL(url);
	const origin = new URL(linkOrigin(event.url));
	u.protocol = origin.protocol;
	u.host = origin.host;
	return u.toString();
}

// The request Auth.js is working for: the password check throttles by its client address, and the
// mailed link is rebased on its origin. Set around every call into Auth.js (authHandle, the actions).
const currentEvent = new AsyncLocalStorage<RequestEvent>();

function requestEvent(): RequestEvent {
	const event = currentEvent.getStore();
	if (!event) throw new Error('Auth.js was called outside a request');
	return event;
}

let built: { db: Db; config: SvelteKitAuthConfig } | undefined;

/**
 * Auth.js's configuration, built once on first use (so nothing opens the database at build time) and
 * again only when the database itself is swapped (tests give each file its own).
 */
export function authConfig(): SvelteKitAuthConfig {
	const db = getDb();
	if (built?.db !== db) built = { db, config: buildAuthConfig(db) };
	return built.config;
}

function buildAuthConfig(db: Db): SvelteKitAuthConfig {
	return {
		secret: authSecret(),
		trustHost: true,
		session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
		adapter: DrizzleAdapter(db, {
			usersTable: users,
			accountsTable: accounts,
			sessionsTable: sessions,
			verificationTokensTable: verificationTokens
		}),
		logger: {
			// a wrong password is an everyday answer, not a server error worth a stack in the log
			error(e) {
				if (e instanceof CredentialsSignin || e.name === 'CredentialsSignin') return;
				console.error(`[auth] ${e.name}: ${e.message}`, e.cause ?? '');
			}
		},
		pages: { signIn: '/signin', error: '/signin', verifyRequest: '/signin', signOut: '/signout' },
		providers: [
			Credentials({
				id: 'credentials',
				credentials: { email: {}, password: {} },
				async authorize(credentials) {
					const parsed = signInSchema.pick({ email: true, password: true }).safeParse(credentials);
					if (!parsed.success) return null;
					const result = await passwordSignIn(parsed.data, requestEvent().getClientAddress());
					if (result.ok) return result.user;
					if (result.reason === 'throttled') throw new SignInThrottled(result.retryAfterMinutes);
					if (result.reason === 'unverified') throw new EmailUnconfirmed();
					return null;
				}
			}),
			Nodemailer({
				server: smtpUrl(),
				from: mailFrom(),
				maxAge: SIGN_IN_LINK_MAX_AGE_S,
				async sendVerificationRequest({ identifier, url }) {
					const link = rebase(url, requestEvent());
					if ((await findUserByEmail(identifier))?.emailVerified)
						await sendSignInLink(identifier, link);
					else await sendAddressConfirmation(identifier, link);
				}
			})
		],
		callbacks: {
			// where Auth.js sends people after a link or a sign-out: only paths on this site
			redirect({ url, baseUrl }) {
				const base = new URL(baseUrl);
				let path = '/';
				try {
					const u = new URL(url, base);
					if (u.origin === base.origin) path = u.pathname + u.search + u.hash;
				} catch {
					// an unreadable target goes home
				}
				return base.origin + safeRedirectPath(path, '/');
			},
			// Links go only to existing accounts; sign-up (with a name and a password) makes accounts.
			async signIn({ account, email, user }) {
				if (account?.provider === 'nodemailer' && email?.verificationRequest)
					return Boolean(user.email && (await findUserByEmail(user.email)));
				return true;
			},
			// each sign-in gets an id that stays in the token as Auth.js renews it, so signing out can
			// end that one session on the server
			jwt({ token, user }) {
				if (user) token.sid = newSessionId();
				return token;
			},
			async session({ session, token }) {
				if (token.sub && session.user && (await sessionIsCurrent(token.sub, token.iat, token.sid)))
					session.user.id = token.sub;
				return session;
			}
		},
		events: {
			async signOut(message) {
				if ('token' in message && message.token) await endSession(message.token);
			}
		}
	};
}

const kit = SvelteKitAuth(async () => authConfig());

// Open API routes that read no stored data (the compute routes, materials, health, the API
// document): no session to read, so Auth.js does no work for them.
export const OPEN_API =
	/^\/api\/v1\/(shelf(\/[\w-]+)?|joints|stability|cases\/check|walls\/(check|cutlist|sheets)|materials|health|openapi\.json)\/?$/;

/** Auth.js: answers /auth/* and gives `locals.auth()`; skipped on the open API routes. */
export const authHandle: Handle = ({ event, resolve }) => {
	if (OPEN_API.test(event.url.pathname)) return resolve(event);
	return currentEvent.run(event, () => kit.handle({ event, resolve }));
};

const signIn = (event: RequestEvent) => currentEvent.run(event, () => kit.signIn(event));
const signOut = (event: RequestEvent) => currentEvent.run(event, () => kit.signOut(event));

type AuthAction = typeof signIn;

// Auth.js's form actions read the request body themselves; ours already read it (superforms), so
// hand them a fresh request with just the fields they need, and catch the redirect they throw.
async function runAuthAction(
	action: AuthAction,
	event: RequestEvent,
	fields: Record<string, string>
) {
	const headers = new Headers(event.request.headers);
	headers.delete('content-type');
	headers.delete('content-length');
	// Auth.js builds its URLs from the host header; a request made in-process may lack it
	if (!headers.has('host')) headers.set('host', event.url.host);
	const request = new Request(event.request.url, {
		method: 'POST',
		headers,
		body: new URLSearchParams(fields)
	});
	try {
		await action({ ...event, request } as RequestEvent);
	} catch (e) {
		if (isRedirect(e)) return e.location;
		throw e;
	}
	throw new Error('Auth.js finished without a redirect');
}

type PasswordSignInOutcome =
	| { ok: true; location: string }
	| { ok: false; status: 400 | 429; message: string; unconfirmed?: true };

/** Sign in with e-mail and password through Auth.js (sets the session cookie on success). */
export async function signInWithPassword(
	event: RequestEvent,
	input: { email: string; password: string; redirectTo: string }
): Promise<PasswordSignInOutcome> {
	try {
		const location = await runAuthAction(signIn, event, { providerId: 'credentials', ...input });
		return { ok: true, location };
	} catch (e) {
		if (e instanceof SignInThrottled)
			return { ok: false, status: 429, message: throttleMessage(e.retryAfterMinutes) };
		if (e instanceof EmailUnconfirmed)
			return {
				ok: false,
				status: 400,
				unconfirmed: true,
				message:
					'Confirm your e-mail address first: open the link we mailed you. We have just sent a fresh one.'
			};
		if (e instanceof CredentialsSignin)
			return {
				ok: false,
				status: 400,
				message: 'That e-mail and password do not match an account.'
			};
		throw e;
	}
}

/**
 * Mail a sign-in link through Auth.js's e-mail provider. An address without an account gets a short
 * note pointing to sign-up instead, so the page's answer is the same either way.
 */
export async function mailSignInLink(
	event: RequestEvent,
	input: { email: string; redirectTo: string }
): Promise<{ ok: true } | { ok: false; retryAfterMinutes: number }> {
	const allowed = await allowMailTo(input.email);
	if (!allowed.ok) return allowed;
	if (!(await findUserByEmail(input.email))) {
		await sendNoAccountNotice(input.email, `${linkOrigin(event.url)}/signup`);
		return { ok: true };
	}
	try {
		await runAuthAction(signIn, event, { providerId: 'nodemailer', ...input });
	} catch (e) {
		// Auth.js wraps a failure of sendVerificationRequest as EmailSignInError
		if (e instanceof AuthError && e.type === 'EmailSignInError') throw new MailUnavailable(e);
		throw e;
	}
	return { ok: true };
}

/** Clear the session cookie through Auth.js. */
export async function signOutOf(event: RequestEvent) {
	await runAuthAction(signOut, event, { redirectTo: '/' });
}
