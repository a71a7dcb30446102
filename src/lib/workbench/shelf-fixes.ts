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
import { METRES_PER_INCH, formatLength } from '../engine/units/length';
import type { ShelfResult } from '../engine/shelf/types';
import type { ShelfRequest } from '../schemas/shelf';
import { ceilTo, floorTo, unitStepM, type UserLengthUnit } from './lengths';
import { toRequest, type ShelfDraft } from './shelf-draft';
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
	if (span.ok && span.result.span > 0.05) {
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

	if (draft.support === 'simple' || draft.support === 'fixed') {
		fixes.push(
			checked(draft, unit, 'support', 'Add a centre support (a divider under the middle)', (d) => ({
				...d,
				support: 'continuous',
				bays: 2
			}))
		);
	} else if (draft.support === 'continuous' && draft.bays < 4) {
		fixes.push(
			checked(
				draft,
				unit,
				'support',
				`Add another divider (${draft.bays + 1} equal spans)`,
				(d) => ({
					...d,
					bays: d.bays + 1
				})
			)
		);
	}
	return fixes.filter((f): f is ShelfFix => f !== null);
}

/** How far a passing shelf could go: the longest span, and the largest area load, within the limit. */
export function headroomFor(request: ShelfRequest, depthLoadOnly: boolean) {
	const span = safeMaxSpan({ ...request, span: undefined });
	const load = depthLoadOnly
		? safeMaxLoad({ ...request, loads: [], load: { kind: 'area' } })
		: null;
	return {
		maxSpanM: span.ok && !span.result.capped ? span.result.span : null,
		maxPressurePa: load && load.ok ? load.result.magnitude : null,
		governs: load && load.ok ? load.result.governs : null
	};
}
