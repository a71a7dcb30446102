/**
 * Log an unexpected error with an id; the client sees only a plain message and that id. The app's
 * handleError (src/hooks.server.ts) and the compute fast path both answer with this.
 */
export function reportError(opts: {
	error: unknown;
	status: number;
	message: string;
	method: string;
	path: string;
}): { message: string; id: string } {
	const { error, status, message } = opts;
	const id = crypto.randomUUID();
	const where = `[${id}] ${status} ${opts.method} ${opts.path}`;
	// a refusal (4xx) is an everyday answer: one line, no stack; only server errors get the stack
	if (status >= 500) console.error(where, error);
	else if (status !== 404) console.warn(`${where}: ${message}`);
	return {
		message:
			status === 404 ? 'Not found.' : status >= 500 ? 'Something went wrong on our side.' : message,
		id
	};
}
