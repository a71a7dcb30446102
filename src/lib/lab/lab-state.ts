/**
 * The teaching lab's shelf: a handful of values a slider can move, stored in SI, turned into an
 * engine request and run through the same engine as the shelf check. Time under load is read
 * between the engine's instant and long-term sag (engine/creep-time.ts).
 */
import {
	METRES_PER_INCH,
	NEWTONS_PER_LBF,
	NEWTONS_PER_METRE_PER_PLF,
	DEFAULT_SHELF_OPTIONS,
	STANDARD_GRAVITY,
	analyzeInput,
	formatLength,
	formatNumber,
	materials,
	sagAfter,
	type ShelfInput,
	type ShelfResult
} from '../engine/index';

export type LabSupport = 'pins' | 'fixed' | 'divider' | 'wall';
export type LabLoadKind = 'books' | 'point';
export type LabUnits = 'imperial' | 'metric';

export interface LabState {
	/** length of the shelf (the reach of a wall-hung one), m */
	spanM: number;
	thicknessM: number;
	depthM: number;
	/** a library material id */
	material: string;
	loadKind: LabLoadKind;
	/** books along the whole shelf, N/m */
	booksNPerM: number;
	/** one weight, N, at this share of the length from the left end (0–1) */
	pointN: number;
	pointAt: number;
	support: LabSupport;
	/** days the load has stayed on (0: the moment it goes on) */
	days: number;
	/** height of a solid nosing glued to the front edge, of the shelf's material, 3/4" thick; 0: none */
	nosingM: number;
}

/** the nosing the lab offers: 1 1/2" tall, 3/4" thick (common practice, no source) */
export const NOSING = { heightM: 1.5 * METRES_PER_INCH, thicknessM: 0.75 * METRES_PER_INCH };

/** A bookcase shelf of our own choosing: 3/4" red oak, 36" between pins, books at 20 lb/ft. */
export const START: LabState = {
	spanM: 36 * METRES_PER_INCH,
	thicknessM: 0.75 * METRES_PER_INCH,
	depthM: 11 * METRES_PER_INCH,
	material: 'red-oak',
	loadKind: 'books',
	booksNPerM: 20 * NEWTONS_PER_METRE_PER_PLF,
	pointN: 50 * NEWTONS_PER_LBF,
	pointAt: 0.5,
	support: 'pins',
	days: 365,
	nosingM: 0
};

export const SUPPORTS: { id: LabSupport; label: string }[] = [
	{ id: 'pins', label: 'On pins at both ends' },
	{ id: 'fixed', label: 'Both ends fixed in dadoes' },
	{ id: 'divider', label: 'Over a divider in the middle' },
	{ id: 'wall', label: 'Hung from a wall (one end)' }
];

/** Times under load a slider steps through, in days. */
export const TIME_STOPS: { days: number; label: string }[] = [
	{ days: 0, label: 'the moment it is loaded' },
	{ days: 1 / 24, label: 'one hour' },
	{ days: 1, label: 'one day' },
	{ days: 7, label: 'one week' },
	{ days: 30, label: 'one month' },
	{ days: 91, label: 'three months' },
	{ days: 182, label: 'six months' },
	{ days: 365, label: 'one year' }
];

export type NumericKey = 'spanM' | 'thicknessM' | 'depthM' | 'booksNPerM' | 'pointN' | 'days';

/** One slider: its range and step in the reader's unit, and the exact conversion to SI. */
export interface SliderSpec {
	key: NumericKey;
	label: string;
	min: number;
	max: number;
	step: number;
	/** the unit written after the number */
	unit: string;
	toSI: (value: number) => number;
	fromSI: (si: number) => number;
	/** what a screen reader hears and the label shows */
	text: (si: number) => string;
}

const lengthText = (units: LabUnits) => (m: number) =>
	formatLength(m, { unit: units === 'metric' ? 'mm' : 'frac16' });

function length(
	key: NumericKey,
	label: string,
	units: LabUnits,
	inches: [number, number, number],
	mm: [number, number, number]
): SliderSpec {
	const metric = units === 'metric';
	const [min, max, step] = metric ? mm : inches;
	const factor = metric ? 0.001 : METRES_PER_INCH;
	return {
		key,
		label,
		min,
		max,
		step,
		unit: metric ? 'mm' : 'in',
		toSI: (v) => v * factor,
		fromSI: (m) => m / factor,
		text: lengthText(units)
	};
}

