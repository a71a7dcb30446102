export { default as RecordDocument } from './RecordDocument.svelte';
export type { RecordItemView, RecordView } from './types';
