/**
 * A material comparison in one line, for lists and records: how many candidates meet the limit and
 * which sags least. Every figure is the engine's.
 */
import { formatLength } from '../engine/units/length';
import { count, percent, type ReaderUnit } from './words';

interface CandidateOutcome {
	label: string;
	pass: boolean;
	sagM: number;
	limitName: string;
	margin: number;
}

/** '2 of 3 candidates meet L/144; least sag: 3/4" birch multi-ply, 1/16", 60% to spare.' */
export function comparisonSentence(outcomes: CandidateOutcome[], unit: ReaderUnit) {
	const passing = outcomes.filter((o) => o.pass).length;
	const best = [...outcomes].sort((a, b) => a.sagM - b.sagM)[0];
	const limit = best?.limitName ?? 'the limit';
	const head = `${passing} of ${count(outcomes.length, 'candidate')} ${passing === 1 ? 'meets' : 'meet'} ${limit}`;
	if (!best) return `${head}.`;
	const spare =
		best.margin >= 0 ? `${percent(best.margin)} to spare` : `over by ${percent(-best.margin)}`;
	return `${head}; least sag: ${best.label}, ${formatLength(best.sagM, { unit })}, ${spare}.`;
}
