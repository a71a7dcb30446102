/**
 * Places along a joint: the first and last at `endM` from each end, the rest evenly between them at
 * no more than `maxSpacingM`. A joint too short for two ends gets one fastener at its middle.
 * The count never falls as the joint gets longer.
 */
export function spacedAlong(lengthM: number, endM: number, maxSpacingM: number): number[] {
	if (lengthM <= 2 * endM) return [lengthM / 2];
	const inner = lengthM - 2 * endM;
	const gaps = Math.max(1, Math.ceil(inner / maxSpacingM - 1e-9));
	const step = inner / gaps;
	return Array.from({ length: gaps + 1 }, (_, i) => endM + i * step);
}

/** `count` places evenly over the joint, each at the middle of an equal share of its length. */
export function evenlyAlong(lengthM: number, count: number): number[] {
	return Array.from({ length: count }, (_, i) => ((i + 0.5) * lengthM) / count);
}
