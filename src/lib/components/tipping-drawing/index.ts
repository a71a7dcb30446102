export { default as TippingDrawing } from './TippingDrawing.svelte';
