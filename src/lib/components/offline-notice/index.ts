export { default as OfflineNotice } from './OfflineNotice.svelte';
