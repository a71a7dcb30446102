import type { ShelfIssue } from './types';

/** A request the engine cannot analyse, with every field that needs attention. */
export class ShelfInputError extends Error {
	readonly issues: ShelfIssue[];
	constructor(issues: ShelfIssue[]) {
		const first = issues[0];
		super(
			first
				? `${first.path.join('.') || 'request'}: ${first.message}${issues.length > 1 ? ` (and ${issues.length - 1} more)` : ''}`
				: 'The shelf request is not valid.'
		);
		this.name = 'ShelfInputError';
		this.issues = issues;
	}
}
