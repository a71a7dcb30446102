/**
 * A suggestion of the case engine is a list of changes (a path into the design and an SI value).
 * Applied here to the form: lengths are written in the user's unit, rounded on their grid in the
 * safe direction (a case width down, a thickness or nosing up) so the text they see is the design
 * that is checked and saved.
 */
import type { DesignChange } from '../engine/case/types';
import { ceilTo, floorTo, lengthText, unitStepM, type UserLengthUnit } from '../workbench/lengths';
import type { AnchorChoice, CaseDraft } from './draft';

const LENGTH_KEYS = new Set([
	'width',
	'height',
	'depth',
	'thickness',
	'stileWidth',
	'railWidth',
	'setback'
]);

/** Round a suggested length on the user's grid: shorter for a width, longer for everything else. */
export function suggestedLengthText(key: string, metres: number, unit: UserLengthUnit): string {
	const step = unitStepM(unit);
	const m = key === 'width' ? floorTo(metres, step) : ceilTo(metres, step);
	return lengthText(m, unit);
}

function convert(key: string, value: unknown, unit: UserLengthUnit): unknown {
	if (key === 'nosing' && value && typeof value === 'object') {
		const n = value as { material: string; height: number; thickness: number };
		return {
			on: true,
			material: n.material,
			height: suggestedLengthText('height', n.height, unit),
			thickness: suggestedLengthText('thickness', n.thickness, unit)
		};
	}
	if (key === 'anchoring' && value && typeof value === 'object') {
		const a = value as { kind: AnchorChoice; intoStuds?: boolean };
		return { kind: a.kind, intoStuds: a.intoStuds === true };
	}
	if (typeof value === 'number' && LENGTH_KEYS.has(key))
		return suggestedLengthText(key, value, unit);
	return value;
}

const isRecord = (v: unknown): v is Record<string | number, unknown> =>
	typeof v === 'object' && v !== null;

/**
 * A copy of a draft (case or wall) with each change's value, converted for the form, written at
 * its path. A path through something the draft does not hold is refused with an error rather
 * than silently dropped; so is a new last key unless `newKeys` allows it.
 */
export function applyAtPaths<T extends object>(
	draft: T,
	changes: DesignChange[],
	convert: (key: string, value: unknown) => unknown,
	newKeys = false
): T {
	const next = structuredClone(draft);
	for (const { path, value } of changes) {
		let at: unknown = next;
		for (const step of path.slice(0, -1)) at = isRecord(at) ? at[step] : undefined;
		const key = path[path.length - 1];
		if (!isRecord(at) || (!newKeys && !(key in at)))
			throw new Error(`No field at ${path.join('.')}`);
		at[key] = convert(String(key), value);
	}
	return next;
}

/**
 * The draft with the changes applied (a new object; the old one is untouched). A change whose
 * path the form does not hold is refused with an error rather than silently dropped.
 */
export function applyChanges(
	draft: CaseDraft,
	changes: DesignChange[],
	unit: UserLengthUnit
): CaseDraft {
	return applyAtPaths(draft, changes, (key, value) => convert(key, value, unit));
}
