/**
 * The shelf check form as the user types it (texts, choices) and its translation to the engine's
 * shelf request, and back from a stored input (SI numbers) to texts in the user's unit.
 * Bare numbers are inches to an inch user and millimetres to a millimetre user (withUnitMark); a
 * bare load is lbf/ft², lbf/ft or lbf to an inch user and kPa, N/m or N to a metric one (withLoadUnit).
 */
import { DEFLECTION_LIMITS, shelfLength, type NamedLimit } from '../engine/shelf';
import {
	RETIRED_PER_FOOT_AS_RATIO,
	RETIRED_PER_FOOT_LIMIT,
	type ShelfRequest
} from '../schemas/shelf';
import { parseLength } from '../engine/units/length';
import { formatQuantityExact } from '../engine/units/quantity';
import { withLoadUnit, withUnitMark } from '../components/quantity-input/reading';
import { lengthText, loadUnitsFor, type UserLengthUnit } from './lengths';

type SupportChoice = 'simple' | 'fixed' | 'cantilever' | 'continuous';
export type LoadKind = 'area' | 'line' | 'point';
/** The limits offered by name: the engine's one list. */
export const LIMIT_CHOICES = Object.keys(DEFLECTION_LIMITS) as NamedLimit[];
type LimitChoice = NamedLimit | 'ratio';

/** Said beside the limit of an analysis saved with the retired 0.02" per foot preset. */
export const RETIRED_LIMIT_NOTE =
	'This analysis was saved with the 0.02" per foot limit, which is no longer offered because it has no published source. It is read as L/600, which allows exactly the same sag.';

interface StripDraft {
	on: boolean;
	material: string;
	height: string;
	thickness: string;
}

export interface ShelfDraft {
	span: string;
	depth: string;
	thickness: string;
	material: string;
	grain: 'along' | 'across';
	support: SupportChoice;
	/** over dividers: each span's clear length, left to right, as typed (one divider makes two) */
	spans: string[];
	/** over dividers: the thickness of each divider; blank for spans measured centre to centre */
	divider: string;
	loadKind: LoadKind;
	/** the load as typed: `40 lbf/ft^2`, `20 lbf/ft`, `50 lbf` */
	load: string;
	/** where a point load stands, from the left end */
	pointAt: string;
	selfWeight: boolean;
	front: StripDraft;
	below: StripDraft;
	duration: 'short' | 'long';
	service: 'dry' | 'humid' | 'wet';
	limit: LimitChoice;
	/** the n of a custom L/n */
	limitRatio: string;
	/** why the limit is not what was stored (a retired preset read as its equal ratio) */
	limitNote?: string;
}

/**
 * A first shelf, as a shop would start one: a 36" bookcase shelf of 3/4" veneer-core hardwood
 * plywood on pins with a 3/4" × 1 1/2" solid oak nosing glued to its front edge, under the general
 * design load of 40 lbf/ft² (Architectural Woodwork Standards, AWI/AWMAC/WI 2009, §1.2.21.2.2;
 * 2 kPa for a metric user, the preset's metric figure). It passes L/144 with about 45% to spare;
 * the same shelf without its nosing sags almost twice the limit, which is why shops edge it (sizes
 * common practice, no source).
 */
export function defaultDraft(unit: UserLengthUnit): ShelfDraft {
	const mm = unit === 'mm';
	return {
		span: mm ? '900 mm' : '36"',
		depth: mm ? '300 mm' : '11 1/4"',
		thickness: mm ? '18 mm' : '3/4"',
		material: 'hardwood-plywood-veneer-core',
		grain: 'along',
		support: 'simple',
		spans: mm ? ['900 mm', '900 mm'] : ['36"', '36"'],
		divider: mm ? '18 mm' : '3/4"',
		loadKind: 'area',
		load: mm ? '2 kPa' : '40 lbf/ft²',
		pointAt: mm ? '450 mm' : '18"',
		selfWeight: true,
		front: {
			on: true,
			material: 'red-oak',
			height: mm ? '38 mm' : '1 1/2"',
			thickness: mm ? '19 mm' : '3/4"'
		},
		below: {
			on: false,
			material: 'red-oak',
			height: mm ? '38 mm' : '1 1/2"',
			thickness: mm ? '19 mm' : '3/4"'
		},
		duration: 'long',
		service: 'dry',
		limit: 'L/144',
		limitRatio: '200'
	};
}

const len = (text: string, unit: UserLengthUnit) => withUnitMark(text, unit);

