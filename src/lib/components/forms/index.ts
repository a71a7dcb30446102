export { default as FormField } from './FormField.svelte';
export { accountFields, PASSWORD_HINT } from './account-fields';
