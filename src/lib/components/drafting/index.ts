export { default as DraftingDefs } from './DraftingDefs.svelte';
