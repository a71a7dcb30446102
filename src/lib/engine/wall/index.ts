/**
 * A wall of cases and what the shop needs before cutting: checkWall (shelves, joints, tip-over),
 * the cut list, the sheet layouts, banding and hardware. Framework-free, SI in and out.
 */
import { bandingTotals, cutList, type BandingTotal, type CutList } from '../cutlist';
import { DEFAULT_SHEET_OPTIONS, planSheets, type SheetOptions, type SheetPlan } from '../sheets';
import { checkWall } from './check';
import { isSheetGood } from './geometry';
import { hardwareList, type HardwareLine } from './hardware';
import type { WallDesign, WallResult } from './types';

export { checkWall } from './check';
export { hardwareList, hingesFor, type HardwareLine } from './hardware';
export { DEMO_WALL } from './demo';
export type * from './types';

export interface WallShop {
	check: WallResult;
	cutList: CutList;
	banding: BandingTotal[];
	hardware: HardwareLine[];
}

/** The check plus the cut list, banding and hardware. */
export function wallShop(w: WallDesign): WallShop {
	const check = checkWall(w);
	const list = cutList(check.parts, w.roughAllowance);
	return {
		check,
		cutList: list,
		banding: bandingTotals(list.groups, w.bandingWaste),
		hardware: hardwareList(w, check)
	};
}

/** The sheet layouts of the wall's cut list. */
export function wallSheets(
	w: WallDesign,
	options: SheetOptions = DEFAULT_SHEET_OPTIONS
): {
	cutList: CutList;
	sheets: SheetPlan;
} {
	const check = checkWall(w);
	const list = cutList(check.parts, w.roughAllowance);
	return {
		cutList: list,
		sheets: planSheets(list.groups, (g) => !isSheetGood(g.material), options)
	};
}
