/**
 * Reading a request with its shared schema, or one error naming every field that needs attention.
 */
import type { z } from 'zod';
import { ShelfInputError, type ShelfIssue } from '../engine/shelf';
import { JoineryInputError } from '../engine/joinery';
import { fieldIssues } from './issues';

const issuesOf = (error: z.ZodError): ShelfIssue[] => fieldIssues(error);

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
