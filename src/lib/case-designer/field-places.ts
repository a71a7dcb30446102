/**
 * Where each field of the case designer is on the screen (its control's id) and the words the
 * summary of marked fields names it by, from the field keys of check.ts (`shelves.2.thickness`).
 */
import type { CaseDraft } from './draft';

const PLACES: Record<string, [id: string, label: string]> = {
	width: ['case-width', 'Width'],
	height: ['case-height', 'Height'],
	depth: ['case-depth', 'Depth'],
	'sides.material': ['sides-material', 'Case material'],
	'sides.thickness': ['sides-thickness', 'Side thickness'],
	'top.thickness': ['top-thickness', 'Top thickness'],
	'top.joint': ['top-joint', 'Top joined by'],
	'top.material': ['top-material', 'Top material'],
	'bottom.thickness': ['bottom-thickness', 'Bottom thickness'],
	'bottom.joint': ['bottom-joint', 'Bottom joined by'],
	'bottom.material': ['bottom-material', 'Bottom material'],
	'back.material': ['back-material', 'Back material'],
	'back.thickness': ['back-thickness', 'Back thickness'],
	'faceFrame.material': ['frame-material', 'Face frame material'],
	'faceFrame.thickness': ['frame-thickness', 'Face frame thickness'],
	'faceFrame.stileWidth': ['frame-stile', 'Stile width'],
	'faceFrame.railWidth': ['frame-rail', 'Rail width'],
	'base.height': ['base-height', 'Base height'],
	'base.setback': ['base-setback', 'Base set back'],
	limit: ['case-limit', 'Sag limit']
};

const SHELF_FIELDS: Record<string, [suffix: string, words: string]> = {
	height: ['height', 'height'],
	thickness: ['thickness', 'thickness'],
	load: ['load', 'load'],
	joint: ['joint', 'joint'],
	material: ['material', 'material'],
	name: ['name', 'name'],
	'nosing.height': ['nosing-h', 'nosing height'],
	'nosing.thickness': ['nosing-t', 'nosing thickness'],
	'nosing.material': ['nosing-m', 'nosing material']
};

/** A marked field's place; a shelf's field not listed is found at that shelf's height. */
export function casePlace(key: string, draft: CaseDraft) {
	const shelf = /^shelves\.(\d+)(?:\.(.+))?$/.exec(key);
	if (shelf) {
		const i = Number(shelf[1]);
		const name = draft.shelves[i]?.name.trim() || `Shelf ${i + 1}`;
		const [suffix, words] = SHELF_FIELDS[shelf[2] ?? ''] ?? ['height', ''];
		return { id: `shelf-${i}-${suffix}`, label: words ? `${name}, ${words}` : name };
	}
	const place = PLACES[key];
	return place ? { id: place[0], label: place[1] } : undefined;
}

/** The summary's list: each marked field with a place, and its message. */
export function caseProblems(errors: Record<string, string>, draft: CaseDraft) {
	return Object.entries(errors).flatMap(([key, message]) => {
		const place = casePlace(key, draft);
		return place && message ? [{ ...place, message }] : [];
	});
}
