import {
	PANEL_EDGE_SCREW_CORNER_DISTANCE_M,
	POCKET_BORE_DIAMETER_M,
	POCKET_FIRST_HOLE_M,
	POCKET_IN_PIECE_PER_STOCK,
	POCKET_MAX_SPACING_M,
	POCKET_SCREW_GAUGE,
	POCKET_SCREW_LENGTHS,
	THROUGH_SCREW_EMBED_IN,
	THROUGH_SCREW_GAUGE,
	END_GRAIN_LATERAL_FACTOR,
	screwBendingYieldPsi,
	screwMinSpacingM,
	screwShankDiameterIn
} from '../../../../reference/fasteners';
import { screwLateral, screwWithdrawal, type Grain, type ResolvedStock } from './capacity';
import { capacityCheck } from './checks';
import { cappedCountWarning, countThatFits, evenlyAlong, spacedAlong } from './layout';
import { inchLabel, midRow, momentArmM, type FastenerPart, type PlanContext } from './part';
import type { CapacityCheck } from './types';
import { inches, metres } from './units';

/** Common practice, no source: first pocket 2" from each edge, then every 6" at most; a joint under
 * 2-1/2" takes one screw. Between 2-1/2" and 8" the two pockets sit a quarter of the joint in from
 * each end (so they move apart smoothly as the joint grows, never 2" from ends that nearly meet);
 * from 8" on, 2" in. No two pockets closer than a pocket's bore. The count never falls as the joint
 * gets longer. */
export function pocketPlaces(lengthM: number): number[] {
	if (lengthM < metres(2.5)) return [lengthM / 2];
	const endM = Math.min(POCKET_FIRST_HOLE_M, lengthM / 4);
	return spacedAlong(lengthM, endM, POCKET_MAX_SPACING_M, POCKET_BORE_DIAMETER_M);
}

/** Screw length for the pocketed stock (common practice, no source). */
export function pocketScrewLengthIn(stockM: number): number {
	const t = inches(stockM);
	return POCKET_SCREW_LENGTHS.find((r) => t <= r.maxStockIn)!.screwIn;
}

const solidGrain = (s: ResolvedStock, solid: Grain, panel: Grain): Grain =>
	s.isPanel ? panel : solid;

function screwChecks(
	ctx: PlanContext,
	count: number,
	perWithdrawal: { designN: number; ultimateN: number; basis: string },
	perLateral: { designN: number; yieldN: number; basis: string }
): CapacityCheck[] {
	const tensionN = ctx.momentNM / momentArmM(ctx.req.endPiece.thicknessM);
	return [
		capacityCheck(
			'shear from the shelf reaction (screws loaded laterally)',
			'N',
			ctx.shearN,
			perLateral.designN * count,
			perLateral.yieldN * count,
			`${perLateral.basis}; ultimate column is the yield limit without Rd`
		),
		capacityCheck(
			'pull from the end moment (screws in withdrawal, lever arm half the stock thickness)',
			'N',
			tensionN,
			perWithdrawal.designN * count,
			perWithdrawal.ultimateN * count,
			perWithdrawal.basis
		)
	];
}

