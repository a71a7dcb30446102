/**
 * Where uploaded files live. Keys are made by the server (random, never a user's path); a put is
 * whole or absent (a temporary name then a rename, or one object upload), so a crash mid-upload
 * leaves at most an orphan that the start-up sweep removes.
 */
export interface FileStore {
	/** A short word for logs and the health check: 'folder' or 's3'. */
	readonly kind: string;
	put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
	/** The file's bytes, or null when there is none under that key. */
	get(key: string): Promise<Uint8Array | null>;
	delete(key: string): Promise<void>;
	/** Every key under a prefix, with when it was written (for the orphan sweep). */
	list(prefix: string): Promise<{ key: string; modified: Date }[]>;
}

/** A key made only of what the server writes: folders of [a-z0-9-], no dots at the start. */
const SAFE_KEY = /^[a-z0-9-]+(\/[a-z0-9-]+(\.[a-z0-9]+)?)+$/;

export function checkKey(key: string) {
	if (!SAFE_KEY.test(key)) throw new Error(`Refused a storage key that the server did not make.`);
}
