/**
 * The comparison computed in the browser: for each candidate the shelf at the current span, the
 * longest span within the limit (inverse solver) and the sag over a range of spans for the chart.
 *
 * A span change recomputes the chart, so it is kept cheap: each candidate's request is read by its
 * schema once, the chart's spans go to the engine directly with the schema's span checks made on
 * the numbers (what reading each span's request again would find), and the longest span, which does
 * not depend on the span typed, is remembered per candidate.
 */
import { safeAnalyzeShelf, safeMaxSpan } from '../compute';
import type { InputIssue } from '../engine/errors';
import { analyzeInput, geometryIssues, safely } from '../engine/shelf';
import type { MaxSpanResult } from '../engine/shelf';
import type { SafeResult, ShelfInput, ShelfResult } from '../engine/shelf/types';
import { comparisonShelf, type ComparisonRequest } from '../schemas/analysis';
import { parseRequest } from '../schemas/parse';
import { MAX_SPAN_M, shelfRequestSchema, type ShelfRequest } from '../schemas/shelf';

export interface CandidateRun {
	id: string;
	label: string;
	result: ShelfResult | null;
	maxSpanM: number | null;
	/** [span, checked sag] in metres */
	points: [number, number][];
	issue: string | null;
	/** every issue of this candidate's shelf, each with its path into the shelf request */
	issues: InputIssue[];
}

/** The shelf request of candidate i, as sent. */
export function candidateRequest(req: ComparisonRequest, i: number): ShelfRequest {
	return comparisonShelf(req, i);
}

/** Spans for the chart: from a third of the current span to past the longest span found. */
export function chartSpans(currentM: number, longestM: number, count = 32): number[] {
	const from = Math.max(0.1, currentM / 3);
	const to = Math.max(currentM * 1.4, Math.min(longestM * 1.15, currentM * 3));
	return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

/** The same shelf at another span (over dividers: equal spans), as its request would read. */
export function at(request: ShelfRequest, spanM: number): ShelfRequest {
	const support = request.support;
	if (support && typeof support === 'object') {
		const n = support.spans.length;
		return { ...request, span: spanM, support: { ...support, spans: Array(n).fill(spanM / n) } };
	}
	return { ...request, span: spanM };
}

const within = (m: number) => m > 0 && m <= MAX_SPAN_M;

/**
 * The read input at another span, or null where the schema would refuse that span's request (a
 * span out of range, a load no longer on the shelf): the checks of the span that reading
 * `at(request, spanM)` again would make, on numbers already read.
 */
function inputAt(input: ShelfInput, spanM: number): ShelfInput | null {
	if (!within(spanM)) return null;
	const support = input.support;
	let next: ShelfInput;
	if (typeof support === 'object') {
		const n = support.spans.length;
		if (!within(spanM / n)) return null;
		next = { ...input, span: spanM, support: { ...support, spans: Array(n).fill(spanM / n) } };
	} else next = { ...input, span: spanM };
	return geometryIssues(next, true).length ? null : next;
}

const readShelf = safely((request: ShelfRequest) => parseRequest(shelfRequestSchema, request));
const analyzeRead = safely(analyzeInput);

// the longest span does not depend on the span typed: remembered for the last few candidates
const longestKept = new Map<string, SafeResult<MaxSpanResult>>();
function longestSpan(request: ShelfRequest): SafeResult<MaxSpanResult> {
	const key = JSON.stringify({ ...request, span: undefined });
	let found = longestKept.get(key);
	if (!found) {
		found = safeMaxSpan({ ...request, span: undefined });
		if (longestKept.size >= 32) longestKept.delete(longestKept.keys().next().value!);
		longestKept.set(key, found);
	}
	return found;
}

export function runComparison(req: ComparisonRequest, currentM: number | null) {
	const requests = req.candidates.map((_, i) => candidateRequest(req, i));
	const runs: CandidateRun[] = requests.map((r, i) => {
		const now = safeAnalyzeShelf(r);
		const longest = longestSpan(r);
		return {
			id: String(i),
			label: req.candidates[i].label ?? `Candidate ${i + 1}`,
			result: now.ok ? now.result : null,
			maxSpanM: longest.ok && !longest.result.capped ? longest.result.span : null,
			points: [],
			issue: now.ok ? null : (now.issues[0]?.message ?? 'Could not be computed.'),
			issues: now.ok ? [] : now.issues
		};
	});
	if (currentM === null) return { runs, limit: [] as [number, number][] };
	const longest = Math.max(currentM, ...runs.map((r) => r.maxSpanM ?? 0));
	const spans = chartSpans(currentM, longest);
	const limit: [number, number][] = [];
	const limitFrom = runs.findIndex((r) => r.result);
	runs.forEach((run, i) => {
		if (!run.result) return;
		const read = readShelf(requests[i]);
		if (!read.ok) return;
		for (const s of spans) {
			const input = inputAt(read.result, s);
			if (!input) continue;
			const out = analyzeRead(input);
			if (!out.ok) continue;
			run.points.push([s, out.result.sag[out.result.sag.checked]]);
			if (limit.length < spans.length && i === limitFrom) limit.push([s, out.result.limit.allowed]);
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
