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
