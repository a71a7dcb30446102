/**
 * Each shelf's verdict for the drawing and the lists: the tighter of its two margins (sag against
 * the limit, bending stress against the allowed stress), in words.
 */
import type { CaseDesign } from '../schemas/case';
import type { CaseMargin, CaseResult, CaseShelf } from '../engine/case/types';
import { formatLength } from '../engine/units/length';
import type { UserLengthUnit } from '../workbench/lengths';
import { count } from '../kinds/words';
import { marginWords } from './words';

/** The key the elevation uses for a shelf: its index in the design, or 'top' / 'bottom'. */
export const shelfKey = (s: CaseShelf) =>
	s.path[0] === 'shelves' ? String(s.path[1]) : String(s.path[0]);

/** The governing margin of one shelf: a failing one before a passing one, then the smaller. */
export function governingMargin(result: CaseResult, s: CaseShelf): CaseMargin | undefined {
	const at = s.path.join('.');
	const own = result.margins.filter((m) => m.key === `${at}:sag` || m.key === `${at}:strength`);
	// result.margins is already worst first
	return own[0];
}

export function shelfVerdicts(result: CaseResult): Record<string, { pass: boolean; text: string }> {
	const out: Record<string, { pass: boolean; text: string }> = {};
	for (const s of result.shelves) {
		const m = governingMargin(result, s);
		const v = marginWords(m?.margin ?? null, s.pass);
		out[shelfKey(s)] = { pass: s.pass, text: `${s.name}: ${v.words}` };
	}
	return out;
}

/** The drawing in one or two sentences, for screen readers. */
export function elevationDescription(d: CaseDesign, r: CaseResult, unit: UserLengthUnit): string {
	const L = (m: number) => formatLength(m, { unit });
	const failing = r.shelves.filter((s) => !s.pass).map((s) => s.name);
	const shelves = count(d.shelves.length, 'shelf', 'shelves');
	const heights = d.shelves.map((s) => L(s.height)).join(', ');
	const verdict = failing.length
		? `Failing: ${failing.join(', ')}.`
		: 'Every shelf is within its limit and allowed stress.';
	return `A case ${L(d.width)} wide, ${L(d.height)} high and ${L(d.depth)} deep with ${shelves}${heights ? ` at ${heights} from the floor` : ''}. ${verdict}`;
}
