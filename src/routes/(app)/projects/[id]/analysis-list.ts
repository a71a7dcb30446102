import type { AnalysisKindName, AnalysisListQuery } from '$lib/schemas/analysis';

export interface AnalysisRow {
	id: string;
	projectId: string;
	kind: AnalysisKindName;
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

async function call<T>(url: string, init: RequestInit = {}): Promise<T> {
	const res = await fetch(url, {
		...init,
		headers: { accept: 'application/json', 'content-type': 'application/json' }
	});
	if (!res.ok) {
		const body = await res.json().catch(() => null);
		throw new Error(body?.error ?? `the server answered ${res.status}`);
	}
	return res.json();
}

/** One page of a project's analyses from the API, as the browser asks for it. */
export function listAnalysesPage(
	projectId: string,
	query: Partial<AnalysisListQuery>,
	signal: AbortSignal
): Promise<AnalysisPage> {
	const entries = Object.entries(query).filter(([, v]) => v !== undefined && v !== '');
	const params = new URLSearchParams(entries.map(([k, v]) => [k, String(v)]));
	return call(`/api/v1/projects/${projectId}/analyses?${params}`, { signal });
}

export const duplicateAnalysis = (id: string) =>
	call<AnalysisRow>(`/api/v1/analyses/${id}/duplicate`, { method: 'POST', body: '{}' });
export const moveAnalysis = (id: string, projectId: string) =>
	call<AnalysisRow>(`/api/v1/analyses/${id}/move`, {
		method: 'POST',
		body: JSON.stringify({ projectId })
	});
export const deleteAnalysis = (id: string) =>
	call<{ undoUntil: string }>(`/api/v1/analyses/${id}`, { method: 'DELETE' });
export const undoDelete = (id: string) =>
	call<AnalysisRow>(`/api/v1/analyses/${id}/undelete`, { method: 'POST' });
