export { default as SagChart } from './SagChart.svelte';
export { unitTicks, markerPath, SERIES_STYLES, type MarkerShape } from './ticks';
export type { SagSeries } from './types';
