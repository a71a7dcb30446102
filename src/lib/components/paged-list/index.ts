export { PagedFetch } from './paged-fetch.svelte';
