/**
 * Deflection limits: how much sag a span may show. The one list of the limits offered by name,
 * each with where it comes from and how the pickers word it; a ratio (L/n) or a length of the
 * user's own covers everything else.
 */
import { METRES_PER_FOOT, METRES_PER_INCH } from '../units/length';
import type { LimitInput, NamedLimit } from './types';

export interface DeflectionLimit {
	name: string;
	source: string;
	/** sag allowed over a span (or a cantilever's reach) of this length, m */
	allowed(spanM: number): number;
}

export interface NamedDeflectionLimit extends DeflectionLimit {
	/** how a picker offers it */
	label: string;
}

/** The limits offered by name, in the order pickers show them. */
export const DEFLECTION_LIMITS: Readonly<Record<NamedLimit, NamedDeflectionLimit>> = {
	'L/144': {
		name: 'L/144',
		label: 'L/144, the woodwork standard',
		source:
			'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21: L/144 is the industry limit for shelf deflection',
		allowed: (l) => l / 144
	},
	'1/16in-per-ft': {
		name: '1/16" per foot, at most 1/4"',
		label: '1/16" per foot, at most 1/4" (kitchen cabinets)',
		source:
			'ANSI/KCMA A161.1-2012 §5.1, static loading on shelves: shelves loaded at 15 lb/ft² for seven days shall not deflect more than 1/16" per foot between supports, 1/4" at most (read from public summaries of the standard)',
		// 1/16" per foot of span, capped at 1/4" (ANSI/KCMA A161.1-2012 §5.1, required performance 2,
		// as a public summary of the standard's structural tests gives it)
		allowed: (l) => Math.min(((l / METRES_PER_FOOT) * METRES_PER_INCH) / 16, METRES_PER_INCH / 4)
	},
	'L/240': {
		name: 'L/240',
		label: 'L/240 (stiffer)',
		source:
			'a common structural deflection ratio (IBC Table 1604.3 uses it for some members, from memory); no shelf standard',
		allowed: (l) => l / 240
	},
	'L/360': {
		name: 'L/360',
		label: 'L/360 (stiffer still)',
		source:
			'a common structural deflection ratio (IBC Table 1604.3, floors under live load, from memory); no shelf standard',
		allowed: (l) => l / 360
	}
};

export function deflectionLimit(limit: LimitInput): DeflectionLimit {
	if (typeof limit === 'string') return DEFLECTION_LIMITS[limit as NamedLimit];
	if ('ratio' in limit) {
		const r = limit.ratio;
		return { name: `L/${r}`, source: limit.source ?? 'chosen by the user', allowed: (l) => l / r };
	}
	const length = limit.length;
	return {
		name: `${(length * 1000).toFixed(1)} mm`,
		source: 'chosen by the user',
		allowed: () => length
	};
}
