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

/** The largest JSON body the API reads (its 413 beyond). */
export const MAX_BODY_BYTES = 256 * 1024;

/** A JSON media type: application/json or application/<anything>+json. */
export const JSON_TYPE = /^application\/(?:[\w.+-]+\+)?json\s*(?:;|$)/i;

type JsonRead<T> =
	{ ok: true; data: T } | { ok: false; status: number; error: string; issues: ProblemIssue[] };

/**
 * The checks of readJson on a body already read as text (the compute fast path reads its own):
 * 413 beyond MAX_BODY_BYTES, 415 for a body not sent as JSON, 400 for unreadable JSON, 422 for a
 * body that fails the schema. An empty body is read as `{}`.
 */
export function parseJsonText<S extends z.ZodType>(
	text: string,
	contentType: string | null | undefined,
	schema: S
): JsonRead<z.output<S>> {
	if (text.length > MAX_BODY_BYTES)
		return { ok: false, status: 413, error: 'The request body is too large.', issues: [] };
	if (text.length && !JSON_TYPE.test(contentType ?? ''))
		return {
			ok: false,
			status: 415,
			error: 'Send the body as JSON, with Content-Type: application/json.',
			issues: []
		};
	let raw: unknown;
	try {
		raw = text.length ? JSON.parse(text) : {};
	} catch {
		return { ok: false, status: 400, error: 'The request body is not valid JSON.', issues: [] };
	}
	const parsed = schema.safeParse(raw);
	if (!parsed.success)
		return {
			ok: false,
			status: 422,
			error: 'Some fields need attention.',
			issues: zodIssues(parsed.error)
		};
	return { ok: true, data: parsed.data };
}

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
	let text: string;
	try {
		text = await request.text();
	} catch {
		return { ok: false, response: problem(400, 'The request body is not valid JSON.') };
	}
	const read = parseJsonText(text, request.headers.get('content-type'), schema);
	if (!read.ok) return { ok: false, response: problem(read.status, read.error, read.issues) };
	return read;
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
