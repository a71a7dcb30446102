/**
 * The wall screen's form: the wall as the user types it (texts in their unit, choices), which
 * wallDesignSchema reads after bare numbers get the user's unit mark. A new wall starts from the
 * demo scenario written in the user's unit; a stored wall (SI numbers) comes back the same way.
 */
import { DEMO_WALL } from '../engine/wall/demo';
import type { WallDesignInput } from '../schemas/wall';
import { withLoadUnit, withUnitMark } from '../components/quantity-input/reading';
import { formatLength, tryParseLength } from '../engine/units/length';
import { lengthText, type UserLengthUnit } from '../workbench/lengths';

type WallCaseInput = WallDesignInput['cases'][number];
/**
 * A number field as the user types it: the number once it reads as one, the text until then (the
 * schema refuses the text and names the field).
 */
type Typed = number | string;
/** A case as typed: the schema's input, its floor's lean kept as typed. */
export type CaseDraft = Omit<WallCaseInput, 'floorTiltDeg'> & { floorTiltDeg?: Typed };
/** The wall as typed: the schema's input with every length a text, its number fields as typed. */
export type WallDraft = Omit<WallDesignInput, 'cases' | 'bandingWaste'> & {
	cases: CaseDraft[];
	bandingWaste?: Typed;
};
type LoadDraft = NonNullable<NonNullable<CaseDraft['shelves']>[number]['loads']>[number];

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

/** How a shelf, top, bottom or divider meets the case, in the trade's words. */
export const JOINTS = [
	['biscuit', 'biscuits'],
	['pocket-screw', 'pocket screws'],
	['screw', 'screws through the side'],
	['dado', 'a dado']
] as const;

const LBF_N = 4.4482216152605; // lbf in newtons (exact, from the pound and standard gravity)
const PSF_PA = 47.88025898033584; // lbf/ft² in pascals
const exactNumber = (x: number) => String(Number(x.toPrecision(15)));

/** A stored load (SI numbers) as text in the user's load units; texts stay as typed. */
function loadText(load: LoadDraft, unit: UserLengthUnit): LoadDraft {
	const metric = unit === 'mm';
	if (load.kind === 'area' && typeof load.pressure === 'number') {
		const pa = load.pressure;
		const pressure = metric
			? `${exactNumber(pa / 1000)} kPa`
			: `${exactNumber(pa / PSF_PA)} lbf/ft^2`;
		return { ...load, pressure };
	}
	if (load.kind === 'line' && typeof load.intensity === 'number') {
		const nPerM = load.intensity;
		const intensity = metric
			? `${exactNumber(nPerM)} N/m`
			: `${exactNumber(nPerM / (LBF_N / 0.3048))} lbf/ft`;
		return { ...load, intensity };
	}
	if (load.kind === 'point' && typeof load.force === 'number')
		return { ...load, force: forceText(load.force, unit) };
	return load;
}

/** A weight in newtons as text in the user's units. */
function forceText(n: number, unit: UserLengthUnit): string {
	return unit === 'mm' ? `${exactNumber(n)} N` : `${exactNumber(n / LBF_N)} lbf`;
}

/** The load a shelf's single field shows: its first spread load, as typed. */
export function shelfLoadText(s: NonNullable<CaseDraft['shelves']>[number]): string {
	const first = s.loads?.[0] as { kind?: string; pressure?: unknown } | undefined;
	return first && first.kind === 'area' ? String(first.pressure ?? '') : '';
}

/** A face frame as the trade makes one: 3/4" poplar, 1 1/2" stiles and rails, pocket screws. */
export function newFaceFrame(unit: UserLengthUnit) {
	return {
		material: 'yellow-poplar',
		thickness: T(0.75, unit),
		stileWidth: T(1.5, unit),
		railWidth: T(1.5, unit),
		joint: 'pocket-screw' as const,
		attach: 'biscuit' as const
	};
}

/** A 3/4" × 1 1/2" poplar nosing. */
export function newNosing(unit: UserLengthUnit) {
	return { material: 'yellow-poplar', height: T(1.5, unit), thickness: T(0.75, unit) };
}

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
		for (const sh of c.shelves ?? [])
			if (Array.isArray(sh.loads)) sh.loads = sh.loads.map((l) => loadText(l, unit));
		for (const o of c.drawers ?? [])
			if (typeof o.contentsWeight === 'number')
				o.contentsWeight = forceText(o.contentsWeight, unit);
		c.top ??= { joint: 'biscuit', loads: [] };
		c.bottom ??= { joint: 'biscuit', loads: [] };
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
		front: {
			material: 'mdo',
			thickness: T(23 / 32, unit),
			mount: 'overlay' as const,
			overlay: T(0.375, unit),
			gap: T(0.125, unit)
		}
	};
}

/**
 * What the schema reads: a bare number typed in a length field is in the user's unit, in a load or
 * a weight in the user's load units (never SI).
 */
export function toInput(draft: WallDraft, unit: UserLengthUnit): WallDraft {
	const input = mapLengths(draft, '', (v) =>
		typeof v === 'string' ? withUnitMark(v, unit) : v
	) as WallDraft;
	const bare = <V>(v: V, kind: 'pressure' | 'lineLoad' | 'force') =>
		typeof v === 'string' ? withLoadUnit(v, kind, unit) : v;
	const loadInput = (l: LoadDraft): LoadDraft =>
		l.kind === 'area'
			? { ...l, pressure: bare(l.pressure, 'pressure') }
			: l.kind === 'line'
				? { ...l, intensity: bare(l.intensity, 'lineLoad') }
				: { ...l, force: bare(l.force, 'force') };
	for (const c of input.cases) {
		for (const sh of c.shelves ?? []) sh.loads = sh.loads?.map(loadInput);
		for (const o of c.drawers ?? []) o.contentsWeight = bare(o.contentsWeight, 'force');
	}
	return input;
}

/**
 * The demo wall (two tall bookcases, two low units with two drawers each) in the user's unit. Its
 * shelves carry the shelf screen's default load: 40 lbf/ft², or 2 kPa to a metric user (the same
 * figure rounded up, as the load presets write it; src/lib/workbench/load-presets.ts).
 */
export function defaultWall(unit: UserLengthUnit): WallDraft {
	const draft = fromDesign(structuredClone(DEMO_WALL), unit);
	for (const c of draft.cases)
		for (const s of c.shelves ?? [])
			s.loads = [{ kind: 'area', pressure: unit === 'mm' ? '2 kPa' : '40 lbf/ft^2' }];
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