/** The engine's request for a draft; unreadable texts pass through so the engine names them. */
export function toRequest(d: ShelfDraft, unit: UserLengthUnit): ShelfRequest {
	// over dividers the spans and the divider say the whole length: no separate span is sent
	const support: ShelfRequest['support'] =
		d.support === 'continuous'
			? {
					spans: d.spans.map((s) => len(s, unit)),
					ends: 'simple',
					...(d.divider.trim() === '' ? {} : { divider: len(d.divider, unit) })
				}
			: d.support;
	const load =
		d.loadKind === 'area'
			? ({ kind: 'area', pressure: withLoadUnit(d.load, 'pressure', unit) } as const)
			: d.loadKind === 'line'
				? ({ kind: 'line', intensity: withLoadUnit(d.load, 'lineLoad', unit) } as const)
				: ({
						kind: 'point',
						force: withLoadUnit(d.load, 'force', unit),
						at: len(d.pointAt, unit)
					} as const);
	const strip = (side: 'front' | 'below', s: StripDraft) => ({
		side,
		material: s.material,
		height: len(s.height, unit),
		thickness: len(s.thickness, unit)
	});
	const ratio = Number(d.limitRatio);
	return {
		...(typeof support === 'object' ? {} : { span: len(d.span, unit) }),
		depth: len(d.depth, unit),
		thickness: len(d.thickness, unit),
		material: d.material,
		grain: d.grain,
		support,
		loads: d.load.trim() === '' ? [] : [load],
		selfWeight: d.selfWeight,
		edges: [
			...(d.front.on ? [strip('front', d.front)] : []),
			...(d.below.on ? [strip('below', d.below)] : [])
		],
		duration: d.duration,
		service: d.service,
		limit: d.limit === 'ratio' ? { ratio: Number.isFinite(ratio) ? ratio : 0 } : d.limit
	};
}

/**
 * A shelf just put over dividers: spans that were never told apart (all the same text) take the
 * span typed so far, so a 36" shelf becomes two spans of 36" over a divider.
 */
export function overDividers(d: ShelfDraft): ShelfDraft {
	if (d.support !== 'continuous' || d.spans.some((s) => s !== d.spans[0])) return d;
	return { ...d, spans: d.spans.map(() => d.span) };
}

type Stored = Partial<Record<string, unknown>>;

/** A stored (validated, SI) shelf input back into the form's texts, in the reader's unit. */
export function fromInput(input: unknown, unit: UserLengthUnit): ShelfDraft {
	const d = defaultDraft(unit);
	if (!input || typeof input !== 'object') return d;
	const s = input as Stored;
	const L = (v: unknown, fallback: string) =>
		typeof v === 'number' ? lengthText(v, unit) : typeof v === 'string' ? v : fallback;
	const units = loadUnitsFor(unit);
	const support = s.support as ShelfRequest['support'];
	if (typeof support === 'object' && support && 'spans' in support) {
		// each span as stored; an analysis saved before the divider was asked for has none (its
		// spans run centre to centre), and reopens with the divider blank, computing as it did
		const metres = (x: string | number) => (typeof x === 'number' ? x : parseLength(x));
		const spans = support.spans.map(metres);
		d.support = 'continuous';
		d.spans = spans.map((m) => lengthText(m, unit));
		d.divider = support.divider === undefined ? '' : lengthText(metres(support.divider), unit);
		d.span = lengthText(
			shelfLength({
				spans,
				...(support.divider === undefined ? {} : { divider: metres(support.divider) })
			}),
			unit
		);
	} else {
		if (typeof support === 'string') d.support = support;
		d.span = L(s.span, d.span);
	}
	d.depth = L(s.depth, d.depth);
	d.thickness = L(s.thickness, d.thickness);
	if (typeof s.material === 'string') d.material = s.material;
	if (s.grain === 'along' || s.grain === 'across') d.grain = s.grain;
	const load = (Array.isArray(s.loads) ? s.loads[0] : undefined) as Stored | undefined;
	d.load = '';
	if (load?.kind === 'area')
		d.load = numberOr(load.pressure, (v) => formatQuantityExact(v, 'pressure', units.pressure));
	if (load?.kind === 'line')
		d.load = numberOr(load.intensity, (v) => formatQuantityExact(v, 'lineLoad', units.lineLoad));
	if (load?.kind === 'point') {
		d.load = numberOr(load.force, (v) => formatQuantityExact(v, 'force', units.force));
		d.pointAt = L(load.at, d.pointAt);
	}
	if (load?.kind === 'area' || load?.kind === 'line' || load?.kind === 'point')
		d.loadKind = load.kind;
	d.selfWeight = s.selfWeight !== false;
	// a new shelf has a nosing; a stored one has exactly the strips it was saved with
	d.front = { ...d.front, on: false };
	d.below = { ...d.below, on: false };
	for (const e of (Array.isArray(s.edges) ? s.edges : []) as Stored[]) {
		const side = e.side === 'front' || e.side === 'back' ? 'front' : 'below';
		d[side] = {
			on: true,
			material: typeof e.material === 'string' ? e.material : d[side].material,
			height: L(e.height, d[side].height),
			thickness: L(e.thickness, d[side].thickness)
		};
	}
	if (s.duration === 'short' || s.duration === 'long') d.duration = s.duration;
	if (s.service === 'dry' || s.service === 'humid' || s.service === 'wet') d.service = s.service;
	if (typeof s.limit === 'string' && (LIMIT_CHOICES as readonly string[]).includes(s.limit))
		d.limit = s.limit as LimitChoice;
	if (s.limit === RETIRED_PER_FOOT_LIMIT) {
		d.limit = 'ratio';
		d.limitRatio = String(RETIRED_PER_FOOT_AS_RATIO.ratio);
		d.limitNote = RETIRED_LIMIT_NOTE;
	}
	if (s.limit && typeof s.limit === 'object' && 'ratio' in s.limit) {
		d.limit = 'ratio';
		d.limitRatio = String((s.limit as { ratio: number }).ratio);
	}
	return d;
}

