export { default as Pager } from './Pager.svelte';
export { default as SortHeader } from './SortHeader.svelte';
export { actionHref, debounce, listHref, sortHref, type ListParams } from './list-url';
export { default as ListForm } from './ListForm.svelte';
export { default as ListTable } from './ListTable.svelte';
