import { isHttpError, json } from '@sveltejs/kit';
import type { z } from 'zod';
import { fieldIssues } from '$lib/schemas/issues';

/** One issue with one field of a request: where it is and what was expected. */
export interface ProblemIssue {
	path: (string | number)[];
	message: string;
}

/** A JSON problem body `{ error, issues }` with the given status. */
export function problem(status: number, error: string, issues: ProblemIssue[] = []) {
	return json({ error, issues }, { status });
}

export function zodIssues(err: z.ZodError): ProblemIssue[] {
	return fieldIssues(err);
}

const MAX_BODY_BYTES = 256 * 1024;

const JSON_TYPE = /^application\/(?:[\w.+-]+\+)?json\s*(?:;|$)/i;

/**
 * Read and validate a JSON body with a shared schema. Returns the parsed data, or a problem
 * Response (400 for unreadable JSON, 413 for an oversized body, 415 for a body not sent as JSON,
 * 422 for a body that fails the schema).
 */
export async function readJson<S extends z.ZodType>(
	request: Request,
	schema: S
): Promise<{ ok: true; data: z.output<S> } | { ok: false; response: Response }> {
	const length = Number(request.headers.get('content-length') ?? 0);
	if (length > MAX_BODY_BYTES)
		return { ok: false, response: problem(413, 'The request body is too large.') };
	let raw: unknown;
	try {
		const text = await request.text();
		if (text.length > MAX_BODY_BYTES)
			return { ok: false, response: problem(413, 'The request body is too large.') };
		if (text.length && !JSON_TYPE.test(request.headers.get('content-type') ?? ''))
			return {
				ok: false,
				response: problem(415, 'Send the body as JSON, with Content-Type: application/json.')
			};
		raw = text.length ? JSON.parse(text) : {};
	} catch {
		return { ok: false, response: problem(400, 'The request body is not valid JSON.') };
	}
	const parsed = schema.safeParse(raw);
	if (!parsed.success)
		return {
			ok: false,
			response: problem(422, 'Some fields need attention.', zodIssues(parsed.error))
		};
	return { ok: true, data: parsed.data };
}

/**
 * Wrap an API handler so that the errors thrown by the data modules (`error(403, …)` from
 * requireRole, say) answer as JSON problems rather than SvelteKit's HTML or `{ message }`.
 */
export function api<E>(handler: (event: E) => Promise<Response> | Response) {
	return async (event: E): Promise<Response> => {
		try {
			return await handler(event);
		} catch (e) {
			if (isHttpError(e)) return problem(e.status, e.body.message);
			throw e;
		}
	};
}

/** Validate a URL's query string with a shared schema; a problem Response (422) when it fails. */
export function readQuery<S extends z.ZodType>(
	url: URL,
	schema: S
): { ok: true; data: z.output<S> } | { ok: false; response: Response } {
	const parsed = schema.safeParse(Object.fromEntries(url.searchParams));
	if (!parsed.success)
		return {
			ok: false,
			response: problem(422, 'Some query parameters need attention.', zodIssues(parsed.error))
		};
	return { ok: true, data: parsed.data };
}
