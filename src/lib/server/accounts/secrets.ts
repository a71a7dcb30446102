import { createHash, randomBytes } from 'node:crypto';

/** Hex sha-256 of a secret: what is stored for tokens and links, never the secret itself. */
export function sha256(text: string) {
	return createHash('sha256').update(text).digest('hex');
}

/** A random url-safe secret of `bytes` random bytes. */
export function randomSecret(bytes = 32) {
	return randomBytes(bytes).toString('base64url');
}
