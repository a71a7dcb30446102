// What this phone keeps of a class session, in this tab only (sessionStorage): the seat token the
// server gave, the nickname, and the choice sent at each step. Nothing else is kept anywhere.
export interface Seat {
	seat: string;
	nickname: string;
	answers: Record<number, string>;
}

const key = (code: string) => `spanwright-class:${code}`;

export function loadSeat(code: string): Seat | null {
	try {
		const raw = sessionStorage.getItem(key(code));
		return raw ? (JSON.parse(raw) as Seat) : null;
	} catch {
		return null;
	}
}

export function saveSeat(code: string, seat: Seat | null) {
	try {
		if (seat) sessionStorage.setItem(key(code), JSON.stringify(seat));
		else sessionStorage.removeItem(key(code));
	} catch {
		// private browsing without storage: the seat lasts as long as the page
	}
}

/** A refusal's message from the API's problem body, or a plain fallback. */
export async function problemText(res: Response, fallback: string) {
	try {
		const body = (await res.json()) as { error?: string; issues?: { message: string }[] };
		return body.issues?.[0]?.message ?? body.error ?? fallback;
	} catch {
		return fallback;
	}
}
