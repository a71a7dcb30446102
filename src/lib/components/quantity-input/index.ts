export { default as QuantityInput } from './QuantityInput.svelte';
export { readLengthText, readLoadText, withUnitMark, type Reading } from './reading';
