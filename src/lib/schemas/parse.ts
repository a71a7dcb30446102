/**
 * Reading a request with its shared schema, or one error naming every field that needs attention.
 */
import type { z } from 'zod';
import { InputError } from '../engine/errors';
import { fieldIssues } from './issues';

/** Read a request (shelf, joint, tipping, case, wall) with its schema into the engine's typed
 * input; throws the engine's InputError naming every bad field. */
export function parseRequest<S extends z.ZodType>(schema: S, request: unknown): z.output<S> {
	const parsed = schema.safeParse(request);
	if (!parsed.success) throw new InputError(fieldIssues(parsed.error));
	return parsed.data;
}
