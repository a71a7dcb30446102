/**
 * Zod fields for quantities: each accepts a quantity string (`35 1/2"`, `40 lbf/ft^2`) or a number
 * in SI units and yields the SI number, with an issue that says what was expected.
 */
import { z } from 'zod';
import { expectedFor, tryParseQuantity, type QuantityKind } from '../engine/units';

type Bound = 'positive' | 'nonnegative' | 'any';

interface QuantityFieldOptions {
	bound?: Bound;
	/** largest sensible value in SI units (guards against typos such as 900 m for 900 mm) */
	max?: number;
	description?: string;
}

const SI_NAME: Record<QuantityKind, string> = {
	length: 'metres',
	force: 'newtons',
	pressure: 'pascals',
	lineLoad: 'newtons per metre',
	modulus: 'pascals',
	density: 'kilograms per cubic metre',
	moment: 'newton metres'
};

/** The SI unit a bound is written in: `at most 1e11 Pa`. */
const SI_SYMBOL: Record<QuantityKind, string> = {
	length: 'm',
	force: 'N',
	pressure: 'Pa',
	lineLoad: 'N/m',
	modulus: 'Pa',
	density: 'kg/m³',
	moment: 'N·m'
};

/** 1e11, 3000, 0.3: a bound as short as it is exact. */
function boundText(value: number): string {
	return Math.abs(value) >= 1e5 ? value.toExponential().replace('e+', 'e') : String(value);
}

const MIN_LENGTH_M = 1e-6;

/** A quantity of the given kind: string or SI number in, SI number out. */
export function quantityField(kind: QuantityKind, options: QuantityFieldOptions = {}) {
	const expected = expectedFor(kind);
	const bound = options.bound ?? 'positive';
	return z
		.union([z.string().max(60), z.number()], {
			error: `Expected ${expected} (a number is ${SI_NAME[kind]}).`
		})
		.transform((input, ctx) => {
			const read = tryParseQuantity(input, kind);
			if (!read.ok) {
				ctx.addIssue({ code: 'custom', input, message: `Expected ${read.expected}.` });
				return z.NEVER;
			}
			const value = read.value;
			if (bound === 'positive' && !(value > 0)) {
				ctx.addIssue({ code: 'custom', input, message: 'Must be greater than zero.' });
				return z.NEVER;
			}
			// a micrometre is far below any real part: a smaller length is a slip (and denormal numbers
			// would reach the solver)
			if (kind === 'length' && bound === 'positive' && value < MIN_LENGTH_M) {
				ctx.addIssue({
					code: 'custom',
					input,
					message: 'Too small: at least 0.001 mm. Check the unit.'
				});
				return z.NEVER;
			}
			if (bound === 'nonnegative' && !(value >= 0)) {
				ctx.addIssue({ code: 'custom', input, message: 'Must not be negative.' });
				return z.NEVER;
			}
			if (options.max !== undefined && Math.abs(value) > options.max) {
				ctx.addIssue({
					code: 'custom',
					input,
					message: `At most ${boundText(options.max)} ${SI_SYMBOL[kind]} (${SI_NAME[kind]}): check the unit.`
				});
				return z.NEVER;
			}
			return value;
		})
		.meta({
			description: options.description ?? `${expected}; a plain number is ${SI_NAME[kind]}`
		});
}

/** A length: string such as `35 1/2"` or `900 mm`, or a number of metres. */
export function lengthField(options: QuantityFieldOptions = {}) {
	return quantityField('length', options);
}
