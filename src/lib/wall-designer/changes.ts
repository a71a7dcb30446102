/**
 * A suggestion for the wall is a list of changes (a path into the wall and an SI value), applied
 * here to the form: lengths are written in the user's unit, rounded on their grid in the safe
 * direction (a width down, a thickness up), so the text on screen is the design that is checked.
 */
import type { DesignChange } from '../engine/case/types';
import { applyAtPaths, suggestedLengthText } from '../case-designer/changes';
import type { UserLengthUnit } from '../workbench/lengths';
import { LENGTH_KEYS, type WallDraft } from './draft';

function convert(key: string, value: unknown, unit: UserLengthUnit): unknown {
	if (key === 'nosing' && value && typeof value === 'object') {
		const n = value as { material: string; height: number; thickness: number };
		return {
			material: n.material,
			height: suggestedLengthText('height', n.height, unit),
			thickness: suggestedLengthText('thickness', n.thickness, unit)
		};
	}
	if (typeof value === 'number' && LENGTH_KEYS.has(key))
		return suggestedLengthText(key, value, unit);
	return structuredClone(value);
}

/** The draft with the changes applied (a new object). A path the wall does not hold is refused. */
export function applyWallChanges(
	draft: WallDraft,
	changes: DesignChange[],
	unit: UserLengthUnit
): WallDraft {
	return applyAtPaths(draft, changes, (key, value) => convert(key, value, unit), true);
}
