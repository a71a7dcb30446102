/**
 * Ready-made loads. Design loads name their standard; content loads are trade habits or recalled
 * figures and say so. Pressures in Pa (1 lbf/ft² = 47.880259 Pa), line loads in N/m.
 */
const PSF = 47.88025898;
const PLF = 14.59390294; // 1 lbf/ft in N/m

export interface LoadPreset {
	id: string;
	name: string;
	load: { kind: 'area'; pressure: number } | { kind: 'line'; intensity: number };
	source: string;
}

export const loadPresets: LoadPreset[] = [
	{
		id: 'aws-general',
		name: 'General shelving, 40 lb/ft²',
		load: { kind: 'area', pressure: 40 * PSF },
		source: 'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21.2.2'
	},
	{
		id: 'aws-library',
		name: 'School, hospital, library or book shelving, 50 lb/ft²',
		load: { kind: 'area', pressure: 50 * PSF },
		source: 'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21.2.1'
	},
	{
		id: 'books',
		name: 'A row of hardcover books, about 20 lb per foot',
		load: { kind: 'line', intensity: 20 * PLF },
		source: 'common practice, no source'
	},
	{
		id: 'records',
		name: 'A row of 12" vinyl records, about 35 lb per foot',
		load: { kind: 'line', intensity: 35 * PLF },
		source: 'from memory: about 80 records per foot at about 200 g each'
	},
	{
		id: 'dishes',
		name: 'Stacked dinner plates and bowls, about 30 lb/ft²',
		load: { kind: 'area', pressure: 30 * PSF },
		source: 'common practice, no source'
	}
];
