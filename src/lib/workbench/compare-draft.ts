/**
 * The material comparison as typed: one shelf (span, depth, support, load, limit) and 2–8
 * candidates of material, thickness and an optional nosing; its request (src/lib/schemas/
 * analysis.ts, comparisonRequestSchema) and the way back from a stored input.
 */
import type { ComparisonRequest } from '../schemas/analysis';
import { findMaterial } from '../engine/index';
import { METRES_PER_INCH, formatLength, tryParseLength } from '../engine/units/length';
import { withUnitMark } from '../components/quantity-input/reading';
import { lengthText, type UserLengthUnit } from './lengths';
import { defaultDraft, fromInput, toRequest, type ShelfDraft } from './shelf-draft';

export interface CandidateDraft {
	material: string;
	thickness: string;
	nosing: boolean;
	/** height of a solid nosing on the front edge */
	nosingHeight: string;
}

export interface ComparisonDraft {
	shelf: ShelfDraft;
	candidates: CandidateDraft[];
}

const NOSING_MATERIAL = 'red-oak';
const NOSING_THICKNESS_M = 0.75 * METRES_PER_INCH; // a common nosing (common practice, no source)

export function candidate(material: string, unit: UserLengthUnit): CandidateDraft {
	const mm = unit === 'mm';
	return {
		material,
		thickness: mm ? '18 mm' : '3/4"',
		nosing: false,
		nosingHeight: mm ? '38 mm' : '1 1/2"'
	};
}

export function defaultComparison(unit: UserLengthUnit): ComparisonDraft {
	return {
		shelf: defaultDraft(unit),
		candidates: [candidate('hardwood-plywood-veneer-core', unit), candidate('mdf', unit)]
	};
}

/** How the chart and the table name a candidate: `3/4" MDF + 1 1/2" nosing`. */
export function candidateLabel(c: CandidateDraft, unit: UserLengthUnit): string {
	const full = findMaterial(c.material)?.name ?? c.material;
	const name = full.replace(/\s*\(.*?\)/g, '').replace(/, solid$/, '');
	const L = (text: string) => {
		const read = tryParseLength(withUnitMark(text, unit));
		return read.ok ? formatLength(read.value, { unit }) : text.trim();
	};
	const strip = c.nosing ? ` + ${L(c.nosingHeight)} nosing` : '';
	return `${L(c.thickness)} ${name}${strip}`.slice(0, 80);
}

/**
 * The comparison charts sag against one span, so over a divider it keeps one length: the whole
 * shelf, with the divider taken at its middle as a point (spans from centre to centre, as stored
 * comparisons have always been). Spans of their own are the shelf check's.
 */
function comparedShelf(d: ShelfDraft, unit: UserLengthUnit) {
	const { material: _m, thickness: _t, edges: _e, ...shelf } = toRequest(d, unit);
	void _m;
	void _t;
	void _e;
	if (d.support !== 'continuous') return shelf;
	const total = tryParseLength(withUnitMark(d.span, unit));
	const n = d.spans.length;
	return {
		...shelf,
		span: withUnitMark(d.span, unit),
		support: total.ok
			? { spans: Array.from({ length: n }, () => total.value / n), ends: 'simple' as const }
			: ('simple' as const)
	};
}

export function toComparisonRequest(d: ComparisonDraft, unit: UserLengthUnit): ComparisonRequest {
	const shelf = comparedShelf(d.shelf, unit);
	return {
		shelf,
		candidates: d.candidates.map((c) => ({
			material: c.material,
			thickness: withUnitMark(c.thickness, unit),
			edges: c.nosing
				? [
						{
							side: 'front' as const,
							material: NOSING_MATERIAL,
							height: withUnitMark(c.nosingHeight, unit),
							thickness: NOSING_THICKNESS_M
						}
					]
				: [],
			label: candidateLabel(c, unit)
		}))
	};
}

/** A stored comparison (validated, SI) back into texts in the reader's unit. */
export function fromComparisonInput(input: unknown, unit: UserLengthUnit): ComparisonDraft {
	const d = defaultComparison(unit);
	if (!input || typeof input !== 'object') return d;
	const s = input as { shelf?: unknown; candidates?: unknown };
	const L = (v: unknown, fallback: string) =>
		typeof v === 'number' ? lengthText(v, unit) : typeof v === 'string' ? v : fallback;
	d.shelf = fromInput({ ...(s.shelf as object), edges: [] }, unit);
	if (Array.isArray(s.candidates))
		d.candidates = s.candidates.map((raw) => {
			const c = raw as { material?: unknown; thickness?: unknown; edges?: { height?: unknown }[] };
			const base = candidate(typeof c.material === 'string' ? c.material : 'mdf', unit);
			const nosing = Array.isArray(c.edges) && c.edges.length > 0;
			return {
				...base,
				thickness: L(c.thickness, base.thickness),
				nosing,
				nosingHeight: nosing ? L(c.edges![0].height, base.nosingHeight) : base.nosingHeight
			};
		});
	return d;
}
