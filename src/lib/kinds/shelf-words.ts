/**
 * A shelf result in plain words, the one writer for the shelf check's screen, the saved summary
 * and the client's record: the sag when loaded and in the long run, the verdict against the limit
 * with the margin in words, the stress. Numbers in the reader's unit; every figure is the engine's.
 */
import type { ShelfResult } from '../engine/shelf/types';
import { formatLength } from '../engine/units/length';
import { apart, percent, type ReaderUnit } from './words';

export { percent };

/** "about 3/32"", or "less than 1/16"" when it rounds to nothing in the user's unit. */
export function aboutLength(metres: number, unit: ReaderUnit, written?: string): string {
	return aboutWritten(metres, written ?? formatLength(metres, { unit }));
}

/** The same for a length already written (`< 1/16"` becomes "less than 1/16""). */
export function aboutWritten(metres: number, text: string): string {
	if (text.startsWith('< ')) return `less than ${text.slice(2)}`;
	if (metres === 0) return 'not at all';
	return `about ${text}`;
}

export interface ShelfSentences {
	/** the sag sentence and the verdict sentence */
	sag: string;
	verdict: string;
	stress: string;
	/** a few words for the drawing's verdict line: "Within L/144" */
	short: string;
	/** the word for the sag that is marked on the drawing */
	sagLabel: string;
	/** one line for lists and records */
	summary: string;
	pass: boolean;
}

interface ShelfWording {
	/** what the load is, for "under the same books" */
	contents?: string;
	cantilever?: boolean;
	/** a brief load (a person leaning, a box set down): its sag does not grow with time */
	brief?: boolean;
}

/**
 * The long-term sag of a brief load is only the shelf's own weight creeping (EN 1995-1-1 §2.3.2.2
 * applies creep to the permanent load), so it never says "under the same books" nor names a time.
 */
export function describeShelf(
	r: ShelfResult,
	unit: ReaderUnit,
	{ contents = 'load', cantilever = false, brief = false }: ShelfWording = {}
): ShelfSentences {
	const where = cantilever ? 'at its tip ' : '';
	const creeps = r.sag.checked === 'longTerm' && r.sag.longTerm > r.sag.instant * 1.005;
	const governing = r.sag.checked === 'longTerm' ? r.sag.longTerm : r.sag.instant;
	// the sag that decides the verdict and the allowance, told apart when they would read the same
	const [sagText, allowed] = apart(governing, r.limit.allowed, unit);
	const instant = aboutLength(
		r.sag.instant,
		unit,
		r.sag.checked === 'instant' ? sagText : undefined
	);
	const later = aboutLength(r.sag.longTerm, unit, sagText);
	const sag = !creeps
		? `This shelf sags ${where}${instant} when loaded.`
		: brief
			? `This shelf sags ${where}${instant} under the brief load; once its own weight has settled it over time, ${later} with the same load on it.`
			: `This shelf sags ${where}${instant} when loaded, and ${later} in the long run under the same ${contents}.`;
	const limit = `the ${r.limit.name} limit`;
	const margin = r.limit.margin;
	let verdict: string;
	if (r.limit.pass)
		verdict =
			margin < 0.05
				? `That is just within ${limit} (${allowed}), with almost nothing to spare.`
				: `That is within ${limit} (${allowed}), with ${percent(margin)} to spare.`;
	else {
		const over = percent(-margin);
		verdict = `That is more than ${limit} allows (${allowed}): ${over === '0%' ? 'less than 1%' : over} too much sag.`;
	}
	const u = r.strength.utilisation;
	const stress =
		u <= 1
			? `The bending stress is ${percent(u)} of what the material is allowed (its breaking strength divided by ${r.strength.safetyFactor}).`
			: `The bending stress is ${percent(u)} of what the material is allowed: the shelf could crack or break.`;
	const pass = r.limit.pass && r.strength.pass;
	const verdictShort = r.limit.pass
		? `within ${r.limit.name} with ${percent(margin)} to spare`
		: `over ${r.limit.name} by ${percent(-margin)} (${allowed} allowed)`;
	const sagShort = !creeps
		? `Sags ${formatLength(r.sag.instant, { unit })} ${r.sag.checked === 'instant' ? 'under a brief load' : 'when loaded'}`
		: `Sags ${formatLength(r.sag.instant, { unit })} when loaded, ${sagText} ${brief ? 'once settled' : 'long-term'}`;
	const overstressed = r.strength.pass
		? ''
		: `; overstressed: bending stress at ${percent(u)} of the allowed`;
	return {
		sag,
		verdict,
		stress,
		short: !r.strength.pass
			? 'Overstressed: could break'
			: r.limit.pass
				? `Within ${r.limit.name}`
				: `Over ${r.limit.name}`,
		sagLabel: !creeps ? 'when loaded' : brief ? 'once settled' : 'in the long run',
		summary: `${sagShort}; ${verdictShort}${overstressed}.`,
		pass
	};
}
