/**
 * The comparison computed in the browser: for each candidate the shelf at the current span, the
 * longest span within the limit (inverse solver) and the sag over a range of spans for the chart.
 */
import { safeAnalyzeShelf, safeMaxSpan } from '../compute';
import type { ShelfResult } from '../engine/shelf/types';
import type { ComparisonRequest } from '../schemas/analysis';
import type { ShelfRequest } from '../schemas/shelf';

export interface CandidateRun {
	id: string;
	label: string;
	result: ShelfResult | null;
	maxSpanM: number | null;
	/** [span, checked sag] in metres */
	points: [number, number][];
	issue: string | null;
}

/** The shelf request of candidate i (the same merge as comparisonShelf in the schema module). */
export function candidateRequest(req: ComparisonRequest, i: number): ShelfRequest {
	const c = req.candidates[i];
	return {
		...req.shelf,
		material: c.material,
		thickness: c.thickness,
		edges: c.edges ?? req.shelf.edges
	};
}

/** Spans for the chart: from a third of the current span to past the longest span found. */
export function chartSpans(currentM: number, longestM: number, count = 32): number[] {
	const from = Math.max(0.1, currentM / 3);
	const to = Math.max(currentM * 1.4, Math.min(longestM * 1.15, currentM * 3));
	return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

function at(request: ShelfRequest, spanM: number): ShelfRequest {
	const support = request.support;
	if (support && typeof support === 'object') {
		const n = support.spans.length;
		return { ...request, span: spanM, support: { ...support, spans: Array(n).fill(spanM / n) } };
	}
	return { ...request, span: spanM };
}

export function runComparison(req: ComparisonRequest, currentM: number | null) {
	const requests = req.candidates.map((_, i) => candidateRequest(req, i));
	const runs: CandidateRun[] = requests.map((r, i) => {
		const now = safeAnalyzeShelf(r);
		const longest = safeMaxSpan({ ...r, span: undefined });
		return {
			id: String(i),
			label: req.candidates[i].label ?? `Candidate ${i + 1}`,
			result: now.ok ? now.result : null,
			maxSpanM: longest.ok && !longest.result.capped ? longest.result.span : null,
			points: [],
			issue: now.ok ? null : (now.issues[0]?.message ?? 'Could not be computed.')
		};
	});
	if (currentM === null) return { runs, limit: [] as [number, number][] };
	const longest = Math.max(currentM, ...runs.map((r) => r.maxSpanM ?? 0));
	const spans = chartSpans(currentM, longest);
	const limit: [number, number][] = [];
	runs.forEach((run, i) => {
		if (!run.result) return;
		for (const s of spans) {
			const out = safeAnalyzeShelf(at(requests[i], s));
			if (!out.ok) continue;
			run.points.push([s, out.result.sag[out.result.sag.checked]]);
			if (limit.length < spans.length && i === runs.findIndex((r) => r.result))
				limit.push([s, out.result.limit.allowed]);
		}
	});
	return { runs, limit };
}

/**
 * A figure split at its alignment point, so a column lines up on the fraction or the decimal:
 * `41 7/8"` → ['41', ' 7/8"'], `3/16"` → ['', '3/16"'], `1.25"` → ['1', '.25"'], `902 mm` → ['902', ' mm'].
 */
export function alignParts(text: string): [string, string] {
	const m = text.match(/^(-?<?\s?\d*)(.*)$/);
	if (!m) return ['', text];
	let [, whole, rest] = m;
	// a bare fraction: its numerator belongs after the alignment point
	if (rest.startsWith('/')) {
		rest = whole.trim() + rest;
		whole = '';
	}
	return [whole, rest];
}
