/**
 * The case designer's form as the user types it (texts in their unit, choices), its translation to
 * the case engine's design (quantity strings, which caseDesignSchema reads), and back from a stored
 * design (SI numbers) to texts in the reader's unit. Bare numbers are inches to an inch user and
 * millimetres to a millimetre user (withUnitMark), as in every other field of the product.
 * Stored designs come back through stored.ts.
 */
import { DEFLECTION_LIMITS } from '../engine/shelf/limits';
import type { NamedLimit } from '../engine/shelf/types';
import type { CaseDesignInput } from '../schemas/case';
import { withLoadUnit, withUnitMark } from '../components/quantity-input/reading';
import type { UserLengthUnit } from '../workbench/lengths';

export type JointChoice = 'biscuit' | 'pocket-screw' | 'screw' | 'dado';
export type AnchorChoice = 'none' | 'strap' | 'bracket' | 'screws-through-back';
/** The limits offered by name: the engine's one list. */
export const LIMITS = Object.keys(DEFLECTION_LIMITS) as NamedLimit[];
/** a named limit, or L/n kept from a stored design (a ratio, or the retired 0.02" per foot) */
export type CaseLimit = NamedLimit | `L/${number}`;

/** The design's limit: a named one as it is, L/n as a ratio. */
export function limitOf(l: CaseLimit): CaseDesignInput['limit'] {
	const ratio = /^L\/(\d+(?:\.\d+)?)$/.exec(l);
	return (LIMITS as string[]).includes(l) || !ratio
		? (l as NamedLimit)
		: { ratio: Number(ratio[1]) };
}

export interface EndDraft {
	/** '' = the sides' material / thickness */
	material: string;
	thickness: string;
	joint: JointChoice;
	jointCount: number | null;
}

export interface NosingDraft {
	on: boolean;
	material: string;
	height: string;
	thickness: string;
}

export interface ShelfRowDraft {
	name: string;
	/** height of the shelf's top face above the floor */
	height: string;
	kind: 'fixed' | 'adjustable';
	material: string;
	thickness: string;
	joint: JointChoice;
	jointCount: number | null;
	ends: 'simple' | 'fixed';
	/** spread load as typed, e.g. `40 lbf/ft²`; '' for none */
	load: string;
	nosing: NosingDraft;
	/** loads other than one spread load, kept as stored (the API can write them) */
	otherLoads: unknown[];
}

export interface CaseDraft {
	width: string;
	height: string;
	depth: string;
	sides: { material: string; thickness: string };
	top: EndDraft;
	bottom: EndDraft;
	back: { on: boolean; material: string; thickness: string; fitted: 'rabbet' | 'applied' };
	shelves: ShelfRowDraft[];
	faceFrame: {
		on: boolean;
		material: string;
		thickness: string;
		stileWidth: string;
		railWidth: string;
		joint: 'pocket-screw' | 'biscuit';
		attach: 'biscuit' | 'pocket-screw';
	};
	base: { on: boolean; height: string; setback: string };
	anchoring: { kind: AnchorChoice; intoStuds: boolean };
	seismicRegion: boolean;
	limit: CaseLimit;
	/** why the limit is not what was stored (a retired preset read as its equal ratio) */
	limitNote?: string;
	service: 'dry' | 'humid' | 'wet';
	/** parts of a stored design this form does not edit (drawers, doors, floor tilt, restraint
	 * height), written back unchanged so saving never drops them */
	kept: Partial<Pick<CaseDesignInput, 'drawers' | 'doors' | 'floorTiltDeg' | 'name'>> & {
		anchorHeight?: string | number;
	};
}

const PLYWOOD = 'hardwood-plywood-veneer-core';
const OAK = 'red-oak';

/** A shelf row in the user's unit: an adjustable shelf under the general design load. */
export function newShelf(unit: UserLengthUnit, heightText: string): ShelfRowDraft {
	const mm = unit === 'mm';
	return {
		name: '',
		height: heightText,
		kind: 'adjustable',
		material: '',
		thickness: '',
		joint: 'biscuit',
		jointCount: null,
		ends: 'simple',
		// the Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21.2.2 general design load
		// (2 kPa to a metric user: the preset's metric figure, rounded up)
		load: mm ? '2 kPa' : '40 lbf/ft²',
		// a solid front edge, as shops stiffen a plywood bookcase shelf: bare 3/4" plywood over a
		// 34 1/2" opening sags past L/144 under this load (common practice, no source)
		nosing: {
			on: true,
			material: OAK,
			height: mm ? '38 mm' : '1 1/2"',
			thickness: mm ? '19 mm' : '3/4"'
		},
		otherLoads: []
	};
}

/**
 * A first case: a 36" × 84" × 12" bookcase of 3/4" veneer-core plywood with a 1/4" back, a fixed
 * shelf in the middle and adjustable ones above and below, each with a solid oak nosing, an oak
 * face frame and a set-back plinth, fixed to the wall (sizes are common practice, no source; the
 * load as in newShelf). Every check passes, so a first look shows a sound case to change.
 */
