export { default as ChoiceField } from './ChoiceField.svelte';
