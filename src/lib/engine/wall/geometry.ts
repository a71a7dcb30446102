/** Where things stand inside one case of the wall: bays between dividers, heights of the panels. */
import { findMaterial } from '../../../../reference/materials';
import { DADO_DEPTH_PER_SIDE } from '../../../../reference/fasteners';
import { caseGeometry } from '../case/geometry';
import type { CaseDesign } from '../case/types';
import { InputError } from '../errors';
import type { DividerDesign, WallCaseDesign } from './types';

/** The case as the case engine sees it (no drawers or doors: the wall weighs those itself). */
export function asCaseDesign(c: WallCaseDesign): CaseDesign {
	return {
		...c,
		drawers: undefined,
		doors: undefined,
		base: c.base ? { height: c.base.height, setback: c.base.setback } : undefined
	};
}

interface PlacedDivider {
	index: number;
	design: DividerDesign;
	/** centre from the case's outside left face */
	xM: number;
	thicknessM: number;
	bottomM: number;
	topM: number;
}

export interface WallCaseGeometry extends ReturnType<typeof caseGeometry> {
	sideM: number;
	/** the sides' length: full height, or less the plinth */
	sideLengthM: number;
	/** the box from the underside of the bottom to the top */
	boxBottomM: number;
	topUndersideM: number;
	bottomTopM: number;
	topM: number;
	bottomM: number;
	dividers: PlacedDivider[];
	/** x of each bay's left inside face, from the case's outside left face, and its clear width */
	bays: { xM: number; widthM: number }[];
	/** depth of a dado in a side, where a joint is a dado */
	dadoDepthM: number;
}

export function wallCaseGeometry(c: WallCaseDesign, where: string): WallCaseGeometry {
	const g = caseGeometry(asCaseDesign(c));
	const side = c.sides.thickness;
	const base = c.base?.height ?? 0;
	const topT = c.top.thickness ?? side;
	const bottomT = c.bottom.thickness ?? side;
	const dividers = c.dividers
		.map((design, index) => ({
			index,
			design,
			xM: design.at,
			thicknessM: design.thickness ?? side,
			bottomM: design.bottom ?? base + bottomT,
			topM: design.top ?? c.height - topT
		}))
		.sort((a, b) => a.xM - b.xM);
	const bays: { xM: number; widthM: number }[] = [];
	let left = side;
	for (const dv of dividers) {
		const face = dv.xM - dv.thicknessM / 2;
		if (face - left < 0.01 || dv.topM <= dv.bottomM)
			throw InputError.at(
				`${where}.dividers.${dv.index}.at`,
				'The divider overlaps a side or another divider, or leaves no room between them.'
			);
		bays.push({ xM: left, widthM: face - left });
		left = dv.xM + dv.thicknessM / 2;
	}
	if (c.width - side - left < 0.01)
		throw InputError.at(
			`${where}.dividers.${dividers.length - 1}.at`,
			'The divider leaves no room before the right side.'
		);
	bays.push({ xM: left, widthM: c.width - side - left });
	return {
		...g,
		sideM: side,
		sideLengthM: c.base?.kind === 'plinth' ? c.height - base : c.height,
		boxBottomM: base,
		topUndersideM: c.height - topT,
		bottomTopM: base + bottomT,
		topM: topT,
		bottomM: bottomT,
		dividers,
		bays,
		dadoDepthM: side * DADO_DEPTH_PER_SIDE
	};
}

/** The bay a thing sits in; a case without dividers has one bay. */
export function bayOf(g: WallCaseGeometry, bay: number | undefined, path: string) {
	const i = bay ?? 0;
	if (i >= g.bays.length)
		throw InputError.at(
			path,
			`The case has ${g.bays.length} bay${g.bays.length === 1 ? '' : 's'} (0 to ${g.bays.length - 1}).`
		);
	return { index: i, ...g.bays[i] };
}

/**
 * The spans of a shelf across the case, between supports: a shelf in a bay spans that bay; a shelf
 * across the case rests on every divider whose top meets its underside (within 1 mm), measured to
 * the divider's centre, and must not cross any other divider.
 */
export function shelfSpans(
	g: WallCaseGeometry,
	bay: number | undefined,
	undersideM: number,
	topM: number,
	path: string
): { bay: number | null; spans: number[]; xM: number } {
	if (bay !== undefined) {
		const b = bayOf(g, bay, `${path}.bay`);
		return { bay: b.index, spans: [b.widthM], xM: b.xM };
	}
	const points = [g.sideM];
	for (const dv of g.dividers) {
		if (Math.abs(dv.topM - undersideM) <= 0.001) points.push(dv.xM);
		else if (dv.bottomM < topM - 1e-9 && dv.topM > undersideM + 1e-9)
			throw InputError.at(
				`${path}.bay`,
				`This shelf crosses divider ${dv.index + 1}: put it in a bay, or rest it on top of the divider.`
			);
	}
	points.push(g.sideM + g.innerWidthM);
	const spans = points.slice(1).map((x, i) => x - points[i]);
	return { bay: null, spans, xM: g.sideM };
}

const MDF_IDS = new Set(['mdf', 'mdf-high-density']);

/** Edges of plywood and particleboard get banding; MDF edges are painted (common practice, no
 * source); solid wood needs none. A material given by its figures is banded. */
export function needsBanding(m: CaseDesign['sides']['material']): boolean {
	if (typeof m !== 'string') return true;
	const lib = findMaterial(m);
	if (!lib) return true;
	return lib.kind === 'panel' && !MDF_IDS.has(lib.id);
}

/** Whether a material has a grain that matters: solid wood always; a panel whose stiffness differs
 * along and across its face grain (plywood, overlaid plywood). */
export function hasGrain(m: CaseDesign['sides']['material']): boolean {
	if (typeof m !== 'string') return m.modulusAcross !== undefined && m.modulusAcross !== m.modulus;
	const lib = findMaterial(m);
	if (!lib) return false;
	return (
		lib.kind === 'solid' ||
		(lib.modulusAcrossPa !== null && lib.modulusAcrossPa !== lib.modulusAlongPa)
	);
}

/** Sheet goods are nested on sheets; solid wood is cut from boards. */
export function isSheetGood(m: CaseDesign['sides']['material']): boolean {
	if (typeof m !== 'string') return true;
	return findMaterial(m)?.kind !== 'solid';
}
