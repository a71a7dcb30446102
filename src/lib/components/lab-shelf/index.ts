export { default as LabShelf } from './LabShelf.svelte';
export {
	VIEW,
	books,
	clipped,
	outline,
	sagOn,
	scalesFor,
	shareAt,
	type LabDrawingInput,
	type LabDrawingSupport,
	type LabShape
} from './geometry';
export { default as LabChart } from './LabChart.svelte';
