export { default as ErrorPanel } from './ErrorPanel.svelte';
export { explainError } from './explain';
