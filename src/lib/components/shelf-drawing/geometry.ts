/**
 * The measured elevation of a shelf, as plain numbers for an SVG: where the supports stand, the
 * bands of the panel and its strips before and after loading, the load arrows, the dimension lines
 * and the exaggeration of the sag. Lengths in, pixels out; no framework, so it can be tested.
 */

export type SupportKind = 'simple' | 'fixed' | 'cantilever' | 'continuous';

export type DrawingLoad =
	| { kind: 'area' | 'line'; fromM: number; toM: number; label: string }
	| { kind: 'point'; atM: number; label: string };

export interface DrawingStrip {
	side: 'front' | 'back' | 'below';
	heightM: number;
}

export interface ShelfDrawingInput {
	spanM: number;
	thicknessM: number;
	support: SupportKind;
	/** support positions from the left end, m (a cantilever: the wall at 0; dividers at their centre) */
	supportsM: number[];
	/** thickness of each divider, m, drawn to scale; 0 or absent: supports at a point */
	dividerM?: number;
	loads: DrawingLoad[];
	strips: DrawingStrip[];
	/** deflected shape [x, sag] in m, sag downward positive; null while the inputs are unreadable */
	curve: [number, number][] | null;
	sagAtM: number | null;
	sagM: number | null;
	allowedM: number | null;
}

export interface Band {
	side: 'panel' | DrawingStrip['side'];
	/** closed path of the loaded (exaggerated) band */
	loaded: string;
	/** the band as built, before loading */
	built: { x: number; y: number; width: number; height: number };
}

export const LAYOUT = {
	left: 22,
	right: 84,
	side: 16,
	shelfTop: 84,
	/** the drawn sag (or limit, whichever is larger) aims at this many pixels */
	targetSagPx: 56,
	minPanelPx: 5,
	/** a divider thinner than this on screen is drawn this wide, so it can be seen */
	minDividerPx: 2
} as const;

const NICE = [1, 2, 5];

/** The largest factor of the 1-2-5 series at most `raw`; never below 1 (no shrinking). */
export function exaggerationFor(raw: number): number {
	if (!Number.isFinite(raw) || raw <= 1) return 1;
	const decade = 10 ** Math.floor(Math.log10(raw));
	let best = decade;
	for (const n of NICE) if (n * decade <= raw * (1 + 1e-9)) best = n * decade;
	return best;
}

/** Sag of the curve at x, interpolated between its points (0 outside the curve). */
export function sagAt(curve: [number, number][] | null, xM: number): number {
	if (!curve || curve.length === 0) return 0;
	if (xM <= curve[0][0]) return curve[0][1];
	for (let i = 1; i < curve.length; i++) {
		const [x1, y1] = curve[i];
		if (xM <= x1) {
			const [x0, y0] = curve[i - 1];
			return x1 === x0 ? y1 : y0 + ((y1 - y0) * (xM - x0)) / (x1 - x0);
		}
	}
	return curve[curve.length - 1][1];
}

const r = (n: number) => Math.round(n * 10) / 10;

/** Closed path of a band whose top is `topPx` below the shelf top line, bent along the curve. */
export function bandPath(
	curve: [number, number][],
	x: (m: number) => number,
	yOf: (sagM: number) => number,
	topPx: number,
	heightPx: number
): string {
	const top = curve.map(([m, s]) => `${r(x(m))},${r(yOf(s) + topPx)}`);
	const bottom = curve.map(([m, s]) => `${r(x(m))},${r(yOf(s) + topPx + heightPx)}`).reverse();
	return `M${top.join('L')}L${bottom.join('L')}Z`;
}

