/**
 * zod's issues as the product names them: each with the exact field (a path of keys and indexes,
 * symbols dropped) and its own message. A union that fails reports the branch the input meant, not
 * zod's bare "Invalid input": the branch whose own type the input has (an object for a material
 * given by its figures, a string for a library id), then the one with the fewest issues.
 */
import type { z } from 'zod';

export interface FieldIssue {
	path: (string | number)[];
	message: string;
}

type RawIssue = z.core.$ZodIssue;

/** zod's issue path without symbols, as the engine's issues and the forms name a field. */
export function cleanPath(path: readonly PropertyKey[]): (string | number)[] {
	return path.filter((p): p is string | number => typeof p !== 'symbol');
}

/** Does this branch's failure say the input was not even of its type? */
const wrongType = (issues: readonly RawIssue[]) =>
	issues.some(
		(i) =>
			i.path.length === 0 &&
			(i.code === 'invalid_type' ||
				i.code === 'invalid_value' ||
				(i.code === 'invalid_union' && i.errors.length === 0))
	);

/** The issues of the branch the input meant, or undefined when no branch is a clear match. */
function meantBranch(issue: RawIssue): readonly RawIssue[] | undefined {
	if (issue.code !== 'invalid_union' || issue.errors.length === 0) return undefined;
	const fitting = issue.errors.filter((branch) => !wrongType(branch));
	if (fitting.length === 0) return undefined;
	return [...fitting].sort((a, b) => a.length - b.length)[0];
}

function expand(issue: RawIssue, prefix: (string | number)[]): FieldIssue[] {
	const path = [...prefix, ...cleanPath(issue.path)];
	const branch = meantBranch(issue);
	if (branch) return branch.flatMap((i) => expand(i, path));
	return [{ path, message: issue.message }];
}

/** Every issue of a failed parse, each naming its exact field. */
export function fieldIssues(error: { issues: readonly RawIssue[] }): FieldIssue[] {
	return error.issues.flatMap((i) => expand(i, []));
}
