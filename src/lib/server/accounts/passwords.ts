import { hash, verify } from '@node-rs/argon2';
import { randomSecret } from './secrets';

/** argon2id with the library's defaults (its recommended parameters). */
export function hashPassword(password: string) {
	return hash(password);
}

// Verified against when there is no stored hash, so a miss costs as long as a hit.
let decoyHash: Promise<string> | undefined;

/** Whether `password` matches `storedHash`; with no stored hash it still takes as long, and says no. */
export async function passwordMatches(storedHash: string | null | undefined, password: string) {
	if (!storedHash) {
		decoyHash ??= hash(randomSecret());
		await verify(await decoyHash, password).catch(() => false);
		return false;
	}
	return verify(storedHash, password).catch(() => false);
}
