import {
	DADO_DEPTH_PER_SIDE,
	LOAD_DURATION_PERMANENT,
	SHELF_PINS_PER_END,
	SHELF_PIN_DIAMETER_M,
	SHELF_PIN_EMBED_M,
	reductionTermRd
} from '../../../../reference/fasteners';
import { dowelBearingPsi } from './capacity';
import { capacityCheck } from './checks';
import type { FastenerPart, PlanContext } from './part';
import { N_PER_LBF, inches } from './units';

/** Front and back pin rows 37 mm in from the edges, as in the 32 mm system (common practice, no source). */
const PIN_INSET_M = 0.037;

/** Shelf pins at one end of an adjustable shelf: the load per pin and bearing in the side's hole
 * (NDS 2018 Table 12.3.1A mode Im form, Fe·D·embedment / Rd, × C_D 0.9). */
export function planShelfPins(ctx: PlanContext): FastenerPart {
	const { req, face } = ctx;
	const d = req.options?.pinDiameterM ?? SHELF_PIN_DIAMETER_M;
	const asked = req.options?.count ?? SHELF_PINS_PER_END;
	// in a shelf too shallow for the usual inset the pins sit a quarter of its depth in; no two
	// holes closer than a hole's diameter (they would run into each other)
	const inset = Math.min(PIN_INSET_M, req.lengthM / 4);
	const inner = req.lengthM - 2 * inset;
	const count = asked === 1 ? 1 : Math.max(1, Math.min(asked, 1 + Math.floor(inner / d)));
	const along =
		count === 1
			? [req.lengthM / 2]
			: Array.from({ length: count }, (_, i) => inset + (i * inner) / (count - 1));
	const embedM = Math.min(SHELF_PIN_EMBED_M, req.facePiece.thicknessM * 0.6);
	const rd = reductionTermRd(inches(d));
	const perPinLb = (dowelBearingPsi(face.specificGravity) * inches(d) * inches(embedM)) / rd;
	const perPinN = perPinLb * N_PER_LBF * LOAD_DURATION_PERMANENT;
	const loadPerPinN = ctx.shearN / count;
	const warnings: string[] = [];
	if (count < asked)
		warnings.push(
			`${asked} pins were asked for, but only ${count} holes fit this depth without running into each other.`
		);
	if (req.lengthM < 2 * PIN_INSET_M + 0.05)
		warnings.push('The shelf is too shallow for two pins at the usual inset.');
	return {
		description: `shelf pin ${(d * 1000).toFixed(0)} mm, ${count} at this end`,
		count,
		positions: along.map((alongM) => ({ alongM, acrossM: 0, row: 0 })),
		spec: { diameterM: d, embedmentM: embedM, loadPerPinN },
		perFastener: { withdrawalN: null, lateralN: perPinN, momentNM: null },
		checks: [
			capacityCheck(
				'shelf reaction on the pins (bearing in the side hole)',
				'N',
				ctx.shearN,
				perPinN * count,
				perPinLb * rd * N_PER_LBF * count,
				`NDS 2018 Table 12.3.1A mode Im, Fe = 16,600·G^1.84 psi of ${face.name}, Rd ${rd.toFixed(2)}, × C_D 0.9`
			)
		],
		notes: [
			`Load per pin ${loadPerPinN.toFixed(0)} N.`,
			'Thin pins bend before the hole crushes: 5 mm (or 1/4") steel pins are the usual minimum (common practice, no source).'
		],
		warnings
	};
}

/** A dado (housing) in the case side: the shelf bears on the lower shoulder. */
export function planDado(ctx: PlanContext): FastenerPart {
	const { req, end } = ctx;
	const depthM = req.options?.dadoDepthM ?? req.facePiece.thicknessM * DADO_DEPTH_PER_SIDE;
	const areaM2 = depthM * req.lengthM;
	const warnings: string[] = [];
	if (depthM > req.facePiece.thicknessM / 2)
		warnings.push(
			'A dado deeper than half the side weakens the side (common practice, no source).'
		);
	if (ctx.momentNM > 0)
		warnings.push(
			'A dado carries the shelf by bearing; an end moment is left to the glue and is not counted.'
		);
	const stressPa = ctx.shearN / areaM2;
	const cPerp = end.compressionPerpPa;
	const checks = cPerp
		? [
				capacityCheck(
					'bearing of the shelf on the dado shoulder (stress)',
					'Pa',
					stressPa,
					cPerp,
					null,
					`compression perpendicular to grain, proportional limit, ${end.name}: ${end.compressionPerpSource ?? 'Wood Handbook Table 5-3a'}`
				)
			]
		: [];
	const notes = [
		`Bearing stress ${(stressPa / 1000).toFixed(0)} kPa over ${(depthM * 1000).toFixed(1)} mm of shoulder.`
	];
	if (!cPerp)
		notes.push(
			`No cited bearing strength for ${end.name}; at shelf loads the stress is usually small.`
		);
	return {
		description: `dado ${(depthM * 1000).toFixed(1)} mm deep`,
		count: 1,
		positions: [{ alongM: req.lengthM / 2, acrossM: 0, row: 0 }],
		spec: { depthM, bearingAreaM2: areaM2, bearingStressPa: stressPa },
		perFastener: { withdrawalN: null, lateralN: null, momentNM: null },
		checks,
		notes,
		warnings
	};
}
