/**
 * A whole case in plain words, the one writer for the case screen's headline, the saved summary and
 * the client's record.
 */
import type { CaseResult } from '../engine/case/types';
import { count, percent } from './words';

interface CaseSentences {
	headline: string;
	summary: string;
	pass: boolean;
}

export function describeCase(r: Pick<CaseResult, 'pass' | 'margins' | 'summary'>): CaseSentences {
	const checks = count(r.margins.length, 'check');
	const head = r.pass
		? r.margins.length === 1
			? 'The 1 check passes'
			: `All ${checks} pass`
		: `${r.summary.failures} of ${checks} ${r.summary.failures === 1 ? 'fails' : 'fail'}`;
	const worst = r.margins[0];
	const by =
		!worst || worst.margin === null
			? ''
			: worst.pass
				? `, ${percent(Math.abs(worst.margin))} to spare`
				: `, over by ${percent(Math.abs(worst.margin))}`;
	return {
		headline: `${head}. This is an estimate: the ${r.pass ? 'least margin' : 'worst'} comes first.`,
		summary: worst
			? `${head}; ${r.pass ? 'least margin' : 'worst'}: ${worst.what}${by}.`
			: `${head}.`,
		pass: r.pass
	};
}

/** "The other check, passing" / "The other 4 checks, all passing" */
export function otherChecks(n: number) {
	return n === 1 ? 'The other check, passing' : `The other ${n} checks, all passing`;
}

/** The wall screen's headline: every case's checks at once. */
export function wallHeadline(cases: number, failures: number) {
	return failures === 0
		? `Every check across the ${cases} cases passes.`
		: `${count(failures, 'check')} across the wall fail${failures === 1 ? 's' : ''}; the worst come first.`;
}
