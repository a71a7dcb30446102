/**
 * Units at the edge of the engine: read what people type, write what they read.
 * Lengths have their own small parser (length.ts); other quantities are read from an exact table of
 * the units the trade writes (unit-table.ts, via quantity.ts). Anything else falls back to mathjs
 * where quantity-full.ts has been imported (the server does, in hooks.server.ts); the browser
 * bundle carries no mathjs.
 */
export {
	METRES_PER_FOOT,
	METRES_PER_INCH,
	LENGTH_EXPECTED,
	QuantityError,
	formatLength,
	parseLength,
	tryParseLength,
	type LengthFormat,
	type LengthUnit
} from './length';
export {
	KG_PER_M3_PER_PCF,
	NEWTONS_PER_LBF,
	NEWTONS_PER_METRE_PER_PLF,
	PASCALS_PER_PSF,
	PASCALS_PER_PSI,
	STANDARD_GRAVITY,
	expectedFor,
	formatDensity,
	formatForce,
	formatLineLoad,
	formatMoment,
	formatNumber,
	formatPressure,
	parseQuantity,
	tryParseQuantity,
	type DensityUnit,
	type ForceUnit,
	type LineLoadUnit,
	type MomentUnit,
	type PressureUnit,
	type QuantityKind
} from './quantity';
