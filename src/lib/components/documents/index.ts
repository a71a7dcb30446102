export { default as DocumentTile } from './DocumentTile.svelte';
export { default as Uploader } from './Uploader.svelte';
export { default as DocumentsPanel } from './DocumentsPanel.svelte';
export * from './types';
