/**
 * The lab's elevation at fixed scales: lengths at one scale for every span the lab allows (so a
 * longer shelf is drawn longer) and the sag at one stated exaggeration (so three times the sag
 * is drawn three times as deep). Metres in, drawing units out; no framework, so it can be tested.
 */

export const VIEW = { width: 1000, height: 360, left: 60, right: 60, top: 120, maxSagPx: 170 };

export type LabDrawingSupport = 'pins' | 'fixed' | 'divider' | 'wall';

export interface LabShape {
	spanM: number;
	thicknessM: number;
	/** height of a front nosing, m (0: none) */
	nosingM: number;
	/** [x, sag] in m, sag downward positive */
	curve: [number, number][];
}

export interface LabDrawingInput extends LabShape {
	support: LabDrawingSupport;
	load: { kind: 'books'; label: string } | { kind: 'point'; atM: number; label: string } | null;
	sagM: number;
}

export interface Scales {
	/** drawing units per metre along the shelf and through its thickness */
	scale: number;
	exaggeration: number;
	x: (m: number) => number;
	/** y of a point of the shelf's top that sags `sagM` (clipped to the drawing) */
	y: (sagM: number) => number;
}

export function scalesFor(maxSpanM: number, exaggeration: number): Scales {
	const scale = (VIEW.width - VIEW.left - VIEW.right) / maxSpanM;
	return {
		scale,
		exaggeration,
		x: (m) => VIEW.left + m * scale,
		y: (sagM) => VIEW.top + Math.min(VIEW.maxSagPx, sagM * scale * exaggeration)
	};
}

const r = (n: number) => Math.round(n * 10) / 10;

/** Closed outline of the shelf (and its nosing, drawn as the deeper face) bent along its curve. */
export function outline(shape: LabShape, s: Scales): string {
	const depthPx = Math.max(4, Math.max(shape.thicknessM, shape.nosingM) * s.scale);
	const top = shape.curve.map(([m, y]) => `${r(s.x(m))},${r(s.y(y))}`);
	const bottom = shape.curve.map(([m, y]) => `${r(s.x(m))},${r(s.y(y) + depthPx)}`).reverse();
	return `M${top.join('L')}L${bottom.join('L')}Z`;
}

/** The thin line of the panel's own bottom, where a taller nosing hides it. */
export function panelLine(shape: LabShape, s: Scales): string | null {
	if (!(shape.nosingM > shape.thicknessM)) return null;
	const t = shape.thicknessM * s.scale;
	return `M${shape.curve.map(([m, y]) => `${r(s.x(m))},${r(s.y(y) + t)}`).join('L')}`;
}

/** Sag of the curve at x, linear between its points. */
export function sagOn(curve: [number, number][], xM: number): number {
	for (let i = 1; i < curve.length; i++) {
		const [x1, y1] = curve[i];
		if (xM <= x1) {
			const [x0, y0] = curve[i - 1];
			return x1 === x0 ? y1 : y0 + ((y1 - y0) * (xM - x0)) / (x1 - x0);
		}
	}
	return curve.at(-1)?.[1] ?? 0;
}

/** Does the sag run past the drawing at this exaggeration? */
export function clipped(sagM: number, s: Scales): boolean {
	return sagM * s.scale * s.exaggeration > VIEW.maxSagPx;
}

/** Book spines standing on the shelf, every ~40 units, following the curve. */
export function books(shape: LabShape, s: Scales): { x: number; y: number; h: number }[] {
	const n = Math.max(2, Math.floor((shape.spanM * s.scale) / 40));
	const out: { x: number; y: number; h: number }[] = [];
	for (let i = 0; i < n; i++) {
		const m = ((i + 0.5) * shape.spanM) / n;
		const h = 30 + ((i * 7) % 3) * 6;
		out.push({ x: r(s.x(m) - 8), y: r(s.y(sagOn(shape.curve, m)) - h), h });
	}
	return out;
}

/** The share of the span (0–1) under a pointer at drawing x. */
export function shareAt(xUnits: number, spanM: number, s: Scales): number {
	const share = (xUnits - VIEW.left) / (spanM * s.scale);
	return Math.min(1, Math.max(0, share));
}

/** Sizes of the drawing's words in its own units at a text scale of 1 (a drawing ~800 px wide). */
export const TEXT = { note: 15, label: 18 };

/**
 * How much the drawing's words grow so they stay `notePx` tall on screen (the smallest, the
 * notes) when the drawing is `widthPx` wide: 1 on a desktop, about 2.5 on a 375 px phone. Never
 * below 1, so a wide projector keeps the drawing's own proportions; 1 before the width is known.
 */
export function textScale(widthPx: number, notePx = 13): number {
	if (!(widthPx > 0)) return 1;
	return Math.max(1, (notePx * VIEW.width) / (TEXT.note * widthPx));
}

export interface TextLayout {
	/** the viewBox: room above for larger words, and below for the sag line (and the clip note) */
	viewBox: string;
	/** baseline of the stated exaggeration, top right */
	noteY: number;
	/** baseline of the sag line under the shelf */
	sagY: number;
	/** baseline of the note that the sag runs past the drawing */
	clipY: number;
}

/** Where the words go at text scale `k`, so larger words never run into the shelf or each other. */
export function textLayout(k: number, isClipped: boolean): TextLayout {
	const floor = VIEW.top + VIEW.maxSagPx + 30;
	const padTop = Math.round((k - 1) * 2.4 * TEXT.note);
	const sagY = floor + 10 + 0.9 * TEXT.label * k;
	const clipY = sagY + 1.3 * TEXT.note * k;
	const bottom = Math.max(VIEW.height, (isClipped ? clipY : sagY) + 0.4 * TEXT.label * k);
	return {
		viewBox: `0 ${-padTop} ${VIEW.width} ${Math.round(bottom + padTop)}`,
		noteY: -padTop + 1.45 * TEXT.note * k,
		sagY,
		clipY
	};
}

/**
 * The x at which a centred line of monospaced words (`chars` long, `size` tall, in drawing units)
 * stays inside the drawing: its wanted centre, moved in from an edge it would run past.
 */
export function centredX(wanted: number, chars: number, size: number): number {
	const half = (chars * 0.62 * size) / 2;
	const lo = 4 + half;
	const hi = VIEW.width - 4 - half;
	return lo > hi ? VIEW.width / 2 : Math.min(hi, Math.max(lo, wanted));
}
