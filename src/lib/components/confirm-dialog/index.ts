export { default as ConfirmDialog } from './ConfirmDialog.svelte';
export { default as ConfirmDelete } from './ConfirmDelete.svelte';