export function planPocketScrews(ctx: PlanContext): FastenerPart {
	const { req, end, face } = ctx;
	const notes: string[] = [];
	const warnings: string[] = [];
	const gauge = req.options?.screwGauge ?? POCKET_SCREW_GAUGE;
	const diameterM = metres(screwShankDiameterIn(gauge));
	const lengthM = req.options?.screwLengthM ?? metres(pocketScrewLengthIn(req.endPiece.thicknessM));
	const thread = face.kind === 'hardwood' ? 'fine' : 'coarse'; // common practice, no source
	const inPieceM = POCKET_IN_PIECE_PER_STOCK * req.endPiece.thicknessM;
	const penetrationM = Math.max(0, lengthM - inPieceM);
	const intoEdge = req.kind === 'rail-to-stile';
	if (!intoEdge && penetrationM > req.facePiece.thicknessM - metres(0.125))
		warnings.push(
			'The screw would come within 1/8" of the far face of the receiving piece: use a shorter screw.'
		);
	if (penetrationM < metres(0.375))
		warnings.push('Less than 3/8" of thread bites the receiving piece.');

	const asked = req.options?.count;
	const fixed = asked ? countThatFits(req.lengthM, asked, POCKET_BORE_DIAMETER_M) : 0;
	if (asked) warnings.push(...cappedCountWarning(asked, fixed, 'pocket', 'pockets'));
	const along = asked ? evenlyAlong(req.lengthM, fixed) : pocketPlaces(req.lengthM);
	const count = along.length;
	const grain: Grain = solidGrain(face, 'side', intoEdge ? 'panel-edge' : 'panel-face');
	const w = screwWithdrawal(face, grain, diameterM, penetrationM);
	// the screw runs nearly along the pocketed piece's grain: C_eg 0.67 for solid stock (NDS §12.5.2)
	const ceg = end.isPanel ? 1 : END_GRAIN_LATERAL_FACTOR;
	// bearing length in the pocketed piece below the counterbore: half its thickness (assumption)
	const lat = screwLateral(
		end,
		face,
		diameterM,
		req.endPiece.thicknessM / 2,
		penetrationM,
		screwBendingYieldPsi(inches(diameterM)),
		ceg
	);
	notes.push(`Thread: ${thread}, for ${face.name}.`);
	notes.push(
		'No peer-reviewed strength study of pocket-screw joints was found: the capacity comes from the wood-screw withdrawal and yield-limit formulas and is an estimate.'
	);
	return {
		description: `pocket screw #${gauge} × ${inchLabel(inches(lengthM))} ${thread} thread`,
		count,
		positions: midRow(along, req.endPiece.thicknessM),
		spec: {
			gauge,
			diameterM,
			lengthM,
			thread,
			penetrationM,
			firstHoleM: POCKET_FIRST_HOLE_M,
			maxSpacingM: POCKET_MAX_SPACING_M,
			minSpacingM: POCKET_BORE_DIAMETER_M
		},
		perFastener: { withdrawalN: w.designN, lateralN: lat.designN, momentNM: null },
		checks: screwChecks(ctx, count, w, lat),
		notes,
		warnings
	};
}

/** Screws through the case side into the end of the shelf (or top, bottom). */
export function planThroughScrews(ctx: PlanContext): FastenerPart {
	const { req, end, face } = ctx;
	const warnings: string[] = [];
	const gauge = req.options?.screwGauge ?? THROUGH_SCREW_GAUGE;
	const diameterM = metres(screwShankDiameterIn(gauge));
	const lengthM =
		req.options?.screwLengthM ?? req.facePiece.thicknessM + metres(THROUGH_SCREW_EMBED_IN);
	const penetrationM = Math.max(0, lengthM - req.facePiece.thicknessM);
	const firstM = end.isPanel ? PANEL_EDGE_SCREW_CORNER_DISTANCE_M : POCKET_FIRST_HOLE_M;
	const minM = screwMinSpacingM(diameterM); // EN 1995-1-1 Table 8.2
	const asked = req.options?.count;
	const fixed = asked ? countThatFits(req.lengthM, asked, minM) : 0;
	if (asked) warnings.push(...cappedCountWarning(asked, fixed, 'screw', 'screws'));
	const along = asked
		? evenlyAlong(req.lengthM, fixed)
		: spacedAlong(req.lengthM, firstM, POCKET_MAX_SPACING_M, minM);
	const count = along.length;
	const grain: Grain = solidGrain(end, 'end', 'panel-edge');
	const w = screwWithdrawal(end, grain, diameterM, penetrationM);
	const ceg = end.isPanel ? 1 : END_GRAIN_LATERAL_FACTOR; // into end grain, NDS §12.5.2
	const lat = screwLateral(
		face,
		end,
		diameterM,
		req.facePiece.thicknessM,
		penetrationM,
		screwBendingYieldPsi(inches(diameterM)),
		ceg
	);
	if (grain === 'end' && ctx.momentNM > 0)
		warnings.push(
			'Screws into end grain give no withdrawal (NDS §12.2.1): they cannot hold an end moment.'
		);
	if (end.isPanel && req.lengthM < 2 * PANEL_EDGE_SCREW_CORNER_DISTANCE_M)
		warnings.push(
			'The joint is too short to keep edge screws 70 mm from the corners (mdf-info.eu).'
		);
	return {
		description: `screw #${gauge} × ${inchLabel(inches(lengthM))} through the side`,
		count,
		positions: midRow(along, req.endPiece.thicknessM),
		spec: {
			gauge,
			diameterM,
			lengthM,
			penetrationM,
			firstM,
			maxSpacingM: POCKET_MAX_SPACING_M,
			minSpacingM: minM
		},
		perFastener: { withdrawalN: w.designN, lateralN: lat.designN, momentNM: null },
		checks: screwChecks(ctx, count, w, lat),
		notes: [],
		warnings
	};
}
