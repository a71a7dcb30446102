/**
 * What to buy besides the sheets: fasteners from the joint plans (each plan's count times the
 * joints that use it), slides by length, hinges, wall anchors and the screws the design implies.
 */
import type { WallDesign, WallResult } from './types';
import { METRES_PER_INCH } from '../units/length';

const INCH = METRES_PER_INCH;

export interface HardwareLine {
	kind:
		| 'biscuit'
		| 'pocket-screw'
		| 'screw'
		| 'shelf-pin'
		| 'slide'
		| 'hinge'
		| 'wall anchor'
		| 'anchor screw'
		| 'back fastener'
		| 'front screw';
	/** what it is, in the joint planner's words where it comes from a joint plan */
	label: string;
	/** a size that sorts it (slide length), where it has one */
	sizeM?: number;
	count: number;
	unit: 'each' | 'pair';
	basis: string;
}

/** Hinges per door leaf by its height: 2 up to 40", 3 up to 60", 4 up to 80", then 5 (common
 * practice, no source). */
export function hingesFor(heightM: number): number {
	const inches = heightM / INCH;
	return inches <= 40 ? 2 : inches <= 60 ? 3 : inches <= 80 ? 4 : 5;
}

/** Brackets or straps per anchored case (common practice, no source), two screws each. */
const ANCHORS_PER_CASE = 2;
/** A back is fastened about every 6" around its edge (common practice, no source). */
const BACK_FASTENER_SPACING_M = 6 * INCH;
/** A drawer front is screwed to its box from inside with 4 screws (common practice, no source). */
const FRONT_SCREWS = 4;

export function hardwareList(w: WallDesign, r: WallResult): HardwareLine[] {
	const lines = new Map<string, HardwareLine>();
	const add = (key: string, line: Omit<HardwareLine, 'count'>, count: number) => {
		if (count <= 0) return;
		const had = lines.get(key);
		if (had) had.count += count;
		else lines.set(key, { ...line, count });
	};
	for (const c of r.cases)
		for (const j of c.joints) {
			const f = j.plan.fastener;
			if (f === 'dado') continue;
			add(
				`${f}|${j.plan.description}`,
				// "shelf pin 5 mm, 2 at this end": the count is the line's own
				{
					kind: f,
					label: j.plan.description.replace(/, \d+ at this end$/, ''),
					unit: 'each',
					basis: 'joint plans'
				},
				j.plan.count * j.joints
			);
		}
	w.cases.forEach((c, ci) => {
		for (const o of c.drawers)
			add(
				`slide|${o.slide.length}|${o.slide.extension}`,
				{
					kind: 'slide',
					label: `${o.slide.extension === 'full' ? 'full-extension' : '3/4-extension'} drawer slides`,
					sizeM: o.slide.length,
					unit: 'pair',
					basis: 'one pair per drawer'
				},
				o.heights.length
			);
		const leaves = r.cases[ci].doors;
		add(
			'hinge',
			{
				kind: 'hinge',
				label: 'door hinges',
				unit: 'each',
				basis: 'by door height (common practice, no source)'
			},
			leaves.reduce((a, d) => a + hingesFor(d.hM), 0)
		);
		const fronts = r.cases[ci].drawers.length;
		add(
			'front screw',
			{
				kind: 'front screw',
				label: 'screws for drawer fronts',
				unit: 'each',
				basis: `${FRONT_SCREWS} per front (common practice, no source)`
			},
			fronts * FRONT_SCREWS
		);
		if (c.anchoring && c.anchoring.kind !== 'none') {
			const anchors = c.anchoring.kind === 'screws-through-back' ? 0 : ANCHORS_PER_CASE;
			add(
				`anchor|${c.anchoring.kind}`,
				{
					kind: 'wall anchor',
					label: c.anchoring.kind === 'strap' ? 'anti-tip straps' : 'L-brackets',
					unit: 'each',
					basis: `${ANCHORS_PER_CASE} per anchored case (common practice, no source)`
				},
				anchors
			);
			add(
				'anchor screw',
				{
					kind: 'anchor screw',
					label:
						'screws into studs, at least 2" into the stud (FEMA, Anchor Tall Bookcases and File Cabinets, 2008)',
					unit: 'each',
					basis: 'two per anchor'
				},
				2 * ANCHORS_PER_CASE
			);
		}
		const back = r.parts.find((p) => p.caseIndex === ci && p.role === 'back');
		if (back)
			add(
				'back fastener',
				{
					kind: 'back fastener',
					label: 'screws or brads for the back',
					unit: 'each',
					basis: 'about 6" apart around the back (common practice, no source)'
				},
				Math.ceil((2 * (back.lengthM + back.widthM)) / BACK_FASTENER_SPACING_M)
			);
	});
	return [...lines.values()];
}
