/**
 * Deflection limits: how much sag a span may show. Each names where it comes from.
 */
import type { LimitInput } from './types';

const INCH = 0.0254;
const FOOT = 0.3048;

export interface DeflectionLimit {
	name: string;
	source: string;
	/** sag allowed over a span (or a cantilever's reach) of this length, m */
	allowed(spanM: number): number;
}

const NAMED: Record<Exclude<LimitInput, object>, DeflectionLimit> = {
	'L/144': {
		name: 'L/144',
		source:
			'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21: L/144 is the industry limit for shelf deflection',
		allowed: (l) => l / 144
	},
	'L/240': {
		name: 'L/240',
		source:
			'a common structural deflection ratio (IBC Table 1604.3 uses it for some members, from memory); no shelf standard',
		allowed: (l) => l / 240
	},
	'L/360': {
		name: 'L/360',
		source:
			'a common structural deflection ratio (IBC Table 1604.3, floors under live load, from memory); no shelf standard',
		allowed: (l) => l / 360
	},
	'1/16in-per-ft': {
		name: '1/16" per foot, at most 1/4"',
		source:
			'ANSI/KCMA A161.1 §5.1 kitchen-cabinet shelf test (read from a secondary summary; unverified)',
		// 1/16" per foot of span, capped at 1/4" (ANSI/KCMA A161.1 §5.1, unverified)
		allowed: (l) => Math.min(((l / FOOT) * INCH) / 16, INCH / 4)
	},
	'0.02in-per-ft': {
		name: '0.02" per foot',
		source: 'common practice, no source: the sag most people stop noticing (about L/600)',
		// 0.02" per foot of span (common practice, no source)
		allowed: (l) => (l / FOOT) * 0.02 * INCH
	}
};

export function deflectionLimit(limit: LimitInput): DeflectionLimit {
	if (typeof limit === 'string') return NAMED[limit as keyof typeof NAMED];
	if ('ratio' in limit) {
		const r = limit.ratio;
		return { name: `L/${r}`, source: 'chosen by the user', allowed: (l) => l / r };
	}
	const length = limit.length;
	return {
		name: `${(length * 1000).toFixed(1)} mm`,
		source: 'chosen by the user',
		allowed: () => length
	};
}
