/**
 * The engine's load presets (reference/load-presets.ts, each with its source) as the shelf form
 * uses them: a kind of load, a text to type in the user's units, and what lies on the shelf.
 *
 * A preset writes a clean figure in the user's own unit system, and that figure is exactly what is
 * computed and stored: inch users get the published figure (40 lbf/ft²); metric users get it in kPa
 * or N/m rounded up to two significant figures (40 lbf/ft² = 1.915 kPa is written 2 kPa), so the
 * metric figure is never lighter than the published one.
 */
import { loadPresets } from '../engine/index';
import {
	NEWTONS_PER_METRE_PER_PLF,
	PASCALS_PER_PSF,
	formatNumber,
	tryParseQuantity
} from '../engine/units/quantity';
import { withLoadUnit } from '../components/quantity-input/reading';
import { loadUnitsFor, type UserLengthUnit } from './lengths';

export interface LoadPreset {
	id: string;
	label: string;
	kind: 'area' | 'line';
	/** the published load: Pa for an area load, N/m for a line load */
	valueSI: number;
	/** what lies on the shelf, for "in the long run under the same …" */
	contents: string;
	source: string;
}

const CONTENTS: Record<string, string> = {
	'aws-library': 'books',
	books: 'books',
	records: 'records',
	dishes: 'dishes'
};

export const LOAD_PRESETS: LoadPreset[] = loadPresets.map((p) => ({
	id: p.id,
	label: p.name,
	kind: p.load.kind,
	valueSI: p.load.kind === 'area' ? p.load.pressure : p.load.intensity,
	contents: CONTENTS[p.id] ?? 'load',
	source: p.source
}));

const quantityOf = (kind: LoadPreset['kind']) => (kind === 'area' ? 'pressure' : 'lineLoad');

/** Round up to two significant figures: 1.9152 → 2, 2.394 → 2.4, 510.8 → 520. */
export function roundUpClean(value: number): number {
	if (!(value > 0)) return value;
	const step = 10 ** (Math.floor(Math.log10(value)) - 1);
	// the hair of tolerance keeps a value already clean (2.4 stored as 2.4000000000000004) as it is
	return Number((Math.ceil(value / step - 1e-9) * step).toPrecision(2));
}

/** The preset's load as the user would type it in their unit system (what the picker writes). */
export function presetText(preset: LoadPreset, unit: UserLengthUnit): string {
	const units = loadUnitsFor(unit);
	const [symbol, perUnit] =
		preset.kind === 'area'
			? [units.pressure, unit === 'mm' ? 1000 : PASCALS_PER_PSF]
			: [units.lineLoad, unit === 'mm' ? 1 : NEWTONS_PER_METRE_PER_PLF];
	const inUnit = preset.valueSI / perUnit;
	const figure = unit === 'mm' ? roundUpClean(inUnit) : Number(inUnit.toPrecision(6));
	return `${formatNumber(figure, 6)} ${symbol}`;
}

/** What a load text is read as (SI), or undefined when it cannot be read. */
function readAs(kind: LoadPreset['kind'], text: string, unit: UserLengthUnit): number | undefined {
	const q = quantityOf(kind);
	const r = tryParseQuantity(withLoadUnit(text, q, unit), q);
	return r.ok ? r.value : undefined;
}

/** The preset a draft's load is exactly (`40 psf` and `40 lbf/ft²` alike), if any. */
export function presetOf(kind: string, text: string, unit: UserLengthUnit): LoadPreset | undefined {
	return LOAD_PRESETS.find((p) => {
		if (p.kind !== kind) return false;
		const typed = readAs(p.kind, text, unit);
		return typed !== undefined && typed === readAs(p.kind, presetText(p, unit), unit);
	});
}

/** Where the preset comes from, and for a metric user how its figure was written. */
export function presetSource(preset: LoadPreset, unit: UserLengthUnit): string {
	if (unit !== 'mm') return preset.source;
	const units = loadUnitsFor(unit);
	const exact =
		preset.kind === 'area'
			? `${formatNumber(preset.valueSI / 1000, 4)} ${units.pressure}`
			: `${formatNumber(preset.valueSI, 4)} ${units.lineLoad}`;
	return `${preset.source}; ${presetText(preset, unit)} is ${exact} rounded up`;
}
