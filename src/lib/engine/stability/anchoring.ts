import {
	F2057_MIN_HEIGHT_M,
	F3096_23_PULL_N,
	FEMA_E74_TALL_BOOKCASE_M,
	FEMA_MIN_STUD_EMBEDMENT_M,
	TWO_RESTRAINTS_ABOVE_WIDTH_M
} from '../../../../reference/tipping';
import type { StabilityRequest } from './types';
import { METRES_PER_INCH } from '../units/length';

/** The anchoring advice for a case: FEMA's guidance, the restraint test, and the trade's habits. */
export function anchoringAdvice(req: StabilityRequest, requiredN: number) {
	const required = req.heightM >= F2057_MIN_HEIGHT_M || requiredN > 0;
	const rating = Math.max(requiredN, F3096_23_PULL_N);
	const out = [
		`Fix the case to the wall near its top with L-brackets, straps or screws through a solid back rail into studs, at least ${(FEMA_MIN_STUD_EMBEDMENT_M / METRES_PER_INCH).toFixed(0)}" into the stud (FEMA, Anchor Tall Bookcases and File Cabinets, 2008).`,
		'Do not rely on drywall alone: anchors in drywall pull out; thin backs may not carry the load (FEMA 2008). Fix through an anchor strip, and on cases over 60" tall add an intermediate strip (Architectural Woodwork Standards §4.4.18).',
		`Use a restraint rated to hold at least ${rating.toFixed(0)} N (${(rating / 4.4482216).toFixed(0)} lbf), the larger of the pull found here and the ASTM F3096-23 test pull.`
	];
	if (req.widthM > TWO_RESTRAINTS_ABOVE_WIDTH_M)
		out.push(
			'Wider than 24": use at least two restraints, into two different studs (common practice, no source).'
		);
	if (req.seismicRegion && req.heightM > FEMA_E74_TALL_BOOKCASE_M)
		out.push(
			'In seismic design categories C–F, bookshelves over 6 ft fall under ASCE/SEI 7 chapter 13 (FEMA E-74 §6.5.2): have the anchorage designed by a licensed professional.'
		);
	else if (req.seismicRegion)
		out.push(
			'In a seismic region follow FEMA E-74 and local code for the anchorage; latch doors and drawers.'
		);
	return { required, recommendations: out };
}
