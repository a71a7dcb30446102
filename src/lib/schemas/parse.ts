/**
 * Reading a request with its shared schema, or one error naming every field that needs attention.
 */
import type { z } from 'zod';
import { ShelfInputError, type ShelfIssue } from '../engine/shelf';
import { JoineryInputError } from '../engine/joinery';

/** zod's issue path without symbols, as the engine's issues and the forms name a field. */
export function cleanPath(path: readonly PropertyKey[]): (string | number)[] {
	return path.filter((p): p is string | number => typeof p !== 'symbol');
}

function issuesOf(error: z.ZodError): ShelfIssue[] {
	return error.issues.map((i) => ({ path: cleanPath(i.path), message: i.message }));
}

/** Validate a shelf request with its schema; throws ShelfInputError naming each bad field. */
export function parseRequest<S extends z.ZodType>(schema: S, request: unknown): z.output<S> {
	const parsed = schema.safeParse(request);
	if (!parsed.success) throw new ShelfInputError(issuesOf(parsed.error));
	return parsed.data;
}

/** Parse a joint, stability or case request, or throw one error that lists every issue. */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
	const read = schema.safeParse(input);
	if (read.success) return read.data;
	const issues = issuesOf(read.error);
	const first = issues[0];
	const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
	throw new JoineryInputError(first.path.join('.'), first.message + more, issues);
}
