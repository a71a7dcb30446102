export { default as CaseElevation } from './CaseElevation.svelte';
export {
	layoutElevation,
	type Box,
	type ElevationLayout,
	type ElevationShelf,
	type Opening
} from './geometry';
