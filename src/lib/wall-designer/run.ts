/**
 * The wall as the screen runs it on every change: the shared schema reads the draft, the engine
 * checks the wall, lists its parts and lays out its sheets; every problem comes back keyed by the
 * form field it belongs to (never a thrown error in the middle of typing).
 */
import { fieldKey, type FieldIssue } from '../case-designer/check';
import { InputError } from '../engine/errors';
import { wallShop, wallSheets, type WallShop } from '../engine/wall';
import type { SheetPlan } from '../engine/sheets';
import type { WallDesign } from '../engine/wall/types';
import { toSheetRequest, toWallDesign, wallDesignSchema } from '../schemas/wall';
import type { UserLengthUnit } from '../workbench/lengths';
import { toInput, type WallDraft } from './draft';

type WallRun =
	| { ok: true; design: WallDesign; shop: WallShop; sheets: SheetPlan }
	| { ok: false; issues: FieldIssue[] };

export function runWall(draft: WallDraft, unit: UserLengthUnit): WallRun {
	const read = wallDesignSchema.safeParse(toInput(draft, unit));
	if (!read.success)
		return {
			ok: false,
			issues: read.error.issues.map((i) => ({ field: fieldKey(i.path), message: i.message }))
		};
	try {
		const design = toWallDesign(read.data);
		const shop = wallShop(design);
		const { sheets } = wallSheets(design, toSheetRequest(read.data));
		return { ok: true, design, shop, sheets };
	} catch (e) {
		if (e instanceof InputError)
			return {
				ok: false,
				issues: e.issues.map((i) => ({ field: fieldKey(i.path), message: i.message }))
			};
		throw e;
	}
}
