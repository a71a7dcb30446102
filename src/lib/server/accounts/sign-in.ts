import { passwordMatches } from './passwords';
import { clearSignInFailures, recordSignInFailure, signInGate } from './throttle';
import { findUserByEmail, type AccountUser } from './users';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** The user when the e-mail and password match; null otherwise (no hint which one was wrong). */
export async function verifyPassword(email: string, password: string): Promise<AccountUser | null> {
	const user = await findUserByEmail(email);
	const ok = await passwordMatches(user?.email ? user.passwordHash : null, password);
	return ok && user?.email ? { id: user.id, email: user.email, name: user.name } : null;
}

type PasswordSignInResult =
	| { ok: true; user: AccountUser }
	| { ok: false; reason: 'wrong' }
	| { ok: false; reason: 'unverified' }
	| { ok: false; reason: 'throttled'; retryAfterMinutes: number };

/** The whole password check: throttle, slow down, verify, record the outcome. */
export async function passwordSignIn(
	input: { email: string; password: string },
	clientAddress: string
): Promise<PasswordSignInResult> {
	const gate = await signInGate(input.email, clientAddress);
	if (gate.state === 'refused')
		return { ok: false, reason: 'throttled', retryAfterMinutes: gate.retryAfterMinutes };
	if (gate.state === 'slow') await sleep(gate.delayMs);
	const user = await verifyPassword(input.email, input.password);
	if (!user) {
		await recordSignInFailure(input.email, clientAddress);
		return { ok: false, reason: 'wrong' };
	}
	await clearSignInFailures(input.email, clientAddress);
	// An unconfirmed address could be someone else's; invitations are matched by address, so the
	// address must be proven (by a mailed link) before the password alone lets anyone in.
	if (!(await findUserByEmail(user.email))?.emailVerified)
		return { ok: false, reason: 'unverified' };
	return { ok: true, user };
}
