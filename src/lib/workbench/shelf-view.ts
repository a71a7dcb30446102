/**
 * What the drawing needs from the form and the engine's result: metres, support kind, loads
 * with their labels as typed, strips, the deflected curve and the limit of the governing span.
 */
import type { DrawingLoad, ShelfDrawingInput } from '../components/shelf-drawing/geometry';
import { withUnitMark } from '../components/quantity-input/reading';
import { tryParseLength } from '../engine/units/length';
import type { ShelfResult } from '../engine/shelf/types';
import type { UserLengthUnit } from './lengths';
import { count } from '../kinds/words';
import type { ShelfDraft } from './shelf-draft';

function metres(text: string, unit: UserLengthUnit, fallback: number): number {
	const read = tryParseLength(withUnitMark(text, unit));
	return read.ok && read.value > 0 ? read.value : fallback;
}

export function drawingFor(d: ShelfDraft, r: ShelfResult, unit: UserLengthUnit): ShelfDrawingInput {
	const span = r.span;
	const loads: DrawingLoad[] = [];
	const label = d.load.trim();
	if (label && d.loadKind === 'point')
		loads.push({ kind: 'point', atM: Math.min(span, metres(d.pointAt, unit, span / 2)), label });
	else if (label)
		loads.push({ kind: d.loadKind === 'line' ? 'line' : 'area', fromM: 0, toM: span, label });
	const strips = [
		...(d.front.on ? [{ side: 'front' as const, heightM: metres(d.front.height, unit, 0) }] : []),
		...(d.below.on ? [{ side: 'below' as const, heightM: metres(d.below.height, unit, 0) }] : [])
	];
	return {
		spanM: span,
		thicknessM: metres(d.thickness, unit, 0.019),
		support: d.support,
		supportsM: r.supports,
		...(d.support === 'continuous' ? { dividerM: metres(d.divider, unit, 0) } : {}),
		loads,
		strips,
		curve: r.curve,
		sagAtM: r.sag.at,
		sagM: r.sag[r.sag.checked],
		allowedM: r.limit.allowed
	};
}

/** One or two sentences for screen readers: what the drawing shows. */
export function drawingDescription(
	d: ShelfDraft,
	r: ShelfResult,
	unit: UserLengthUnit,
	format: (m: number) => string
) {
	const held = {
		simple: 'resting on pins between two case sides',
		fixed: 'with both ends fixed into the case sides',
		cantilever: 'cantilevered from a wall',
		continuous: overDividers(d, unit, format)
	}[d.support];
	const strips = [d.front.on && 'a solid nosing on the front edge', d.below.on && 'a cleat below']
		.filter(Boolean)
		.join(' and ');
	const shelf =
		d.support === 'cantilever'
			? `Side view of a shelf reaching ${format(r.span)} out from the wall, ${format(metres(d.depth, unit, 0))} wide along it and ${format(metres(d.thickness, unit, 0))} thick, ${held}`
			: `Front elevation of a ${format(r.span)} shelf, ${format(metres(d.thickness, unit, 0))} thick, ${held}`;
	return (
		shelf +
		`${strips ? `, with ${strips}` : ''}. ` +
		`It carries ${d.load || 'only its own weight'} and is drawn sagging ${format(r.sag[r.sag.checked])} ` +
		`at ${format(r.sag.at)} from the left end, against a limit of ${format(r.limit.allowed)}.`
	);
}

/** "running over 1 divider 3/4" thick, in spans of 24" and 30" clear" */
function overDividers(d: ShelfDraft, unit: UserLengthUnit, format: (m: number) => string) {
	const n = d.spans.length;
	const spans = d.spans.map((s) => format(metres(s, unit, 0)));
	const list = `${spans.slice(0, -1).join(', ')} and ${spans[n - 1]}`;
	const dividerM = metres(d.divider, unit, 0);
	const dividers = count(n - 1, 'divider');
	return dividerM > 0
		? `running over ${dividers} ${format(dividerM)} thick, in spans of ${list} clear`
		: `running over ${dividers}, in spans of ${list} from centre to centre`;
}
