import { projectPageQuerySchema } from '$lib/schemas/list-page';
import { fetchListPage } from '$lib/components/paged-list/fetch-page';
import type { ProjectPage } from './project-list';
import type { PageLoad } from './$types';

const PER_PAGE = 10;

// Rendered on the server on the first visit (so it works without JavaScript); every later search,
// sort or page is fetched by the browser from the JSON API with SvelteKit's fetch.
export const load: PageLoad = async ({ url, fetch, parent, data }) => {
	const { workshop } = await parent();
	const query = projectPageQuerySchema.parse(Object.fromEntries(url.searchParams));
	const list = workshop
		? await fetchListPage<ProjectPage>(fetch, '/api/v1/projects', {
				workshop: workshop.id,
				...query,
				perPage: PER_PAGE
			})
		: { list: null, failure: 'You belong to no workshop yet.' };
	return { ...data, query, ...list };
};
