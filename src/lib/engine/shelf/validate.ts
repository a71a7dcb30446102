/**
 * Checks on a shelf that need several fields at once (the sum of the spans, one strip per side,
 * loads that lie on the shelf). The shelf schema reports them while reading a request; the case
 * check runs them on the shelves it builds. Every issue names its field.
 */
import type { InputIssue } from '../errors';

export interface GeometryView {
	span?: number;
	support: string | { spans: number[]; divider?: number };
	loads: (
		{ kind: 'area' } | { kind: 'line'; from?: number; to?: number } | { kind: 'point'; at: number }
	)[];
	edges: { side: string }[];
}

export function geometryIssues(value: GeometryView, spanNeeded: boolean): InputIssue[] {
	const issues: InputIssue[] = [];
	const spans = typeof value.support === 'object' ? value.support.spans : undefined;
	const total = typeof value.support === 'object' ? shelfLength(value.support) : value.span;
	if (spans && value.span !== undefined && Math.abs(value.span - (total ?? 0)) > 0.001)
		issues.push({
			path: ['span'],
			message:
				'The span must equal the sum of the spans (and the dividers between them), or be left out.'
		});
	if (spanNeeded && total === undefined)
		issues.push({ path: ['span'], message: 'Expected the span of the shelf.' });
	const sides = new Set<string>();
	value.edges.forEach((edge, i) => {
		if (sides.has(edge.side))
			issues.push({
				path: ['edges', i, 'side'],
				message: `Only one ${edge.side} strip is allowed.`
			});
		sides.add(edge.side);
	});
	if (total === undefined) return issues;
	value.loads.forEach((load, i) => {
		const inside = (x: number | undefined, key: string) => {
			if (x !== undefined && x > total + 1e-9)
				issues.push({
					path: ['loads', i, key],
					message: 'Must lie on the shelf: at most the span from the left end.'
				});
		};
		if (load.kind === 'point') inside(load.at, 'at');
		if (load.kind === 'line') {
			inside(load.from, 'from');
			inside(load.to, 'to');
			if (load.from !== undefined && load.to !== undefined && load.to <= load.from)
				issues.push({
					path: ['loads', i, 'to'],
					message: 'The end of a line load must lie beyond its start.'
				});
		}
	});
	return issues;
}

/**
 * The spans as the beam is computed, support to support: with a divider, each clear span grows by
 * half the divider's thickness at every divider it meets (the shelf taken as resting on a line at
 * the divider's centre: the longer span, the safe side). Without one, the spans as given.
 */
export function centreSpans(support: { spans: number[]; divider?: number }): number[] {
	const half = (support.divider ?? 0) / 2;
	const last = support.spans.length - 1;
	return support.spans.map((l, i) => l + (i > 0 ? half : 0) + (i < last ? half : 0));
}

/** The whole length of a shelf over dividers: its clear spans and the dividers between them. */
export function shelfLength(support: { spans: number[]; divider?: number }): number {
	return centreSpans(support).reduce((a, b) => a + b, 0);
}
