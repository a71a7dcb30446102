/**
 * The kinds of saved analysis, named once: the database column, the API's `kind`, the labels, the
 * "new analysis" links and the screen each saved analysis opens in all read this list. It imports
 * nothing, so the database schema and the project page can use it without loading any engine; what
 * each kind computes and says is in ./registry.ts, keyed by the same names.
 */
export const ANALYSIS_KINDS = [
	'shelf',
	'comparison',
	'joint',
	'stability',
	'case',
	'wall'
] as const;
export type AnalysisKind = (typeof ANALYSIS_KINDS)[number];

interface KindName {
	/** what a saved analysis of this kind is called in lists and headings */
	label: string;
	/** the project page's link to start one, in the trade's words */
	start: string;
	/** its screen, under /projects/:id/ (new/ and :analysisId) */
	screen: string;
}

export const KIND_NAMES: Record<AnalysisKind, KindName> = {
	shelf: { label: 'Shelf check', start: 'Check a shelf', screen: 'shelf' },
	comparison: { label: 'Material comparison', start: 'Compare materials', screen: 'compare' },
	joint: { label: 'Joint plan', start: 'Plan a joint', screen: 'joint' },
	stability: { label: 'Tipping check', start: 'Check tipping', screen: 'tipping' },
	case: { label: 'Case design', start: 'Design a case', screen: 'case' },
	wall: { label: 'Wall of cases', start: 'Plan a wall of cases', screen: 'wall' }
};

export const kindLabel = (kind: AnalysisKind) => KIND_NAMES[kind].label;

/** The screen of a saved analysis, or of a new one of this kind. */
export function kindScreenPath(projectId: string, kind: AnalysisKind, analysisId = 'new') {
	return `/projects/${projectId}/${KIND_NAMES[kind].screen}/${analysisId}`;
}
