/**
 * A wall of cases and what the shop needs before cutting: checkWall (shelves, joints, tip-over),
 * the cut list, the sheet layouts, banding and hardware. Framework-free, SI in and out.
 */
import { bandingTotals, cutList, type BandingTotal, type CutList } from '../cutlist';
import { DEFAULT_SHEET_OPTIONS, planSheets, type SheetPlan, type SheetStock } from '../sheets';
import { materialName } from '../case/geometry';
import { checkWall } from './check';
import { isSheetGood } from './geometry';
import { hardwareList, type HardwareLine } from './hardware';
import type { WallDesign, WallResult } from './types';

export { checkWall } from './check';
export { hardwareList, hingesFor, type HardwareLine } from './hardware';
export { DEMO_WALL } from './demo';
export type * from './types';
export type { CutGroup, CutList, BandingTotal } from '../cutlist';
export type { SheetPlan, SheetLayout, Placement, Cut, Offcut } from '../sheets';

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

/** Sheet stock and saw for the layouts: a material by its id or name; a material not listed comes
 * in 4×8 sheets. */
export interface SheetRequest {
	kerfM: number;
	trimM: number;
	stocks: { material: string; lengthM: number; widthM: number; keepGrain?: boolean }[];
}

/** Veneered faces show their grain, so their parts keep it by default; painted or hidden faces
 * (MDO, sheathing plywood, MDF, particleboard) may turn (a choice of this tool, after issue 10). */
const VENEERED = new Set([
	'hardwood-plywood-veneer-core',
	'hardwood-plywood-mdf-core',
	'birch-multiply'
]);

/** Whether a material's parts keep their grain along the sheet when the user has not said. */
export function keepsGrainByDefault(material: string): boolean {
	return VENEERED.has(material);
}

export function wallSheets(
	w: WallDesign,
	req: SheetRequest = {
		kerfM: DEFAULT_SHEET_OPTIONS.kerfM,
		trimM: DEFAULT_SHEET_OPTIONS.trimM,
		stocks: []
	}
): { cutList: CutList; sheets: SheetPlan } {
	const check = checkWall(w);
	const list = cutList(check.parts, w.roughAllowance);
	const stocks: SheetStock[] = [];
	for (const g of list.groups) {
		if (stocks.some((s) => s.materialName === g.materialName)) continue;
		const id = typeof g.material === 'string' ? g.material : undefined;
		const given = req.stocks.find((s) => s.material === id || s.material === g.materialName);
		stocks.push({
			materialName: g.materialName,
			lengthM: given?.lengthM ?? DEFAULT_SHEET_OPTIONS.defaultStock.lengthM,
			widthM: given?.widthM ?? DEFAULT_SHEET_OPTIONS.defaultStock.widthM,
			keepGrain: given?.keepGrain ?? (id !== undefined && VENEERED.has(id))
		});
	}
	const options = { ...DEFAULT_SHEET_OPTIONS, kerfM: req.kerfM, trimM: req.trimM, stocks };
	return {
		cutList: list,
		sheets: planSheets(list.groups, (g) => !isSheetGood(g.material), options)
	};
}

export { materialName };
