/**
 * Axis ticks on the user's own grid: whole inches by 1, 2, 3, 6 or 12 for spans, binary fractions
 * (1/64 … 1") for sags, and round millimetres for a millimetre user.
 */
import { METRES_PER_INCH } from '../../engine/units/length';

const INCH_STEPS = [1 / 64, 1 / 32, 1 / 16, 1 / 8, 1 / 4, 1 / 2, 1, 2, 3, 6, 12, 24, 48];
const MM_STEPS = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];

/** Ticks from 0 to at least `maxM` (metres), at most about `count` of them, in metres. */
export function unitTicks(maxM: number, metric: boolean, count = 5): number[] {
	if (!(maxM > 0)) return [0];
	const per = metric ? 0.001 : METRES_PER_INCH;
	const max = maxM / per;
	const steps = metric ? MM_STEPS : INCH_STEPS;
	const step = steps.find((s) => max / s <= count) ?? steps[steps.length - 1];
	const ticks: number[] = [];
	for (let v = 0; v <= max + step * 1e-9; v += step) ticks.push(v * per);
	return ticks;
}

/** A line style per candidate: dash pattern and marker shape, so colour is never the only cue. */
export const SERIES_STYLES = [
	{ dash: '', marker: 'circle', color: 'var(--color-graphite)' },
	{ dash: '8 4', marker: 'square', color: 'var(--color-pencil)' },
	{ dash: '2 3', marker: 'triangle', color: 'var(--color-verdict-pass)' },
	{ dash: '10 3 2 3', marker: 'diamond', color: 'var(--color-verdict-warn)' },
	{ dash: '4 2', marker: 'cross', color: 'var(--color-pencil-deep)' },
	{ dash: '1 2', marker: 'circle-open', color: 'var(--color-graphite-soft)' },
	{ dash: '12 4', marker: 'square-open', color: 'var(--color-graphite)' },
	{ dash: '6 2 6 6', marker: 'triangle-open', color: 'var(--color-pencil)' }
] as const;

export type MarkerShape = (typeof SERIES_STYLES)[number]['marker'];

/** An SVG path of a marker of about `size` px centred on (x, y). */
export function markerPath(shape: MarkerShape, x: number, y: number, size = 7): string {
	const h = size / 2;
	switch (shape) {
		case 'circle':
		case 'circle-open':
			return `M${x - h} ${y}a${h} ${h} 0 1 0 ${size} 0a${h} ${h} 0 1 0 ${-size} 0Z`;
		case 'square':
		case 'square-open':
			return `M${x - h} ${y - h}h${size}v${size}h${-size}Z`;
		case 'triangle':
		case 'triangle-open':
			return `M${x} ${y - h}L${x + h} ${y + h}L${x - h} ${y + h}Z`;
		case 'diamond':
			return `M${x} ${y - h}L${x + h} ${y}L${x} ${y + h}L${x - h} ${y}Z`;
		case 'cross':
			return `M${x - h} ${y - h}L${x + h} ${y + h}M${x + h} ${y - h}L${x - h} ${y + h}`;
	}
}

export function markerFilled(shape: MarkerShape): boolean {
	return shape === 'circle' || shape === 'square' || shape === 'triangle' || shape === 'diamond';
}
