import type { ProjectListQuery } from '$lib/schemas/project';

export interface ProjectRow {
	id: string;
	name: string;
	client: string;
	updatedAt: string;
}
export interface ProjectPage {
	items: ProjectRow[];
	total: number;
	page: number;
	perPage: number;
}

/** One page of projects from the API, as the browser asks for it. */
export async function listProjectsPage(
	query: ProjectListQuery,
	signal: AbortSignal
): Promise<ProjectPage> {
	const params = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)]));
	const res = await fetch(`/api/v1/projects?${params}`, {
		signal,
		headers: { accept: 'application/json' }
	});
	if (!res.ok) {
		const body = await res.json().catch(() => null);
		throw new Error(body?.error ?? `the server answered ${res.status}`);
	}
	return res.json();
}
