import { InputError } from '../errors';

/** A finite number greater than zero, or a clear error naming the field. */
export function positive(value: unknown, field: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0)
		throw InputError.at(field, `expected a finite number greater than zero, got ${String(value)}`);
	return value;
}

/** A finite number of zero or more, or a clear error naming the field. */
export function nonNegative(value: unknown, field: string): number {
	if (typeof value !== 'number' || !Number.isFinite(value) || value < 0)
		throw InputError.at(field, `expected a finite number of zero or more, got ${String(value)}`);
	return value;
}