function numberOr(v: unknown, format: (n: number) => string): string {
	return typeof v === 'number' ? format(v) : typeof v === 'string' ? v : '';
}

/** A form field: one of the draft's, or one span of a shelf over dividers (`spans.1`). */
export type FieldKey = keyof ShelfDraft | `spans.${number}`;

/** Where each field of the form is, for the list of marked fields at the top of the screen. */
const FIELD_PLACES: Partial<Record<keyof ShelfDraft, { id: string; label: string }>> = {
	span: { id: 'shelf-span', label: 'Span' },
	depth: { id: 'shelf-depth', label: 'Depth' },
	thickness: { id: 'shelf-thickness', label: 'Thickness' },
	material: { id: 'shelf-material', label: 'Material' },
	divider: { id: 'shelf-divider', label: 'Divider thickness' },
	load: { id: 'load-value', label: 'Load' },
	pointAt: { id: 'load-at', label: 'Where the load sits' },
	front: { id: 'front-height', label: 'Nosing' },
	limitRatio: { id: 'limit-ratio', label: 'Limit' }
};

/**
 * One span of a shelf over dividers, named for what it measures: the clear length between the
 * faces of what holds it up (a case side or a divider) when the divider's thickness is given, or
 * from centre to centre of the dividers when it is left blank.
 */
export function spanLabel(i: number, count: number, clear = true): string {
	const from = i === 0 ? 'side' : 'divider';
	const to = i === count - 1 ? 'side' : 'divider';
	return clear
		? `Span ${i + 1}, clear from ${from} to ${to}`
		: `Span ${i + 1}, ${from} to ${to} (divider centres)`;
}

/** A field's place, named as the form names it for this support (a wall-hung shelf's reach and width). */
export function fieldPlace(
	key: FieldKey,
	draft: Pick<ShelfDraft, 'support' | 'spans' | 'divider'>
) {
	const span = /^spans\.(\d+)$/.exec(key);
	if (span) {
		const i = Number(span[1]);
		return {
			id: `shelf-span-${i}`,
			label: spanLabel(i, draft.spans.length, draft.divider.trim() !== '')
		};
	}
	const place = FIELD_PLACES[key as keyof ShelfDraft];
	if (!place || draft.support !== 'cantilever') return place;
	if (key === 'span') return { ...place, label: 'Reach out from the wall' };
	if (key === 'depth') return { ...place, label: 'Width along the wall' };
	return place;
}

/** Which form field an engine issue belongs to (issues are paths into the request). */
export function fieldOf(path: (string | number)[]): FieldKey | 'form' {
	const [head, second, key] = path;
	if (head === 'support' && second === 'spans') return `spans.${typeof key === 'number' ? key : 0}`;
	if (head === 'support' && second === 'divider') return 'divider';
	if (head === 'span' || head === 'support') return 'span';
	if (head === 'depth' || head === 'thickness' || head === 'material') return head;
	if (head === 'loads') return key === 'at' ? 'pointAt' : 'load';
	if (head === 'edges') return 'front';
	if (head === 'limit') return 'limitRatio';
	return 'form';
}
