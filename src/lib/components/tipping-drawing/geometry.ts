/**
 * The side view's scale and placement: one scale for heights and depths (drawn to scale), the
 * case's front at a fixed margin with room for the push arrow, the wall behind it.
 */
import type { StabilityResult } from '../../engine/stability/types';

export interface SideViewInput {
	heightM: number;
	depthM: number;
	setbackM: number;
	result: StabilityResult;
}

export function sideView({ heightM, depthM }: SideViewInput) {
	const caseH = 340;
	const k = caseH / Math.max(heightM, 1e-3);
	const left = 150;
	const top = 40;
	const floor = top + heightM * k;
	// the case stands against the wall, a restraint's width away
	const wall = left + depthM * k + 8;
	return {
		k,
		top,
		floor,
		wall,
		W: wall + 200,
		H: floor + 76,
		/** metres behind the case front → drawing x */
		x: (m: number) => left + m * k,
		/** metres above the floor → drawing y */
		z: (m: number) => floor - m * k
	};
}

export type SideView = ReturnType<typeof sideView>;
