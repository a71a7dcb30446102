export { PagedFetch } from './paged-fetch.svelte';
export { default as Pager } from './Pager.svelte';
export { default as SortHeader } from './SortHeader.svelte';
