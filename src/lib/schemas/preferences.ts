export const LENGTH_UNITS = ['frac16', 'frac32', 'frac64', 'decimal-in', 'mm'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export const LENGTH_UNIT_LABELS: Record<LengthUnit, string> = {
	frac16: 'Fractional inches, to 1/16"',
	frac32: 'Fractional inches, to 1/32"',
	frac64: 'Fractional inches, to 1/64"',
	'decimal-in': 'Decimal inches',
	mm: 'Millimetres'
};
