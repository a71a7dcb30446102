import type { CapacityCheck } from './types';

/** One capacity check of a whole joint: utilisation = demand / design; safety factor = ultimate / demand. */
export function capacityCheck(
	what: string,
	unit: CapacityCheck['unit'],
	demand: number,
	design: number,
	ultimate: number | null,
	basis: string
): CapacityCheck {
	// a demand below a micro-unit is no demand (keeps ratios finite)
	const d = Math.abs(demand) < 1e-6 ? 0 : Math.abs(demand);
	const utilisation = d === 0 ? 0 : design > 0 ? bounded(d / design) : Number.MAX_VALUE;
	return {
		what,
		unit,
		demand: d,
		design,
		ultimate,
		utilisation,
		safetyFactor: d > 0 && ultimate !== null ? bounded(ultimate / d) : null,
		pass: d === 0 || (design > 0 && d <= design),
		basis
	};
}

const bounded = (x: number) => (Number.isFinite(x) ? x : Number.MAX_VALUE);
