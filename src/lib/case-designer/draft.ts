/**
 * The case designer's form as the user types it (texts in their unit, choices), its translation to
 * the case engine's design (quantity strings, which caseDesignSchema reads), and back from a stored
 * design (SI numbers) to texts in the reader's unit. Bare numbers are inches to an inch user and
 * millimetres to a millimetre user (withUnitMark), as in every other field of the product.
 */
import type { CaseDesignInput } from '../schemas/case';
import { withUnitMark } from '../components/quantity-input/reading';
import { formatLength } from '../engine/length';
import { formatPressure } from '../engine/quantity';
import type { UserLengthUnit } from '../workbench/lengths';

export type JointChoice = 'biscuit' | 'pocket-screw' | 'screw' | 'dado';
export type AnchorChoice = 'none' | 'strap' | 'bracket' | 'screws-through-back';
export const LIMITS = ['L/144', 'L/240', 'L/360', '1/16in-per-ft', '0.02in-per-ft'] as const;
export type CaseLimit = (typeof LIMITS)[number];

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
		// the Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21 general design load
		load: mm ? '1.92 kPa' : '40 lbf/ft²',
		nosing: {
			on: false,
			material: OAK,
			height: mm ? '38 mm' : '1 1/2"',
			thickness: mm ? '19 mm' : '3/4"'
		},
		otherLoads: []
	};
}

/**
 * A first case: a 36" × 84" × 12" bookcase of 3/4" veneer-core plywood with a 1/4" back, a fixed
 * shelf in the middle and adjustable ones above and below, an oak face frame and a set-back
 * plinth, fixed to the wall (sizes are common practice, no source; the load as in newShelf).
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
				...(s.load.trim() === '' ? [] : [{ kind: 'area' as const, pressure: s.load }]),
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
		limit: d.limit,
		service: d.service
	};
}

type Stored = Record<string, unknown>;
const obj = (v: unknown): Stored | undefined =>
	v && typeof v === 'object' && !Array.isArray(v) ? (v as Stored) : undefined;

/** A stored design (validated, SI numbers) back into the form's texts, in the reader's unit. */
export function fromDesign(input: unknown, unit: UserLengthUnit): CaseDraft {
	const d = defaultCase(unit);
	const s = obj(input);
	if (!s) return d;
	const L = (v: unknown, fallback: string) =>
		typeof v === 'number' ? formatLength(v, { unit }) : typeof v === 'string' ? v : fallback;
	const M = (v: unknown, fallback: string) => (typeof v === 'string' ? v : fallback);
	const end = (v: unknown): EndDraft => {
		const e = obj(v) ?? {};
		return {
			material: M(e.material, ''),
			thickness: L(e.thickness, ''),
			joint: (e.joint as JointChoice) ?? 'biscuit',
			jointCount: typeof e.jointCount === 'number' ? e.jointCount : null
		};
	};
	d.width = L(s.width, d.width);
	d.height = L(s.height, d.height);
	d.depth = L(s.depth, d.depth);
	const sides = obj(s.sides) ?? {};
	d.sides = {
		material: M(sides.material, d.sides.material),
		thickness: L(sides.thickness, d.sides.thickness)
	};
	d.top = end(s.top);
	d.bottom = end(s.bottom);
	const back = obj(s.back);
	d.back = back
		? {
				on: true,
				material: M(back.material, d.back.material),
				thickness: L(back.thickness, d.back.thickness),
				fitted: back.fitted === 'applied' ? 'applied' : 'rabbet'
			}
		: { ...d.back, on: false };
	d.shelves = (Array.isArray(s.shelves) ? s.shelves : []).map((raw) => {
		const r = obj(raw) ?? {};
		const loads = (Array.isArray(r.loads) ? r.loads : []) as Stored[];
		const spread = loads.findIndex((l) => l?.kind === 'area');
		const row = newShelf(unit, L(r.height, ''));
		const nosing = obj(r.nosing);
		return {
			...row,
			name: typeof r.name === 'string' ? r.name : '',
			kind: r.kind === 'fixed' ? 'fixed' : 'adjustable',
			material: M(r.material, ''),
			thickness: L(r.thickness, ''),
			joint: (r.joint as JointChoice) ?? 'biscuit',
			jointCount: typeof r.jointCount === 'number' ? r.jointCount : null,
			ends: r.ends === 'fixed' ? 'fixed' : 'simple',
			load: spread >= 0 ? pressureText(loads[spread].pressure, unit) : '',
			nosing: nosing
				? {
						on: true,
						material: M(nosing.material, OAK),
						height: L(nosing.height, row.nosing.height),
						thickness: L(nosing.thickness, row.nosing.thickness)
					}
				: row.nosing,
			otherLoads: loads.filter((_, i) => i !== spread)
		} satisfies ShelfRowDraft;
	});
	const frame = obj(s.faceFrame);
	d.faceFrame = frame
		? {
				on: true,
				material: M(frame.material, d.faceFrame.material),
				thickness: L(frame.thickness, d.faceFrame.thickness),
				stileWidth: L(frame.stileWidth, d.faceFrame.stileWidth),
				railWidth: L(frame.railWidth, d.faceFrame.railWidth),
				joint: frame.joint === 'biscuit' ? 'biscuit' : 'pocket-screw',
				attach: frame.attach === 'pocket-screw' ? 'pocket-screw' : 'biscuit'
			}
		: { ...d.faceFrame, on: false };
	const base = obj(s.base);
	d.base = base
		? { on: true, height: L(base.height ?? 0, '0'), setback: L(base.setback ?? 0, '0') }
		: { ...d.base, on: false };
	const anchoring = obj(s.anchoring);
	d.anchoring = {
		kind: (anchoring?.kind as AnchorChoice) ?? 'none',
		intoStuds: anchoring?.intoStuds === true
	};
	d.seismicRegion = s.seismicRegion === true;
	if ((LIMITS as readonly unknown[]).includes(s.limit)) d.limit = s.limit as CaseLimit;
	if (s.service === 'humid' || s.service === 'wet') d.service = s.service;
	else d.service = 'dry';
	d.kept = {
		...(typeof s.name === 'string' ? { name: s.name } : {}),
		...(Array.isArray(s.drawers) ? { drawers: s.drawers as CaseDesignInput['drawers'] } : {}),
		...(Array.isArray(s.doors) ? { doors: s.doors as CaseDesignInput['doors'] } : {}),
		...(typeof s.floorTiltDeg === 'number' ? { floorTiltDeg: s.floorTiltDeg } : {}),
		...(anchoring && anchoring.height !== undefined
			? { anchorHeight: anchoring.height as string | number }
			: {})
	};
	return d;
}

/** A stored pressure (pascals) as the user would type it; a stored text as it was. */
function pressureText(v: unknown, unit: UserLengthUnit): string {
	if (typeof v === 'string') return v;
	if (typeof v !== 'number') return '';
	return formatPressure(v, { unit: unit === 'mm' ? 'kPa' : 'lbf/ft²' });
}
