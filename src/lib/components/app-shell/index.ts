export { default as AppShell } from './AppShell.svelte';
export { default as Wordmark } from './Wordmark.svelte';
