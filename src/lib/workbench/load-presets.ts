/**
 * Load presets with their source. The design loads are the Architectural Woodwork Standards'
 * (AWI/AWMAC/WI, 2009, §1.2.21): 50 lb/ft² for school, hospital and library shelving, 40 lb/ft²
 * for all other shelving (constants in reference/materials.ts).
 */
import {
	AWS_DESIGN_LOAD_GENERAL_PSF,
	AWS_DESIGN_LOAD_LIBRARY_PSF
} from '../../../reference/materials';
import { PASCALS_PER_PSF, formatPressure } from '../engine/quantity';
import type { UserLengthUnit } from './lengths';

export interface LoadPreset {
	id: string;
	label: string;
	/** what lies on the shelf, for "after a year under the same …" */
	contents: string;
	pressurePa: number;
	source: string;
}

const AWS = 'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21';

export const LOAD_PRESETS: LoadPreset[] = [
	{
		id: 'aws-general',
		label: 'General shelving',
		contents: 'load',
		pressurePa: AWS_DESIGN_LOAD_GENERAL_PSF * PASCALS_PER_PSF,
		source: `${AWS}: 40 lb/ft² for all other shelving`
	},
	{
		id: 'aws-library',
		label: 'Library, school or hospital shelving',
		contents: 'books',
		pressurePa: AWS_DESIGN_LOAD_LIBRARY_PSF * PASCALS_PER_PSF,
		source: `${AWS}: 50 lb/ft² for school, hospital and library shelving`
	}
];

/** The preset's pressure as the user would type it in their unit system. */
export function presetText(preset: LoadPreset, unit: UserLengthUnit): string {
	return formatPressure(preset.pressurePa, { unit: unit === 'mm' ? 'kPa' : 'lbf/ft²' });
}
