/**
 * Where a new shelf goes: halfway up the largest clear opening of the case, on the user's grid.
 * Texts that cannot be read yet are left out (the form marks them).
 */
import { withUnitMark } from '../components/quantity-input/reading';
import { tryParseLength } from '../engine/units/length';
import { floorTo, lengthText, unitStepM, type UserLengthUnit } from '../workbench/lengths';
import type { CaseDraft } from './draft';

function read(text: string, unit: UserLengthUnit): number | null {
	if (text.trim() === '') return null;
	const r = tryParseLength(withUnitMark(text, unit));
	return r.ok ? r.value : null;
}

export function nextShelfHeight(d: CaseDraft, unit: UserLengthUnit): string {
	const height = read(d.height, unit) ?? 0;
	const side = read(d.sides.thickness, unit) ?? 0;
	const base = d.base.on ? (read(d.base.height, unit) ?? 0) : 0;
	const bottomTop = base + (read(d.bottom.thickness, unit) ?? side);
	const topUnder = height - (read(d.top.thickness, unit) ?? side);
	const shelves = d.shelves
		.map((s) => ({ top: read(s.height, unit), t: read(s.thickness, unit) ?? side }))
		.filter((s): s is { top: number; t: number } => s.top !== null)
		.map((s) => ({ top: s.top, under: s.top - s.t }));
	const surfaces = [
		{ top: bottomTop, under: base },
		...shelves,
		{ top: height, under: topUnder }
	].sort((a, b) => a.top - b.top);
	let best = { from: bottomTop, clear: -Infinity };
	for (let i = 0; i + 1 < surfaces.length; i++) {
		const clear = surfaces[i + 1].under - surfaces[i].top;
		if (clear > best.clear) best = { from: surfaces[i].top, clear };
	}
	// the new shelf's top face sits half its thickness above the middle of the opening
	const top = best.from + best.clear / 2 + side / 2;
	return lengthText(floorTo(top, unitStepM(unit)), unit);
}
