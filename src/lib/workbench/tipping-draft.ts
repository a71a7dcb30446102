/**
 * The tipping screen's form: the texts as typed, the tip-over request they make, and a stored
 * (validated, SI) request back into texts in the reader's unit. A bare length is read in the
 * reader's unit, a bare weight in their force unit (lbf or N).
 */
import type { StabilityInput } from '../schemas/stability';
import { withUnitMark } from '../components/quantity-input/reading';
import { exactForceText, exactLengthText } from './exact-text';
import { forceText } from './joint-draft';
import type { UserLengthUnit } from './lengths';

export type AnchorChoice = 'none' | 'strap' | 'bracket' | 'screws-through-back';

interface ShelfLoadDraft {
	/** height of the shelf surface above the floor */
	height: string;
	/** what it holds */
	load: string;
}

export interface TippingDraft {
	height: string;
	width: string;
	depth: string;
	/** the empty case */
	weight: string;
	/** its centre of gravity above the floor; '' for half the height */
	centreHeight: string;
	shelves: ShelfLoadDraft[];
	/** the front feet or plinth set back from the front; '' for none */
	setback: string;
	anchoring: AnchorChoice;
	intoStuds: boolean;
}

export const ANCHORS: [AnchorChoice, string][] = [
	['none', 'Not fixed to the wall'],
	['strap', 'A tip-over strap'],
	['bracket', 'A metal bracket'],
	['screws-through-back', 'Screws through the back rail']
];

/** A 72" bookcase, 12" deep, of 3/4" plywood, with books on four shelves (an example). */
export function defaultTippingDraft(unit: UserLengthUnit): TippingDraft {
	const mm = unit === 'mm';
	const shelf = (inches: string, metric: string) => ({
		height: mm ? metric : inches,
		load: mm ? '250 N' : '60 lbf'
	});
	return {
		height: mm ? '1830 mm' : '72"',
		width: mm ? '900 mm' : '36"',
		depth: mm ? '300 mm' : '12"',
		weight: mm ? '450 N' : '100 lbf',
		centreHeight: '',
		shelves: [
			shelf('4"', '100 mm'),
			shelf('20"', '510 mm'),
			shelf('36"', '915 mm'),
			shelf('52"', '1320 mm')
		],
		setback: '',
		anchoring: 'none',
		intoStuds: true
	};
}

const opt = (text: string, unit: UserLengthUnit) =>
	text.trim() === '' ? undefined : withUnitMark(text, unit);

/** The tip-over request of a draft; unreadable texts pass through so the schema names them. */
export function toStabilityInput(d: TippingDraft, unit: UserLengthUnit): StabilityInput {
	const L = (text: string) => withUnitMark(text, unit);
	return {
		height: L(d.height),
		width: L(d.width),
		depth: L(d.depth),
		construction: { weight: forceText(d.weight, unit), centreHeight: opt(d.centreHeight, unit) },
		contents: d.shelves.map((s) => ({ weight: forceText(s.load, unit), height: L(s.height) })),
		base: { setback: opt(d.setback, unit) },
		anchoring: { kind: d.anchoring, intoStuds: d.anchoring === 'none' ? undefined : d.intoStuds }
	};
}

type Stored = Partial<Record<string, unknown>>;
const record = (v: unknown): Stored => (v && typeof v === 'object' ? (v as Stored) : {});

/** A stored request (SI numbers) back into the form's texts, in the reader's unit. */
export function fromStabilityInput(input: unknown, unit: UserLengthUnit): TippingDraft {
	const d = defaultTippingDraft(unit);
	const s = record(input);
	const L = (v: unknown, fallback: string) =>
		typeof v === 'number' ? exactLengthText(v, unit) : fallback;
	const F = (v: unknown, fallback: string) =>
		typeof v === 'number' ? exactForceText(v, unit) : fallback;
	d.height = L(s.height, d.height);
	d.width = L(s.width, d.width);
	d.depth = L(s.depth, d.depth);
	const c = record(s.construction);
	d.weight = F(c.weight, d.weight);
	d.centreHeight = L(c.centreHeight, '');
	if (Array.isArray(s.contents))
		d.shelves = s.contents.map((x) => {
			const r = record(x);
			return { height: L(r.height, ''), load: F(r.weight, '') };
		});
	d.setback = L(record(s.base).setback, '');
	const a = record(s.anchoring);
	const kind = ANCHORS.find(([k]) => k === a.kind);
	if (kind) d.anchoring = kind[0];
	d.intoStuds = a.intoStuds !== false;
	return d;
}

/** The id of the control an issue belongs to, and its label, for the list of marked fields. */
export function tippingFieldOf(path: (string | number)[]): { id: string; label: string } {
	const [head, i, key] = path;
	const overall = typeof head === 'string' ? head.replace(/M$/, '') : head;
	if (overall === 'height' || overall === 'width' || overall === 'depth')
		return { id: `tip-${overall}`, label: `Overall ${overall}` };
	if (head === 'construction')
		return i === 'centreHeight'
			? { id: 'tip-centre', label: 'Centre of gravity' }
			: { id: 'tip-weight', label: 'Weight of the empty case' };
	if (head === 'contents' && typeof i === 'number')
		return key === 'height' || key === 'heightM'
			? { id: `tip-shelf-${i}-height`, label: `Shelf ${i + 1}: height` }
			: { id: `tip-shelf-${i}-load`, label: `Shelf ${i + 1}: what it holds` };
	if (head === 'base') return { id: 'tip-setback', label: 'Feet set back' };
	return { id: 'tip-anchoring', label: 'Fixing to the wall' };
}