export function defaultCase(unit: UserLengthUnit): CaseDraft {
	const mm = unit === 'mm';
	const L = (inches: string, millimetres: string) => (mm ? millimetres : inches);
	const heights = mm ? ['400 mm', '750 mm', '1100 mm', '1450 mm'] : ['16"', '30"', '44"', '58"'];
	const shelves = heights.map((h) => newShelf(unit, h));
	shelves[2] = { ...shelves[2], kind: 'fixed' };
	return {
		width: L('36"', '900 mm'),
		height: L('84"', '2100 mm'),
		depth: L('12"', '300 mm'),
		sides: { material: PLYWOOD, thickness: L('3/4"', '18 mm') },
		top: { material: '', thickness: '', joint: 'biscuit', jointCount: null },
		bottom: { material: '', thickness: '', joint: 'biscuit', jointCount: null },
		back: { on: true, material: PLYWOOD, thickness: L('1/4"', '6 mm'), fitted: 'rabbet' },
		shelves,
		faceFrame: {
			on: true,
			material: OAK,
			thickness: L('3/4"', '19 mm'),
			stileWidth: L('1 1/2"', '38 mm'),
			railWidth: L('1 1/2"', '38 mm'),
			joint: 'pocket-screw',
			attach: 'biscuit'
		},
		base: { on: true, height: L('4"', '100 mm'), setback: L('3"', '75 mm') },
		anchoring: { kind: 'bracket', intoStuds: true },
		seismicRegion: false,
		limit: 'L/144',
		service: 'dry',
		kept: {}
	};
}

const len = (text: string, unit: UserLengthUnit) => withUnitMark(text, unit);
const optional = (text: string, unit: UserLengthUnit) =>
	text.trim() === '' ? undefined : len(text, unit);
const material = (m: string) => (m === '' ? undefined : m);

/** The design the engine and the server read; unreadable texts pass through so they are named. */
export function toDesign(d: CaseDraft, unit: UserLengthUnit): CaseDesignInput {
	const end = (e: EndDraft) => ({
		material: material(e.material),
		thickness: optional(e.thickness, unit),
		joint: e.joint,
		...(e.jointCount ? { jointCount: e.jointCount } : {})
	});
	return {
		...(d.kept.name ? { name: d.kept.name } : {}),
		width: len(d.width, unit),
		height: len(d.height, unit),
		depth: len(d.depth, unit),
		sides: { material: d.sides.material, thickness: len(d.sides.thickness, unit) },
		top: end(d.top),
		bottom: end(d.bottom),
		...(d.back.on
			? {
					back: {
						material: d.back.material,
						thickness: len(d.back.thickness, unit),
						fitted: d.back.fitted
					}
				}
			: {}),
		shelves: d.shelves.map((s) => ({
			...(s.name.trim() ? { name: s.name.trim() } : {}),
			height: len(s.height, unit),
			kind: s.kind,
			material: material(s.material),
			thickness: optional(s.thickness, unit),
			joint: s.joint,
			...(s.jointCount && s.kind === 'fixed' ? { jointCount: s.jointCount } : {}),
			ends: s.ends,
			loads: [
				...(s.load.trim() === ''
					? []
					: [{ kind: 'area' as const, pressure: withLoadUnit(s.load, 'pressure', unit) }]),
				...(s.otherLoads as NonNullable<CaseDesignInput['shelves']>[number]['loads'] & object)
			],
			...(s.nosing.on
				? {
						nosing: {
							material: s.nosing.material,
							height: len(s.nosing.height, unit),
							thickness: len(s.nosing.thickness, unit)
						}
					}
				: {})
		})),
		...(d.faceFrame.on
			? {
					faceFrame: {
						material: d.faceFrame.material,
						thickness: len(d.faceFrame.thickness, unit),
						stileWidth: len(d.faceFrame.stileWidth, unit),
						railWidth: len(d.faceFrame.railWidth, unit),
						joint: d.faceFrame.joint,
						attach: d.faceFrame.attach
					}
				}
			: {}),
		...(d.base.on
			? { base: { height: len(d.base.height, unit), setback: len(d.base.setback, unit) } }
			: {}),
		...(d.kept.drawers ? { drawers: d.kept.drawers } : {}),
		...(d.kept.doors ? { doors: d.kept.doors } : {}),
		...(d.kept.floorTiltDeg !== undefined ? { floorTiltDeg: d.kept.floorTiltDeg } : {}),
		anchoring: {
			kind: d.anchoring.kind,
			...(d.anchoring.kind === 'none' ? {} : { intoStuds: d.anchoring.intoStuds }),
			...(d.kept.anchorHeight !== undefined ? { height: d.kept.anchorHeight } : {})
		},
		seismicRegion: d.seismicRegion,
		limit: limitOf(d.limit),
		service: d.service
	};
}
