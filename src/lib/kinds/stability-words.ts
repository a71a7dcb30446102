/**
 * A tip-over check in plain words, the one writer for the tipping screen, the saved summary and
 * the client's record. Every figure is the engine's; forces in the reader's system.
 */
import { formatLength } from '../engine/units/length';
import { formatForce } from '../engine/units/quantity';
import type { StabilityResult } from '../engine/stability/types';
import type { ReaderUnit } from './words';

export interface StabilitySentences {
	/** the push at the top that tips it, empty and loaded */
	tip: string;
	/** the weight on a front edge (an open drawer, a child climbing) that tips it */
	edge: string | null;
	/** what the wall restraint must hold and whether it does */
	restraint: string;
	summary: string;
	pass: boolean;
}

/** Front edges hold (or the restraint does), and a case that must be anchored is. */
function stabilityPasses(r: StabilityResult) {
	const edgesHold = r.frontEdgeLoads.every((l) => l.passF2057) || r.restraint.adequate;
	return edgesHold && (!r.anchoring.required || r.restraint.adequate);
}

export function describeStability(r: StabilityResult, unit: ReaderUnit): StabilitySentences {
	const F = (n: number) => formatForce(n, { unit: unit === 'mm' ? 'N' : 'lbf' });
	const L = (m: number) => formatLength(m, { unit });
	const held = r.restraint.adequate;
	const tip = r.tipsUnaided
		? 'Standing free, this case tips over on its own: its weight is in front of its front feet.'
		: `Standing free, the empty case tips forward under a push of ${F(r.tipForceAtTopN.empty)} at the top; loaded, under ${F(r.tipForceAtTopN.loaded)}.`;
	const worst = r.frontEdgeLoads
		.filter((l) => l.tipLoadEmptyN !== null)
		.reduce<StabilityResult['frontEdgeLoads'][number] | null>(
			(a, b) => (a === null || b.tipLoadEmptyN! < a.tipLoadEmptyN! ? b : a),
			null
		);
	const edge = worst
		? `A weight of ${F(worst.tipLoadEmptyN!)} on ${worst.where} (${L(worst.heightM)} up) tips the empty case over; ASTM F2057-23 tests clothing storage units with 60 lb there, the nearest published test. ` +
			(worst.passF2057
				? 'It stays up under that.'
				: held
					? 'It would tip under that, but the wall restraint holds it.'
					: 'It would tip under that.')
		: null;
	const needs = r.anchoring.required ? 'It must be fixed to the wall' : 'Fix it to the wall anyway';
	const restraint = r.restraint.anchored
		? held
			? `Its restraint holds the ${F(r.restraint.requiredN)} it must; use one rated for at least ${F(r.restraint.recommendedRatingN)}.`
			: `Its restraint is not enough: it must hold ${F(r.restraint.requiredN)}, fixed into studs or solid blocking; use one rated for at least ${F(r.restraint.recommendedRatingN)}.`
		: `${needs}, with a restraint rated for at least ${F(r.restraint.recommendedRatingN)} into studs or solid blocking.`;
	const summary = r.tipsUnaided
		? `Tips over on its own; ${r.restraint.anchored && held ? 'the restraint holds it' : 'must be anchored'}.`
		: `Tips forward under ${F(r.tipForceAtTopN.loaded)} at the top when loaded` +
			(r.anchoring.required
				? held
					? `; anchored, the restraint holds the ${F(r.restraint.requiredN)} it must.`
					: `; must be anchored to hold ${F(r.restraint.requiredN)}.`
				: '.');
	return { tip, edge, restraint, summary, pass: stabilityPasses(r) };
}
