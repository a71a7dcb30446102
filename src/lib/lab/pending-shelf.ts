/**
 * A shelf check tried before signing up, kept in this browser until its new account saves it
 * into a first project (the /keep page). Only the request is kept: the server validates it again
 * and recomputes the result on save, as for every analysis.
 */
const KEY = 'spanwright:pending-shelf';

export interface PendingShelf {
	name: string;
	input: unknown;
	/** when it was kept, ms since 1970 */
	at: number;
}

/** a kept check older than this is not saved any more */
const MAX_AGE_MS = 7 * 24 * 3600 * 1000;

export function keepPending(input: unknown, name: string, store: Storage = localStorage) {
	const pending: PendingShelf = { name, input, at: Date.now() };
	store.setItem(KEY, JSON.stringify(pending));
}

export function readPending(store: Storage = localStorage, now = Date.now()): PendingShelf | null {
	try {
		const raw = JSON.parse(store.getItem(KEY) ?? 'null') as Partial<PendingShelf> | null;
		if (!raw || typeof raw.name !== 'string' || typeof raw.at !== 'number' || !raw.input)
			return null;
		if (now - raw.at > MAX_AGE_MS) return null;
		return { name: raw.name.slice(0, 120), input: raw.input, at: raw.at };
	} catch {
		return null;
	}
}

export function clearPending(store: Storage = localStorage) {
	store.removeItem(KEY);
}
