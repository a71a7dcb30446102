export interface InputIssue {
	path: (string | number)[];
	message: string;
}

/** A bad input to the joinery, stability or case engine: every field that needs attention, each
 * with what was expected. */
export class JoineryInputError extends Error {
	readonly field: string;
	readonly issues: InputIssue[];
	constructor(field: string, message: string, issues?: InputIssue[]) {
		super(`${field || 'request'}: ${message}`);
		this.name = 'JoineryInputError';
		this.field = field;
		this.issues = issues ?? [{ path: field ? field.split('.').map(segment) : [], message }];
	}
}

const segment = (s: string) => (/^\d+$/.test(s) ? Number(s) : s);

/** A finite number greater than zero, or a clear error naming the field. */
export function positive(value: unknown, field: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0)
		throw new JoineryInputError(
			field,
			`expected a finite number greater than zero, got ${String(value)}`
		);
	return value;
}

/** A finite number of zero or more, or a clear error naming the field. */
export function nonNegative(value: unknown, field: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value) || value < 0)
		throw new JoineryInputError(
			field,
			`expected a finite number of zero or more, got ${String(value)}`
		);
	return value;
}
