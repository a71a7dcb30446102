/**
 * Changing how the load lies (spread over the shelf, along it, at one place) carries the value over
 * as the same total load in the new kind's unit, so "40 lbf/ft²" never stands in a field that now
 * wants pounds; when the load or the shelf's size cannot be read, the field is cleared with a hint.
 */
import { withUnitMark } from '../components/quantity-input/reading';
import { formatLength, parseLength } from '../engine/units/length';
import {
	formatForce,
	formatLineLoad,
	formatPressure,
	tryParseQuantity,
	type QuantityKind
} from '../engine/units/quantity';
import { loadUnitsFor, type UserLengthUnit } from './lengths';
import type { LoadKind, ShelfDraft } from './shelf-draft';

const QUANTITY: Record<LoadKind, QuantityKind> = {
	area: 'pressure',
	line: 'lineLoad',
	point: 'force'
};

function lengthOf(text: string, unit: UserLengthUnit): number | null {
	try {
		const m = parseLength(withUnitMark(text, unit));
		return m > 0 ? m : null;
	} catch {
		return null;
	}
}

/** The value in the new kind's unit, and what the screen says under the field about it. */
export function switchLoadKind(
	d: ShelfDraft,
	kind: LoadKind,
	unit: UserLengthUnit
): { load: string; hint: string } {
	const units = loadUnitsFor(unit);
	const write: Record<LoadKind, (v: number) => string> = {
		// six figures: a carried value is not rounded into something the user did not mean
		area: (v) => formatPressure(v, { unit: units.pressure, digits: 6 }),
		line: (v) => formatLineLoad(v, { unit: units.lineLoad, digits: 6 }),
		point: (v) => formatForce(v, { unit: units.force, digits: 6 })
	};
	const wanted = { area: units.pressure, line: units.lineLoad, point: units.force }[kind];
	const cleared = { load: '', hint: `Enter the load in ${wanted}.` };
	if (kind === d.loadKind || d.load.trim() === '') return { load: d.load, hint: '' };
	const read = tryParseQuantity(d.load, QUANTITY[d.loadKind]);
	const span = lengthOf(d.span, unit);
	const depth = lengthOf(d.depth, unit);
	if (!read.ok || span === null || depth === null) return cleared;
	// the whole load on the shelf, in newtons: spread over span × depth, or along the span
	const total =
		d.loadKind === 'area'
			? read.value * span * depth
			: d.loadKind === 'line'
				? read.value * span
				: read.value;
	const value = kind === 'area' ? total / (span * depth) : kind === 'line' ? total / span : total;
	const load = write[kind](value);
	const L = (m: number) => formatLength(m, { unit });
	const size = d.loadKind === 'area' || kind === 'area' ? `${L(span)} × ${L(depth)}` : L(span);
	return {
		load,
		hint: `Carried over as the same total load: ${d.load.trim()} on ${size} is ${load}. Check it.`
	};
}