export function sliders(units: LabUnits): Record<Exclude<NumericKey, 'days'>, SliderSpec> {
	const metric = units === 'metric';
	const kgf = STANDARD_GRAVITY;
	return {
		spanM: length('spanM', 'Span', units, [12, 72, 0.5], [300, 1800, 10]),
		thicknessM: length('thicknessM', 'Thickness', units, [0.25, 2, 1 / 16], [6, 50, 1]),
		depthM: length('depthM', 'Depth', units, [4, 24, 0.5], [100, 600, 10]),
		booksNPerM: {
			key: 'booksNPerM',
			label: 'Books per length',
			...(metric ? { min: 0, max: 90, step: 1 } : { min: 0, max: 60, step: 1 }),
			unit: metric ? 'kg/m' : 'lb/ft',
			toSI: (v) => (metric ? v * kgf : v * NEWTONS_PER_METRE_PER_PLF),
			fromSI: (n) => (metric ? n / kgf : n / NEWTONS_PER_METRE_PER_PLF),
			text: (n) =>
				metric
					? `${formatNumber(n / kgf)} kg per metre`
					: `${formatNumber(n / NEWTONS_PER_METRE_PER_PLF)} lb per foot`
		},
		pointN: {
			key: 'pointN',
			label: 'One weight',
			...(metric ? { min: 0, max: 90, step: 1 } : { min: 0, max: 200, step: 5 }),
			unit: metric ? 'kg' : 'lb',
			toSI: (v) => (metric ? v * kgf : v * NEWTONS_PER_LBF),
			fromSI: (n) => (metric ? n / kgf : n / NEWTONS_PER_LBF),
			text: (n) =>
				metric ? `${formatNumber(n / kgf)} kg` : `${formatNumber(n / NEWTONS_PER_LBF)} lb`
		}
	};
}

/** The slider's position for a stored value, on the slider's own grid. */
export function positionOf(spec: SliderSpec, si: number): number {
	const v = spec.fromSI(si);
	const snapped = spec.min + Math.round((v - spec.min) / spec.step) * spec.step;
	return Math.min(spec.max, Math.max(spec.min, Number(snapped.toFixed(6))));
}

export function timeIndex(days: number): number {
	let best = 0;
	TIME_STOPS.forEach((s, i) => {
		if (Math.abs(s.days - days) < Math.abs(TIME_STOPS[best].days - days)) best = i;
	});
	return best;
}

export function timeText(days: number): string {
	const stop = TIME_STOPS.find((s) => Math.abs(s.days - days) < 1e-9);
	return stop ? stop.label : `${formatNumber(days)} days`;
}

/** "when loaded", "after one week" */
export function whenText(days: number): string {
	return days > 0 ? `after ${timeText(days)}` : 'when loaded';
}

export function shortName(materialId: string): string {
	const m = materials.find((x) => x.id === materialId);
	if (!m) return materialId;
	return m.name.replace(/\s*\(.*?\)/g, '').replace(/,.*$/, '');
}

export function labRequest(s: LabState, extra: Partial<ShelfInput> = {}): ShelfInput {
	const support: ShelfInput['support'] =
		s.support === 'pins'
			? 'simple'
			: s.support === 'fixed'
				? 'fixed'
				: s.support === 'wall'
					? 'cantilever'
					: { spans: [s.spanM / 2, s.spanM / 2], ends: 'simple' };
	const loads: ShelfInput['loads'] =
		s.loadKind === 'books'
			? s.booksNPerM > 0
				? [{ kind: 'line', intensity: s.booksNPerM }]
				: []
			: s.pointN > 0
				? [{ kind: 'point', force: s.pointN, at: s.pointAt * s.spanM }]
				: [];
	return {
		span: s.spanM,
		depth: s.depthM,
		thickness: s.thicknessM,
		material: s.material,
		support,
		loads,
		edges:
			s.nosingM > 0
				? [{ side: 'front', material: s.material, height: s.nosingM, thickness: NOSING.thicknessM }]
				: [],
		grain: 'along',
		selfWeight: true,
		duration: 'long',
		service: 'dry',
		limit: 'L/144',
		options: DEFAULT_SHELF_OPTIONS,
		...extra
	};
}

export interface LabRun {
	result: ShelfResult;
	/** largest sag after the state's time under load, m */
	sagM: number;
	/** the deflected shape after that time [x, sag], m */
	curve: [number, number][];
}

/**
 * Run the engine on the lab's shelf. The shape after a given time is the long-term shape scaled to
 * the sag at that time (exact for one material throughout, as every lab shelf is).
 */
export function runLab(s: LabState, extra: Partial<ShelfInput> = {}): LabRun {
	const result = analyzeInput(labRequest(s, extra));
	const sagM = sagAfter(result.sag.instant, result.sag.longTerm, s.days);
	const scale = result.sag.longTerm > 0 ? sagM / result.sag.longTerm : 0;
	const curve = result.curve.map(([x, y]) => [x, y * scale] as [number, number]);
	return { result, sagM, curve };
}

/** Sag only, with the law's idealisation: no self-weight and no shear (bending alone). */
export function bendingSag(s: LabState): number {
	return runLab(s, {
		selfWeight: false,
		options: { shearDeflection: false, safetyFactor: 3, curvePoints: 101 }
	}).sagM;
}