export function layoutShelf(input: ShelfDrawingInput, widthPx: number) {
	const width = Math.max(300, widthPx);
	const cantilever = input.support === 'cantilever';
	const x0 = LAYOUT.left + LAYOUT.side;
	const x1 = width - LAYOUT.right - (cantilever ? 0 : LAYOUT.side);
	const span = input.spanM > 0 ? input.spanM : 1;
	const scale = (x1 - x0) / span;
	const x = (m: number) => x0 + m * scale;

	const panelPx = Math.max(LAYOUT.minPanelPx, input.thicknessM * scale);
	const stripPx = (side: DrawingStrip['side']) => {
		const s = input.strips.find((e) => e.side === side);
		return s ? Math.max(3, s.heightM * scale) : 0;
	};
	const belowPx = stripPx('below');
	const facePx = Math.max(panelPx, stripPx('front')) + belowPx;

	const biggest = Math.max(input.sagM ?? 0, input.allowedM ?? 0);
	const exaggeration = biggest > 0 ? exaggerationFor(LAYOUT.targetSagPx / (biggest * scale)) : 1;
	const top = LAYOUT.shelfTop;
	const yOf = (sagM: number) => top + sagM * scale * exaggeration;
	const curve = input.curve ?? [
		[0, 0],
		[span, 0]
	];

	const bands: Band[] = [];
	const addBand = (side: Band['side'], topPx: number, heightPx: number) =>
		heightPx > 0 &&
		bands.push({
			side,
			loaded: bandPath(curve, x, yOf, topPx, heightPx),
			built: { x: r(x0), y: r(top + topPx), width: r(x1 - x0), height: r(heightPx) }
		});
	addBand('back', 0, stripPx('back'));
	addBand('panel', 0, panelPx);
	addBand('below', panelPx, belowPx);
	addBand('front', 0, stripPx('front'));

	const deepestPx =
		Math.max(...curve.map(([, s]) => s), input.allowedM ?? 0) * scale * exaggeration;
	const floor = top + facePx + deepestPx + 30;
	const dimY = floor + 22;
	// room under the dimensions for the divider's thickness
	const height = dimY + (input.dividerM ? 30 : 22);

	const arrows: { x: number; tip: number; tail: number; heavy: boolean }[] = [];
	const loadLabels: { x: number; y: number; text: string }[] = [];
	const blankets: { x1: number; x2: number; y: number }[] = [];
	const tail = top - 30;
	input.loads.forEach((load, i) => {
		const labelY = tail - 8 - i * 16;
		if (load.kind === 'point') {
			const px = x(load.atM);
			arrows.push({
				x: r(px),
				tip: r(yOf(sagAt(curve, load.atM)) - 2),
				tail: tail - 12,
				heavy: true
			});
			loadLabels.push({ x: r(px), y: labelY - 12, text: load.label });
			return;
		}
		const from = x(Math.max(0, load.fromM));
		const to = x(Math.min(span, load.toM));
		const count = Math.max(2, Math.round((to - from) / 26) + 1);
		for (let k = 0; k < count; k++) {
			const px = from + ((to - from) * k) / (count - 1);
			const m = (px - x0) / scale;
			arrows.push({ x: r(px), tip: r(yOf(sagAt(curve, m)) - 2), tail, heavy: false });
		}
		loadLabels.push({ x: r((from + to) / 2), y: labelY, text: load.label });
		blankets.push({ x1: r(from), x2: r(to), y: tail });
	});

	// dividers to scale (a hairline at least); the spans measured clear between their faces
	const halfM = (input.dividerM ?? 0) / 2;
	const dividerPx = Math.max(LAYOUT.minDividerPx, 2 * halfM * scale);
	const last = input.supportsM.length - 1;
	const supports = input.supportsM.map((m, i) => {
		const px = x(m);
		const end = i === 0 || i === last;
		if (cantilever) return { kind: 'wall' as const, x: r(px - LAYOUT.side), width: LAYOUT.side };
		if (!end) return { kind: 'divider' as const, x: r(px - dividerPx / 2), width: r(dividerPx) };
		return { kind: 'side' as const, x: r(i === 0 ? px - LAYOUT.side : px), width: LAYOUT.side };
	});
	const spans = input.supportsM.slice(1).map((m, i) => {
		const fromM = input.supportsM[i] + (i > 0 ? halfM : 0);
		const toM = m - (i + 1 < last ? halfM : 0);
		return { from: r(x(fromM)), to: r(x(toM)), lengthM: toM - fromM };
	});
	if (cantilever) spans.push({ from: r(x0), to: r(x1), lengthM: span });

	const sag =
		input.sagAtM !== null && input.sagM !== null
			? {
					x: r(x(input.sagAtM)),
					built: r(top + facePx),
					loaded: r(yOf(input.sagM) + facePx)
				}
			: null;
	const limit =
		sag && input.allowedM !== null ? { y: r(yOf(input.allowedM) + facePx), x: sag.x } : null;

	return {
		width,
		height: r(height),
		scale,
		exaggeration,
		x0: r(x0),
		x1: r(x1),
		top,
		panelPx: r(panelPx),
		facePx: r(facePx),
		stripPx: r(stripPx('front') || belowPx),
		floor: r(floor),
		dimY: r(dimY),
		bands,
		arrows,
		tail,
		loadLabels,
		blankets,
		supports,
		spans,
		dividerM: halfM * 2,
		sag,
		limit
	};
}

export type ShelfLayout = ReturnType<typeof layoutShelf>;
