export { default as ErrorSummary } from './ErrorSummary.svelte';
