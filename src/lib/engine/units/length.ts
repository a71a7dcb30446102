/**
 * Lengths as woodworkers write them, parsed and formatted without mathjs so the browser can
 * re-read a span on every keystroke. Everything inside the engine is metres.
 */

/** Exact by definition (international yard and pound agreement, 1959): 1 in = 25.4 mm. */
export const METRES_PER_INCH = 0.0254;
export const METRES_PER_FOOT = 12 * METRES_PER_INCH;

/** A quantity string that could not be read, with what was expected instead. */
export class QuantityError extends Error {
	readonly input: unknown;
	readonly expected: string;
	constructor(input: unknown, expected: string) {
		super(`Could not read ${JSON.stringify(input)}: expected ${expected}.`);
		this.name = 'QuantityError';
		this.input = input;
		this.expected = expected;
	}
}

export const LENGTH_EXPECTED =
	'a length such as 35 1/2", 35-1/2 in, 2\' 11-1/2", 3/4", 900 mm, 0.9 m or a plain number of metres';

const NUM = String.raw`(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?`;
// a whole number with an optional fraction ("35 1/2", "35-1/2"), a bare fraction, or a decimal
const MIXED = String.raw`(?:(\d+)[\s-]+(\d+)\/(\d+)|(\d+)\/(\d+)|(${NUM}))`;
const INCH_MARK = String.raw`(?:"|in\.?|inch|inches)`;
const FOOT_MARK = String.raw`(?:'|ft\.?|foot|feet)`;

const INCHES_ONLY = new RegExp(String.raw`^${MIXED}\s*${INCH_MARK}$`);
const FEET_INCHES = new RegExp(
	String.raw`^(${NUM})\s*${FOOT_MARK}(?:\s*-?\s*${MIXED}\s*${INCH_MARK}?)?$`
);
const METRIC = new RegExp(
	String.raw`^(${NUM})\s*(mm|millimet(?:er|re)s?|cm|centimet(?:er|re)s?|m|met(?:er|re)s?)$`
);
const PLAIN = new RegExp(String.raw`^[+-]?${NUM}$`);

function metricFactor(unit: string): number {
	if (unit.startsWith('mm') || unit.startsWith('milli')) return 0.001;
	if (unit.startsWith('c')) return 0.01;
	return 1;
}

/** Normalise typographic marks and decimal commas so the patterns stay small. */
function normalise(text: string): string {
	return text
		.trim()
		.toLowerCase()
		.replace(/[″“”]|''/g, '"')
		.replace(/[′‘’]/g, "'")
		.replace(/(\d),(\d{1,2}(?!\d))/g, '$1.$2') // "0,9 m" → "0.9 m"
		.replace(/(\d),(\d{3})/g, '$1$2') // "1,200 mm" → "1200 mm"
		.replace(/\s+/g, ' ');
}

/** The inches of a MIXED match (groups start at `g`), or NaN for a zero denominator. */
function mixedValue(m: RegExpMatchArray, g: number): number {
	if (m[g] !== undefined) return Number(m[g]) + Number(m[g + 1]) / Number(m[g + 2]);
	if (m[g + 3] !== undefined) return Number(m[g + 3]) / Number(m[g + 4]);
	if (m[g + 5] !== undefined) return Number(m[g + 5]);
	return 0;
}

/** Read a length; returns metres, or undefined when the text is not a length. */
function readLength(text: string): number | undefined {
	const s = normalise(text);
	if (s === '') return undefined;
	if (PLAIN.test(s)) return Number(s);
	let m = s.match(INCHES_ONLY);
	if (m) return mixedValue(m, 1) * METRES_PER_INCH;
	m = s.match(FEET_INCHES);
	if (m) return Number(m[1]) * METRES_PER_FOOT + mixedValue(m, 2) * METRES_PER_INCH;
	m = s.match(METRIC);
	if (m) return Number(m[1]) * metricFactor(m[2]);
	return undefined;
}

/**
 * Parse a length: `35 1/2"`, `35-1/2 in`, `2' 11-1/2"`, `3/4"`, `900 mm`, `0.9 m`; a number (or a
 * string of a plain number) is metres. Throws QuantityError naming what was expected.
 */
export function parseLength(input: string | number): number {
	if (typeof input === 'number') {
		if (Number.isFinite(input)) return input;
		throw new QuantityError(input, LENGTH_EXPECTED);
	}
	if (typeof input !== 'string') throw new QuantityError(input, LENGTH_EXPECTED);
	const metres = readLength(input);
	if (metres === undefined || !Number.isFinite(metres))
		throw new QuantityError(input, LENGTH_EXPECTED);
	return metres;
}

