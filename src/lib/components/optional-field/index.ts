export { default as OptionalField } from './OptionalField.svelte';
