import { analysisPageQuerySchema } from '$lib/schemas/list-page';
import { fetchListPage } from '$lib/components/paged-list/fetch-page';
import type { AnalysisPage } from './analysis-list';
import type { PageLoad } from './$types';

const PER_PAGE = 10;

// The analyses table: rendered on the server on the first visit (works without JavaScript), then
// fetched by the browser from the JSON API on every search, filter, sort or page (?q=…&page=…).
export const load: PageLoad = async ({ url, fetch, params, data }) => {
	const query = analysisPageQuerySchema.parse(Object.fromEntries(url.searchParams));
	const list = await fetchListPage<AnalysisPage>(fetch, `/api/v1/projects/${params.id}/analyses`, {
		...query,
		perPage: PER_PAGE
	});
	return { ...data, query, manage: url.searchParams.get('manage'), ...list };
};