/** parseLength without a throw, for forms that re-read on every keystroke. */
export function tryParseLength(
	input: string | number
): { ok: true; value: number } | { ok: false; expected: string } {
	try {
		return { ok: true, value: parseLength(input) };
	} catch {
		return { ok: false, expected: LENGTH_EXPECTED };
	}
}

export type LengthUnit = 'frac16' | 'frac32' | 'frac64' | 'decimal-in' | 'mm' | 'm';

export interface LengthFormat {
	unit?: LengthUnit;
	/** write lengths of two feet or more as feet and inches: 2' 11 1/2" */
	feet?: boolean;
	/** digits after the point for decimal-in, mm and m (default 3, 1 below 10 mm else 0, 3) */
	digits?: number;
}

function gcd(a: number, b: number): number {
	while (b) [a, b] = [b, a % b];
	return a;
}

function trimZeros(s: string): string {
	return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** Whole inches and a reduced fraction: 35.5 at 16 → `35 1/2`. */
function fractionalInches(inches: number, denominator: number): string {
	const sixteenths = Math.round(inches * denominator);
	const whole = Math.floor(sixteenths / denominator);
	const rest = sixteenths - whole * denominator;
	if (rest === 0) return `${whole}`;
	const d = gcd(rest, denominator);
	const fraction = `${rest / d}/${denominator / d}`;
	return whole === 0 ? fraction : `${whole} ${fraction}`;
}

/**
 * Format metres for people: `35 1/2"` (frac16/32/64), `35.5"` (decimal-in), `902 mm`, `0.902 m`.
 * A non-zero length that rounds to nothing reads `< 1/16"` rather than a misleading `0"`.
 */
export function formatLength(metres: number, format: LengthFormat = {}): string {
	const unit = format.unit ?? 'frac16';
	if (!Number.isFinite(metres)) return '—';
	const sign = metres < 0 ? '-' : '';
	const abs = Math.abs(metres);
	if (unit === 'mm') {
		const mm = abs * 1000;
		const digits = format.digits ?? (mm < 10 ? 1 : 0);
		return `${sign}${trimZeros(mm.toFixed(digits))} mm`;
	}
	if (unit === 'm') return `${sign}${trimZeros(abs.toFixed(format.digits ?? 3))} m`;
	const inches = abs / METRES_PER_INCH;
	if (unit === 'decimal-in') return `${sign}${trimZeros(inches.toFixed(format.digits ?? 3))}"`;
	const denominator = unit === 'frac64' ? 64 : unit === 'frac32' ? 32 : 16;
	if (abs > 0 && Math.round(inches * denominator) === 0) return `< 1/${denominator}"`;
	if (format.feet && inches >= 24 - 0.5 / denominator) {
		const steps = Math.round(inches * denominator);
		const feet = Math.floor(steps / (12 * denominator));
		const rest = (steps - feet * 12 * denominator) / denominator;
		return rest === 0
			? `${sign}${feet}'`
			: `${sign}${feet}' ${fractionalInches(rest, denominator)}"`;
	}
	return `${sign}${fractionalInches(inches, denominator)}"`;
}

const EXACT_DENOMINATORS = [1, 2, 4, 8, 16, 32, 64, 128];

/**
 * A length written so that reading it back gives exactly the same metres, for a field the user
 * edits: display precision never becomes input. Inch users get the exact fraction where there is
 * one (23/32" at any precision), else a short decimal, else millimetres if those are exact (a metric
 * sheet stays `18 mm`); millimetre users get millimetres where a few decimals are exact, else the
 * exact fraction of an inch. Whatever has neither is written in full decimals.
 */
export function formatLengthExact(metres: number, unit: LengthUnit = 'frac16'): string {
	if (!Number.isFinite(metres) || metres < 0) return formatLength(metres, { unit });
	const exact = (text: string) => readLength(text) === metres;
	const inches = metres / METRES_PER_INCH;
	const fraction = () => {
		for (const d of EXACT_DENOMINATORS) {
			const text = `${fractionalInches(inches, d)}"`;
			if (Math.abs(Math.round(inches * d) - inches * d) < 1e-6 && exact(text)) return text;
		}
		return undefined;
	};
	const decimals = (scaled: number, suffix: string, from: number, to: number) => {
		for (let digits = from; digits <= to; digits++) {
			const text = `${trimZeros(scaled.toFixed(digits))}${suffix}`;
			if (exact(text)) return text;
		}
		return undefined;
	};
	const mm = metres * 1000;
	const found =
		unit === 'mm' || unit === 'm'
			? (decimals(mm, ' mm', 0, 3) ?? fraction() ?? decimals(mm, ' mm', 4, 12))
			: (fraction() ??
				decimals(inches, '"', 0, 4) ??
				decimals(mm, ' mm', 0, 3) ??
				decimals(inches, '"', 5, 15));
	return found ?? `${metres} m`;
}
