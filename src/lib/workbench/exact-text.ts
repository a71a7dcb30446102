/**
 * A stored length written back for editing without losing anything: the display precision never
 * becomes input. Inches as a fraction when the value is an exact 64th (23/32"), else decimal inches
 * with the digits it needs; millimetres with the digits they need.
 */
import { METRES_PER_INCH, formatLength } from '../engine/units/length';
import { NEWTONS_PER_LBF as LBF_IN_N } from '../engine/units/si';
import type { UserLengthUnit } from './lengths';

const CLOSE = 1e-9;

export function exactLengthText(metres: number, unit: UserLengthUnit): string {
	if (unit === 'mm') {
		for (let digits = 0; digits <= 6; digits++) {
			const text = formatLength(metres, { unit: 'mm', digits });
			if (Math.abs(Number.parseFloat(text) / 1000 - metres) < CLOSE) return text;
		}
		return formatLength(metres, { unit: 'mm', digits: 6 });
	}
	const inches = metres / METRES_PER_INCH;
	if (Math.abs(Math.round(inches * 64) - inches * 64) < 1e-6)
		return formatLength(metres, { unit: 'frac64' });
	for (let digits = 3; digits <= 8; digits++) {
		const text = formatLength(metres, { unit: 'decimal-in', digits });
		if (Math.abs(Number.parseFloat(text) * METRES_PER_INCH - metres) < CLOSE) return text;
	}
	return formatLength(metres, { unit: 'decimal-in', digits: 8 });
}

/** A stored force in the reader's system (lbf or N), with the digits it needs to read back exactly. */
export function exactForceText(newtons: number, unit: UserLengthUnit): string {
	const [perUnit, name] = unit === 'mm' ? [1, 'N'] : [LBF_IN_N, 'lbf'];
	const value = newtons / perUnit;
	for (let digits = 0; digits <= 9; digits++) {
		const text = value.toFixed(digits);
		if (Math.abs(Number.parseFloat(text) * perUnit - newtons) <= 1e-9 * Math.max(1, newtons))
			return `${trim(text)} ${name}`;
	}
	return `${trim(value.toFixed(9))} ${name}`;
}

const trim = (s: string) => (s.includes('.') ? s.replace(/\.?0+$/, '') : s);
