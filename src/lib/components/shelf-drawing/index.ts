export { default as ShelfDrawing } from './ShelfDrawing.svelte';
export {
	exaggerationFor,
	layoutShelf,
	sagAt,
	type DrawingLoad,
	type DrawingStrip,
	type ShelfDrawingInput,
	type ShelfLayout,
	type SupportKind
} from './geometry';
