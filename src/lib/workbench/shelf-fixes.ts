/**
 * What would make a failing shelf pass, from the engine's inverse solvers, as changes to the form
 * that one click applies: a shorter span, thicker stock, a solid nosing, a centre support. Each is
 * rounded in the safe direction on the user's grid and checked again before it is offered.
 */
import {
	safeAnalyzeShelf,
	safeMaxLoad,
	safeMaxSpan,
	safeMinEdge,
	safeMinThickness
} from '../compute';
import { METRES_PER_INCH, formatLength, tryParseLength } from '../engine/units/length';
import type { ShelfResult } from '../engine/shelf/types';
import type { ShelfRequest } from '../schemas/shelf';
import { ceilTo, floorTo, lengthText, unitStepM, type UserLengthUnit } from './lengths';
import { defaultDraft, toRequest, type ShelfDraft } from './shelf-draft';
import { withUnitMark } from '../components/quantity-input/reading';
import { aboutLength } from '../kinds/shelf-words';

export interface ShelfFix {
	id: 'span' | 'thickness' | 'nosing' | 'support';
	/** the button's words: "Shorten the span to 31 1/2"" */
	action: string;
	/** what it gives: "then it sags about 3/16"" */
	outcome: string;
	apply: (d: ShelfDraft) => ShelfDraft;
}

const NOSING_THICKNESS_IN = 3 / 4; // a common nosing thickness (common practice, no source)
const NOSING_STEP_IN = 1 / 4; // nosings are ripped to quarter inches (common practice, no source)

function metresOf(text: string, unit: UserLengthUnit): number | undefined {
	const read = tryParseLength(withUnitMark(text, unit));
	return read.ok && read.value > 0 ? read.value : undefined;
}

function passes(r: ShelfResult) {
	return r.limit.pass && r.strength.pass;
}

/** Apply a change, check it, and describe what the shelf then does; null when it still fails. */
function checked(
	draft: ShelfDraft,
	unit: UserLengthUnit,
	id: ShelfFix['id'],
	action: string,
	apply: (d: ShelfDraft) => ShelfDraft
): ShelfFix | null {
	const run = safeAnalyzeShelf(toRequest(apply(structuredClone(draft)), unit));
	if (!run.ok || !passes(run.result)) return null;
	const sag = run.result.sag[run.result.sag.checked];
	return { id, action, outcome: `then it sags ${aboutLength(sag, unit)}`, apply };
}

export function fixesFor(
	draft: ShelfDraft,
	request: ShelfRequest,
	unit: UserLengthUnit
): ShelfFix[] {
	const fixes: (ShelfFix | null)[] = [];
	const mm = unit === 'mm';
	const text = (m: number) => formatLength(m, { unit });

	const span = safeMaxSpan({ ...request, span: undefined });
	if (span.ok && draft.support === 'continuous') {
		// over dividers: every span shortened in proportion, each rounded down on the user's grid
		const spans = span.result.spans.map((m) => text(floorTo(m, unitStepM(unit))));
		if (span.result.spans.every((m) => m > 0.05))
			fixes.push(
				checked(draft, unit, 'span', `Shorten the spans to ${spans.join(', ')}`, (d) => ({
					...d,
					spans
				}))
			);
	} else if (span.ok && span.result.span > 0.05) {
		const total = floorTo(span.result.span, unitStepM(unit));
		fixes.push(
			checked(draft, unit, 'span', `Shorten the span to ${text(total)}`, (d) => ({
				...d,
				span: text(total)
			}))
		);
	}

	const thick = safeMinThickness({ ...request, thickness: undefined });
	if (thick.ok && thick.result.thickness !== null) {
		const t = thick.result.thickness;
		fixes.push(
			checked(draft, unit, 'thickness', `Use thicker stock: ${thick.result.label}`, (d) => ({
				...d,
				thickness: text(t)
			}))
		);
	}

	if (draft.support !== 'cantilever') {
		const stripThickness = mm ? 0.019 : NOSING_THICKNESS_IN * METRES_PER_INCH;
		const edge = safeMinEdge({
			...request,
			strip: { side: 'front', material: draft.front.material, thickness: stripThickness }
		});
		if (edge.ok && edge.result.needed && edge.result.height !== null) {
			const step = mm ? 0.005 : NOSING_STEP_IN * METRES_PER_INCH;
			const height = Math.max(ceilTo(edge.result.height, step), stripThickness);
			const size = `${text(stripThickness)} × ${text(height)}`;
			fixes.push(
				checked(draft, unit, 'nosing', `Glue a ${size} solid nosing to the front edge`, (d) => ({
					...d,
					front: { ...d.front, on: true, height: text(height), thickness: text(stripThickness) }
				}))
			);
		}
	}

	// a divider as thick as the one typed (or the shelf's default); the shelf keeps its length
	const dividerM = metresOf(draft.divider, unit) ?? metresOf(defaultDraft(unit).divider, unit)!;
	const dividerText = draft.divider.trim() || defaultDraft(unit).divider;
	const equalSpans = (clearTotalM: number, count: number) =>
		Array.from({ length: count }, () => lengthText(clearTotalM / count, unit));
	const spanM = metresOf(draft.span, unit);
	if ((draft.support === 'simple' || draft.support === 'fixed') && spanM && spanM > dividerM) {
		const spans = equalSpans(spanM - dividerM, 2);
		fixes.push(
			checked(
				draft,
				unit,
				'support',
				`Add a divider under the middle (two spans of ${spans[0]})`,
				(d) => ({ ...d, support: 'continuous', spans, divider: dividerText })
			)
		);
	} else if (draft.support === 'continuous' && draft.spans.length < 4) {
		const clear = draft.spans.map((s) => metresOf(s, unit));
		if (clear.every((m) => m !== undefined)) {
			const total = clear.reduce((a, b) => a! + b!, 0)! - dividerM;
			const spans = equalSpans(total, draft.spans.length + 1);
			fixes.push(
				checked(
					draft,
					unit,
					'support',
					`Add another divider (${spans.length} equal spans of ${spans[0]})`,
					(d) => ({ ...d, spans, divider: dividerText })
				)
			);
		}
	}
	return fixes.filter((f): f is ShelfFix => f !== null);
}

/** How far a passing shelf could go: the longest span, and the largest area load, within the limit. */
export function headroomFor(request: ShelfRequest, depthLoadOnly: boolean) {
	const span = safeMaxSpan({ ...request, span: undefined });
	const load = depthLoadOnly
		? safeMaxLoad({ ...request, loads: [], load: { kind: 'area' } })
		: null;
	const longest = span.ok && !span.result.capped ? span.result : null;
	return {
		maxSpanM: longest?.span ?? null,
		maxSpansM: longest && typeof request.support === 'object' ? longest.spans : null,
		maxPressurePa: load && load.ok ? load.result.magnitude : null,
		governs: load && load.ok ? load.result.governs : null
	};
}
