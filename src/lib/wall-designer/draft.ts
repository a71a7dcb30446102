/**
 * The wall screen's form: the wall as the user types it (texts in their unit, choices), which
 * wallDesignSchema reads after bare numbers get the user's unit mark. A new wall starts from the
 * demo scenario written in the user's unit; a stored wall (SI numbers) comes back the same way.
 */
import { DEMO_WALL } from '../engine/wall/demo';
import type { WallDesignInput } from '../schemas/wall';
import { withUnitMark } from '../components/quantity-input/reading';
import { formatLength, tryParseLength } from '../engine/units/length';
import { lengthText, type UserLengthUnit } from '../workbench/lengths';

/** The wall as typed: the schema's input with every length a text. */
export type WallDraft = WallDesignInput;
export type CaseDraft = WallDraft['cases'][number];

/** Keys whose values are lengths (a number there is metres in a stored design). */
export const LENGTH_KEYS = new Set([
	'width',
	'height',
	'depth',
	'thickness',
	'at',
	'bottom',
	'top',
	'heights',
	'grooveDepth',
	'heightClearance',
	'sideClearance',
	'length',
	'overlay',
	'gap',
	'setback',
	'roughAllowance',
	'kerf',
	'trim',
	'stileWidth',
	'railWidth',
	'itemHeight'
]);
/** Objects under these keys hold a material's figures or loads, not lengths. */
const OPAQUE = new Set(['material', 'loads']);

function mapLengths(value: unknown, key: string, f: (x: unknown) => unknown): unknown {
	if (OPAQUE.has(key)) return value;
	if (Array.isArray(value))
		return key === 'heights' ? value.map(f) : value.map((v) => mapLengths(v, '', f));
	if (value && typeof value === 'object')
		return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, mapLengths(v, k, f)]));
	return LENGTH_KEYS.has(key) ? f(value) : value;
}

/** A length written exactly where the user's unit can (23/32" stays 23/32", not 3/4"). */
export function exactText(metres: number, unit: UserLengthUnit): string {
	if (unit === 'mm') {
		const mm = metres * 1000;
		return Math.abs(mm - Math.round(mm)) < 1e-9
			? `${Math.round(mm)} mm`
			: `${Number(mm.toFixed(6))} mm`;
	}
	for (const u of ['frac16', 'frac32', 'frac64'] as const) {
		const text = formatLength(metres, { unit: u });
		const back = tryParseLength(text);
		if (back.ok && Math.abs(back.value - metres) < 1e-9) return text;
	}
	return `${Number((metres / 0.0254).toFixed(6))}"`;
}

/** A stored wall (SI numbers) as texts in the reader's unit, every list and the base present. */
export function fromDesign(design: unknown, unit: UserLengthUnit): WallDraft {
	const draft = mapLengths(design, '', (v) =>
		typeof v === 'number' ? exactText(v, unit) : v
	) as WallDraft;
	for (const c of draft.cases) {
		c.shelves ??= [];
		c.dividers ??= [];
		c.drawers ??= [];
		c.doors ??= [];
		c.base ??= { height: lengthText(0, unit) };
	}
	draft.sheets ??= { kerf: lengthText(IN / 8, unit), trim: lengthText(IN / 4, unit), stocks: [] };
	return draft;
}

const IN = 0.0254;
const T = (inches: number, unit: UserLengthUnit) => lengthText(inches * IN, unit);

/** A divider in the middle of the case, when its width can be read. */
export function dividerAt(c: CaseDraft, unit: UserLengthUnit): string {
	const w = tryParseLength(withUnitMark(String(c.width), unit));
	return w.ok ? lengthText(w.value / 2, unit) : '';
}

/** Two drawers, as in the demo: 1/2" birch boxes on 14" full-extension slides, MDO fronts. */
export function newDrawers(unit: UserLengthUnit): NonNullable<CaseDraft['drawers']>[number] {
	return fromDesign(
		{ cases: [{ drawers: [structuredClone(DEMO_WALL.cases[1].drawers[0])] }] },
		unit
	).cases[0].drawers![0];
}

/** One door over most of the case, as typed. */
export function newDoor(unit: UserLengthUnit) {
	return {
		bottom: T(4.25, unit),
		height: T(24, unit),
		count: 1 as const,
		hinge: 'left' as const,
		front: { material: 'mdo', thickness: T(23 / 32, unit) }
	};
}

/** The schema's input: a bare number typed in a length field is in the user's unit. */
export function toInput(draft: WallDraft, unit: UserLengthUnit): WallDesignInput {
	return mapLengths(draft, '', (v) =>
		typeof v === 'string' ? withUnitMark(v, unit) : v
	) as WallDesignInput;
}

/** The demo wall (two tall bookcases, two low units with two drawers each) in the user's unit. */
export function defaultWall(unit: UserLengthUnit): WallDraft {
	const draft = fromDesign(structuredClone(DEMO_WALL), unit);
	for (const c of draft.cases)
		for (const s of c.shelves ?? [])
			s.loads = [{ kind: 'area', pressure: unit === 'mm' ? '1.915 kPa' : '40 lbf/ft^2' }];
	return draft;
}

/** A copy of case i, placed right after it. */
export function copyCase(draft: WallDraft, i: number): WallDraft {
	const next = structuredClone(draft);
	const copy = structuredClone(next.cases[i]);
	copy.name = `${copy.name ?? `case ${i + 1}`} (copy)`;
	next.cases.splice(i + 1, 0, copy);
	return next;
}
