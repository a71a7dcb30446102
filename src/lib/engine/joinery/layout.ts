/**
 * Places along a joint. Every fastener keeps `minSpacingM` from the next (a biscuit's slot length,
 * a pocket's bore, a screw's cited spacing), so no two slots or holes overlap.
 *
 * The first and last go `endM` from each end and the rest evenly between, at most `maxSpacingM`
 * apart; when two do not fit (the joint is shorter than 2·endM + minSpacingM) one goes in the
 * middle. The count never falls as the joint gets longer: both limits on the number of gaps
 * (at least ⌈inner / max⌉, at most ⌊inner / min⌋) grow with the length.
 */
export function spacedAlong(
	lengthM: number,
	endM: number,
	maxSpacingM: number,
	minSpacingM: number
): number[] {
	const inner = lengthM - 2 * endM;
	if (!(inner >= minSpacingM)) return [lengthM / 2];
	const gaps = Math.max(
		1,
		Math.min(Math.ceil(inner / maxSpacingM - 1e-9), Math.floor(inner / minSpacingM))
	);
	const step = inner / gaps;
	return Array.from({ length: gaps + 1 }, (_, i) => endM + i * step);
}

/** How many of a fixed count fit a joint at `minSpacingM` apart (at least one). */
export function countThatFits(lengthM: number, count: number, minSpacingM: number): number {
	return Math.max(1, Math.min(count, Math.floor(lengthM / minSpacingM)));
}

/** `count` places evenly over the joint, each at the middle of an equal share of its length
 * (callers cap the count with countThatFits so that the shares are never shorter than a slot). */
export function evenlyAlong(lengthM: number, count: number): number[] {
	return Array.from({ length: count }, (_, i) => ((i + 0.5) * lengthM) / count);
}

/** A warning when a fixed count was cut to what fits, e.g. ('biscuit slot', 'biscuit slots'). */
export function cappedCountWarning(
	asked: number,
	fits: number,
	one: string,
	many: string
): string[] {
	if (asked <= fits) return [];
	const planned = fits === 1 ? `only one ${one} fits` : `only ${fits} ${many} fit`;
	return [
		`${asked} ${many} were asked for, but ${planned} this joint without overlapping: ${fits} planned.`
	];
}
