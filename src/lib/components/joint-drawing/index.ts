export { default as JointDrawing } from './JointDrawing.svelte';
