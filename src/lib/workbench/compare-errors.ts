/**
 * The comparison's marked fields: each issue of a candidate's shelf filed under the field that
 * shows it (the shared shelf's, or that candidate's own), and where each field is on the screen,
 * for the summary at the top (components/error-summary).
 */
import type { InputIssue } from '../engine/errors';
import type { ComparisonDraft } from './compare-draft';
import { fieldOf } from './shelf-draft';

/** The shared shelf's fields as the comparison screen shows them. */
const SHELF_PLACES: Record<string, { id: string; label: string }> = {
	span: { id: 'cmp-span', label: 'Span' },
	depth: { id: 'cmp-depth', label: 'Depth' },
	load: { id: 'load-value', label: 'Load' },
	pointAt: { id: 'load-at', label: 'Where the load sits' },
	limitRatio: { id: 'limit-ratio', label: 'Limit' }
};

const CANDIDATE_FIELDS: Record<string, [field: string, id: string, words: string]> = {
	thickness: ['thickness', 'thickness', 'thickness'],
	material: ['material', 'material', 'material'],
	edges: ['edges', 'nosing', 'nosing height']
};

/** Field key → message: `span`, `load` for the shared shelf; `1.thickness` for a candidate's. */
export function compareErrors(
	runs: { issues: InputIssue[] }[],
	spanMissing: boolean
): Partial<Record<string, string>> {
	const out: Partial<Record<string, string>> = {};
	if (spanMissing) out.span = 'Enter the span.';
	runs.forEach((run, i) => {
		for (const issue of run.issues) {
			const own = CANDIDATE_FIELDS[String(issue.path[0])];
			const key = own ? `${i}.${own[0]}` : fieldOf(issue.path);
			out[key] ??= issue.message;
		}
	});
	return out;
}

/** Where a marked field is: its control's id and the words the summary names it by. */
function comparePlace(key: string, draft: ComparisonDraft) {
	const own = /^(\d+)\.(\w+)$/.exec(key);
	if (own) {
		const field = Object.values(CANDIDATE_FIELDS).find(([f]) => f === own[2]);
		if (!field) return undefined;
		return {
			id: `cand-${own[1]}-${field[1]}`,
			label: `Candidate ${Number(own[1]) + 1}, ${field[2]}`
		};
	}
	const place = SHELF_PLACES[key];
	if (place && key === 'span' && draft.shelf.support === 'continuous')
		return { ...place, label: 'Whole length' };
	return place;
}

/** The summary's list: each marked field with a place, and its message. */
export function compareProblems(errors: Partial<Record<string, string>>, draft: ComparisonDraft) {
	return Object.entries(errors).flatMap(([key, message]) => {
		const place = comparePlace(key, draft);
		return place && message ? [{ ...place, message }] : [];
	});
}
