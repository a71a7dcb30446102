export { default as QuantityInput } from './QuantityInput.svelte';
export { readLengthText, withUnitMark, type Reading } from './reading';
