import { bisector } from 'd3-array';

const bisect = bisector<[number, number], number>((d) => d[0]).left;

/** A curve's value at `s`, read by straight lines between its points (the chart's readout). */
export function valueAt(points: [number, number][], s: number): number {
	const i = Math.min(points.length - 1, Math.max(1, bisect(points, s)));
	const [a, ya] = points[i - 1];
	const [b, yb] = points[i];
	return b === a ? yb : ya + ((yb - ya) * (s - a)) / (b - a);
}
