import type { ResolvedStock } from './capacity';
import type { CapacityCheck, FastenerPosition, JointPlan, JointRequest } from './types';

/** What one fastener planner returns; planJoint adds the common fields. */
export type FastenerPart = Pick<
	JointPlan,
	'description' | 'count' | 'positions' | 'spec' | 'perFastener' | 'notes' | 'warnings'
> & { checks: CapacityCheck[] };

export interface PlanContext {
	req: JointRequest;
	end: ResolvedStock;
	face: ResolvedStock;
	shearN: number;
	momentNM: number;
}

/** Positions in one row at the middle of the end piece's thickness. */
export function midRow(along: number[], thicknessM: number): FastenerPosition[] {
	return along.map((alongM) => ({ alongM, acrossM: thicknessM / 2, row: 0 }));
}

/** A fastener line at mid-thickness with the bearing at the compressed face: lever arm t/2 for the
 * couple that resists an end moment (statics; an assumption of this tool). */
export const momentArmM = (endThicknessM: number) => endThicknessM / 2;

/** Fractional-inch label for a screw length, to the nearest 1/8". */
export function inchLabel(inch: number): string {
	const eighths = Math.round(inch * 8);
	const whole = Math.floor(eighths / 8);
	let num = eighths % 8;
	let den = 8;
	while (num > 0 && num % 2 === 0) {
		num /= 2;
		den /= 2;
	}
	if (num === 0) return `${whole}"`;
	return whole > 0 ? `${whole}-${num}/${den}"` : `${num}/${den}"`;
}
