import {
	BISCUITS,
	BISCUIT_10_MIN_STOCK_IN,
	BISCUIT_20_MIN_STOCK_IN,
	BISCUIT_DOUBLE_ROW_MIN_STOCK_IN,
	BISCUIT_END_DISTANCE_M,
	BISCUIT_JOINT_MOMENT_NM,
	BISCUIT_MAX_SPACING_M,
	BISCUIT_MIN_FACE_COVER_IN,
	LOAD_DURATION_PERMANENT,
	ULTIMATE_TO_ALLOWABLE
} from '../../../../reference/fasteners';
import type { ResolvedStock } from './capacity';
import { capacityCheck } from './checks';
import { cappedCountWarning, countThatFits, evenlyAlong, spacedAlong } from './layout';
import type { FastenerPart, PlanContext } from './part';
import type { FastenerPosition } from './types';
import { inches, metres } from './units';

const MM = 0.001;
/** The slot runs a few mm longer than the biscuit: 6 mm allowed (common practice, no source). */
const SLOT_OVERRUN_M = 6 * MM;
/** Slot depth into each piece: half the biscuit width plus 1 mm for glue (common practice, no source). */
const slotDepthM = (widthMm: number) => (widthMm / 2 + 1) * MM;

/** Size from the end piece's thickness (joiner manuals: #20 unless stock ≤ 1/2"), then smaller if the
 * joint is too short or the receiving face too thin to cover the slot. */
export function chooseBiscuit(ctx: PlanContext) {
	const t = inches(ctx.req.endPiece.thicknessM);
	let index = t > BISCUIT_20_MIN_STOCK_IN ? 2 : t > BISCUIT_10_MIN_STOCK_IN ? 1 : 0;
	const faceDepthChecked = ctx.req.kind !== 'rail-to-stile';
	const cover = metres(BISCUIT_MIN_FACE_COVER_IN);
	while (index > 0) {
		const b = BISCUITS[index];
		const fitsLength = ctx.req.lengthM >= b.lengthMm * MM + SLOT_OVERRUN_M;
		const fitsFace =
			!faceDepthChecked || ctx.req.facePiece.thicknessM - slotDepthM(b.widthMm) >= cover;
		if (fitsLength && fitsFace) break;
		index--;
	}
	return BISCUITS[index];
}

/** Least tested moment per biscuit for the stock: the test of its own panel kind, else the lowest
 * tested value as a floor (no test of solid wood or plywood was found). */
function testedMomentNM(end: ResolvedStock): { nm: number; basis: string } {
	const src =
		'biscuit corner joint tests, J. Institute of Wood Science doi 10.1179/002032009X12536100262033';
	const pb = BISCUIT_JOINT_MOMENT_NM.particleboard;
	const mdf = BISCUIT_JOINT_MOMENT_NM.mdf;
	if (end.kind === 'particleboard')
		return { nm: Math.min(pb.opening, pb.closing), basis: `${src}, particleboard` };
	if (end.kind === 'mdf') return { nm: Math.min(mdf.opening, mdf.closing), basis: `${src}, MDF` };
	return {
		nm: Math.min(pb.opening, pb.closing, mdf.opening, mdf.closing),
		basis: `${src}: no test of ${end.name} found, the lowest tested value (MDF) taken as a floor`
	};
}

export function planBiscuits(ctx: PlanContext): FastenerPart {
	const { req } = ctx;
	const warnings: string[] = [];
	const notes: string[] = [];
	const b = chooseBiscuit(ctx);
	const t = req.endPiece.thicknessM;
	const fits = req.lengthM >= b.lengthMm * MM + SLOT_OVERRUN_M;
	if (!fits)
		warnings.push(`The joint is too short for a biscuit ${b.size}; use a pocket screw or a dowel.`);

	const rows = inches(t) >= BISCUIT_DOUBLE_ROW_MIN_STOCK_IN ? 2 : 1;
	const across = rows === 2 ? [t / 3, (2 * t) / 3] : [t / 2];
	const cover = Math.min(...across) - (b.thicknessMm * MM) / 2;
	if (cover < metres(BISCUIT_MIN_FACE_COVER_IN))
		warnings.push(
			`Face cover over the slot is ${(cover / MM).toFixed(1)} mm, under 1/8": the swelling biscuit may show through the face.`
		);
	if (
		req.kind !== 'rail-to-stile' &&
		req.facePiece.thicknessM - slotDepthM(b.widthMm) < metres(BISCUIT_MIN_FACE_COVER_IN)
	)
		warnings.push('The receiving piece is too thin to hide a slot of this depth.');
	if (rows === 2)
		notes.push('Thick stock: two rows of biscuits, at a third and two thirds of the thickness.');

	// slots never overlap: centres at least one slot length apart
	const slotM = b.lengthMm * MM + SLOT_OVERRUN_M;
	const asked = req.options?.count;
	const fixed = asked ? countThatFits(req.lengthM, asked, slotM) : 0;
	if (fits && asked)
		warnings.push(...cappedCountWarning(asked, fixed, 'biscuit slot', 'biscuit slots'));
	const along = !fits
		? []
		: asked
			? evenlyAlong(req.lengthM, fixed)
			: spacedAlong(req.lengthM, BISCUIT_END_DISTANCE_M, BISCUIT_MAX_SPACING_M, slotM);
	const positions: FastenerPosition[] = along.flatMap((alongM) =>
		across.map((acrossM, row) => ({ alongM, acrossM, row }))
	);
	const count = positions.length;

	const tested = testedMomentNM(ctx.end);
	const ultimate = tested.nm * count;
	const design = ultimate * ULTIMATE_TO_ALLOWABLE * LOAD_DURATION_PERMANENT;
	const checks = [
		capacityCheck(
			'end moment carried by the biscuits',
			'N·m',
			ctx.momentNM,
			design,
			ultimate,
			`${tested.basis}; allowable = tested × 2850/15700 (NDS-to-handbook withdrawal ratio) × C_D 0.9`
		)
	];
	if (ctx.shearN > 0)
		warnings.push(
			'No published test rates a biscuit joint in shear: for a loaded shelf add a dado, shelf pins or screws, or rely on the glue line only after testing a sample.'
		);
	return {
		description: `biscuit ${b.size} (${b.lengthMm} × ${b.widthMm} × ${b.thicknessMm} mm)`,
		count,
		positions,
		spec: {
			size: b.size,
			biscuitLengthM: b.lengthMm * MM,
			biscuitWidthM: b.widthMm * MM,
			slotDepthM: slotDepthM(b.widthMm),
			rows,
			endDistanceM: BISCUIT_END_DISTANCE_M,
			maxSpacingM: BISCUIT_MAX_SPACING_M,
			minSpacingM: slotM
		},
		perFastener: { withdrawalN: null, lateralN: null, momentNM: count ? design / count : 0 },
		checks,
		notes,
		warnings
	};
}
