/** One field that needs attention: where (as in the request) and what was expected. */
export interface InputIssue {
	path: (string | number)[];
	message: string;
}

const segment = (s: string) => (/^\d+$/.test(s) ? Number(s) : s);

/**
 * The engine's one input error: a request it cannot compute, with every field that needs
 * attention. Thrown by every part of the engine (shelf, joinery, stability, case, wall) and by
 * src/lib/schemas' parse helpers, so callers catch one class.
 */
export class InputError extends Error {
	readonly issues: InputIssue[];
	constructor(issues: InputIssue[]) {
		const first = issues[0];
		const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
		super(
			first
				? `${first.path.join('.') || 'request'}: ${first.message}${more}`
				: 'The request is not valid.'
		);
		this.name = 'InputError';
		this.issues = issues;
	}

	/** One issue at a dotted field ("options.count", "shelves.2.height"). */
	static at(field: string, message: string): InputError {
		return new InputError([{ path: field ? field.split('.').map(segment) : [], message }]);
	}

	/** The first issue's field, dotted. */
	get field(): string {
		return this.issues[0]?.path.join('.') ?? '';
	}
}
