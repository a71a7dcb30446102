/**
 * One case's tip-over in a plain sentence for the wall screen: it tips by itself with its drawers
 * out, or a weight less than the 60 lb test weight on an open drawer or a front edge tips it, or it
 * holds more; and what to do (anchor it), whatever the numbers say for a tall case.
 */
import type { WallCaseCheck } from '../engine/wall/types';

export function tippingWords(
	c: WallCaseCheck,
	force: (newtons: number) => string
): { pass: boolean; words: string } {
	const s = c.stability;
	const held = s.restraint.adequate;
	const need = `the restraint must hold at least ${force(s.restraint.recommendedRatingN)}`;
	const edges = s.frontEdgeLoads.filter((l) => l.marginToF2057 !== null);
	const worst = edges.reduce<(typeof edges)[number] | null>(
		(a, b) => (a === null || b.marginToF2057! < a.marginToF2057! ? b : a),
		null
	);
	const opened = c.drawers.length ? 'with all its drawers pulled out' : 'with its doors open';
	if (s.tipsUnaided)
		return held
			? {
					pass: true,
					words: `would tip over by itself ${opened}; it is fixed to the wall, and ${need}.`
				}
			: {
					pass: false,
					words: `tips over by itself ${opened}, even empty. Fix it to the wall into studs before anyone opens a drawer; ${need}.`
				};
	if (worst && !worst.passF2057) {
		const least = Math.min(worst.tipLoadEmptyN ?? Infinity, worst.tipLoadLoadedN ?? Infinity);
		const tips = `${force(least)} on ${worst.where} tips it, less than the 60 lb test weight`;
		return held
			? { pass: true, words: `${tips}; it is fixed to the wall, and ${need}.` }
			: { pass: false, words: `${tips}. Fix it to the wall into studs; ${need}.` };
	}
	const holds = worst
		? `holds ${force(Math.min(worst.tipLoadEmptyN ?? Infinity, worst.tipLoadLoadedN ?? Infinity))} on ${worst.where} before it tips (the test weight is 60 lb)`
		: 'has no open front edge to load';
	if (s.anchoring.required && !held)
		return {
			pass: false,
			words: `${holds}, but a case this tall must still be fixed to the wall into studs.`
		};
	return { pass: true, words: `${holds}.` };
}
