import type { AnalysisKind } from '$lib/kinds/names';

export interface AnalysisRow {
	id: string;
	projectId: string;
	kind: AnalysisKind;
	name: string;
	summary: string;
	pass: boolean | null;
	version: number;
	updatedAt: string;
	updatedByName: string | null;
}
export interface AnalysisPage {
	items: AnalysisRow[];
	total: number;
	page: number;
	perPage: number;
}
