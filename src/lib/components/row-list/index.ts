export { default as RowList } from './RowList.svelte';
