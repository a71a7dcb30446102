export { default as ConfirmDialog } from './ConfirmDialog.svelte';
