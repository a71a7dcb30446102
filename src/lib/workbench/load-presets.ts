/**
 * The engine's load presets (reference/load-presets.ts, each with its source) as the shelf form
 * uses them: a kind of load, a text to type in the user's units, and what lies on the shelf.
 */
import { loadPresets } from '../engine/index';
import { formatLineLoad, formatPressure } from '../engine/units/quantity';
import type { UserLengthUnit } from './lengths';

export interface LoadPreset {
	id: string;
	label: string;
	kind: 'area' | 'line';
	/** Pa for an area load, N/m for a line load */
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

/** The preset's load as the user would type it in their unit system. */
export function presetText(preset: LoadPreset, unit: UserLengthUnit): string {
	const metric = unit === 'mm';
	return preset.kind === 'area'
		? formatPressure(preset.valueSI, { unit: metric ? 'kPa' : 'lbf/ft²' })
		: formatLineLoad(preset.valueSI, { unit: metric ? 'N/m' : 'lbf/ft' });
}

/** The preset a draft's load matches, if any. */
export function presetOf(kind: string, text: string, unit: UserLengthUnit): LoadPreset | undefined {
	return LOAD_PRESETS.find((p) => p.kind === kind && presetText(p, unit) === text.trim());
}
