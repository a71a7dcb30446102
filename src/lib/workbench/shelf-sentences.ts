/**
 * A shelf result said in plain sentences, numbers in the user's unit: the sag when loaded and
 * after a year, the verdict against the limit with the margin in words, the stress.
 */
import type { ShelfResult } from '../engine/types';
import { formatLength } from '../engine/length';
import type { UserLengthUnit } from './lengths';

/** "about 3/32"", or "less than 1/16"" when it rounds to nothing in the user's unit. */
export function aboutLength(metres: number, unit: UserLengthUnit): string {
	const text = formatLength(metres, { unit });
	if (text.startsWith('< ')) return `less than ${text.slice(2)}`;
	if (metres === 0) return 'not at all';
	return `about ${text}`;
}

export function percent(share: number): string {
	return `${Math.round(share * 100)}%`;
}

export interface ShelfSentences {
	/** the sag sentence and the verdict sentence */
	sag: string;
	verdict: string;
	stress: string;
	/** a few words for the drawing's verdict line: "Within L/144" */
	short: string;
	pass: boolean;
}

/**
 * @param contents what the load is, for "after a year under the same …" (books, dishes, load)
 */
export function describeShelf(
	r: ShelfResult,
	unit: UserLengthUnit,
	contents = 'load',
	cantilever = false
): ShelfSentences {
	const where = cantilever ? 'at its tip ' : '';
	const creeps = r.sag.checked === 'longTerm' && r.sag.longTerm > r.sag.instant * 1.005;
	const sag = creeps
		? `This shelf sags ${where}${aboutLength(r.sag.instant, unit)} when loaded, and ${aboutLength(r.sag.longTerm, unit)} after a year under the same ${contents}.`
		: `This shelf sags ${where}${aboutLength(r.sag.instant, unit)} when loaded.`;
	const limit = `the ${r.limit.name} limit`;
	const allowed = formatLength(r.limit.allowed, { unit });
	const margin = r.limit.margin;
	let verdict: string;
	if (r.limit.pass)
		verdict =
			margin < 0.05
				? `That is just within ${limit} (${allowed}), with almost nothing to spare.`
				: `That is within ${limit} (${allowed}), with ${percent(margin)} to spare.`;
	else
		verdict = `That is more than ${limit} allows (${allowed}): ${percent(-margin)} too much sag.`;
	const u = r.strength.utilisation;
	const stress =
		u <= 1
			? `The bending stress is ${percent(u)} of what the material is allowed (its breaking strength divided by ${r.strength.safetyFactor}).`
			: `The bending stress is ${percent(u)} of what the material is allowed: the shelf could crack or break.`;
	return {
		sag,
		verdict,
		stress,
		short: !r.strength.pass
			? 'Overstressed: could break'
			: r.limit.pass
				? `Within ${r.limit.name}`
				: `Over ${r.limit.name}`,
		pass: r.limit.pass && r.strength.pass
	};
}
