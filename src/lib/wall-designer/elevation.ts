/**
 * What the wall's front elevation draws, read from the checked wall: the panels and the fronts
 * (each with its index among the parts, for its cut-list mark), each shelf's worst margin, and the
 * drawing's description in words.
 */
import { marginWords } from '../case-designer/words';
import type { WallPart, WallResult } from '../engine/wall/types';
import { count } from '../kinds/words';

export interface DrawnPart {
	p: WallPart;
	/** its place among the wall's parts: the index of its cut-list mark */
	i: number;
}

const isFront = (p: WallPart) => p.role === 'drawer front' || p.role === 'door';

/** The panels drawn in the elevation (fronts aside), and the drawer fronts and doors. */
export function elevationParts(result: WallResult): { panels: DrawnPart[]; fronts: DrawnPart[] } {
	const all = result.parts.map((p, i) => ({ p, i }));
	return {
		panels: all.filter(({ p }) => p.elevation && !isFront(p)),
		fronts: all.filter(({ p }) => isFront(p))
	};
}

/** A shelf's verdict: it passes only if every check of it does; the words of its worst margin. */
export function shelfVerdict(result: WallResult, part: WallPart) {
	if (part.path[2] !== 'shelves' || !part.role.endsWith('shelf')) return null;
	const k = result.margins.filter(
		(m) => m.caseIndex === part.caseIndex && m.path[2] === 'shelves' && m.path[3] === part.path[3]
	);
	const worst = k.reduce((a, b) => ((b.margin ?? -1e9) < (a.margin ?? -1e9) ? b : a), k[0]);
	return worst
		? { pass: k.every((m) => m.pass), words: marginWords(worst.margin, worst.pass).words }
		: null;
}

/** The drawing in words: each case's size, what was checked and whether it all passes. */
export function wallDescription(result: WallResult, format: (m: number) => string): string {
	return result.cases
		.map(
			(c) =>
				`${c.name}: ${format(c.widthM)} wide, ${format(c.heightM)} high, ${count(c.shelves.length, 'shelf', 'shelves')} checked, ${count(c.drawers.length, 'drawer')}, ${count(c.doors.length, 'door')}, ${c.pass ? 'every check passes' : 'something fails'}.`
		)
		.join(' ');
}
