/**
 * The front elevation of a case, laid out to scale: the case sides, top, bottom, shelves at their
 * heights, the face frame over the front, the base, and the dimension lines (overall width and
 * height, and the clear opening between each pair of shelves). Plain numbers in SVG units; the
 * drawing component only draws what this returns. Heights are measured up from the floor.
 */
import type { CaseDesign } from '../../schemas/case';

export interface Box {
	x: number;
	y: number;
	w: number;
	h: number;
}

export interface ElevationShelf {
	/** index in the design's shelves, or 'top' / 'bottom' */
	key: string;
	box: Box;
	kind: 'fixed' | 'adjustable' | 'top' | 'bottom';
}

export interface Opening {
	/** SVG y of the lower surface (top face of the shelf below) and the upper (underside above) */
	y1: number;
	y2: number;
	clearM: number;
	/** the shelf whose top face is the floor of this opening (for its label), if any */
	below: string;
}

export interface ElevationLayout {
	width: number;
	height: number;
	scale: number;
	/** the case outline, floor line and base */
	outline: Box;
	floorY: number;
	sides: Box[];
	shelves: ElevationShelf[];
	/** stiles and rails, drawn over the box front */
	frame: Box[];
	base: Box | null;
	back: boolean;
	openings: Opening[];
	dims: {
		width: { x1: number; x2: number; y: number; m: number };
		height: { x: number; y1: number; y2: number; m: number };
		spacingX: number;
	};
}

const MARGIN = { left: 58, right: 88, top: 34, bottom: 18 };
/** the drawing area the case is fitted into, in SVG units */
const FIT = { width: 420, height: 520 };

export function layoutElevation(d: CaseDesign): ElevationLayout {
	const scale = Math.min(FIT.width / d.width, FIT.height / d.height);
	const W = d.width * scale;
	const H = d.height * scale;
	const x0 = MARGIN.left;
	const floorY = MARGIN.top + H;
	const yOf = (heightM: number) => floorY - heightM * scale;
	const side = d.sides.thickness * scale;
	const baseM = d.base?.height ?? 0;
	const tTop = d.top.thickness ?? d.sides.thickness;
	const tBottom = d.bottom.thickness ?? d.sides.thickness;
	const inner = { x: x0 + side, w: W - 2 * side };
	const panel = (topM: number, thicknessM: number): Box => ({
		x: inner.x,
		y: yOf(topM),
		w: inner.w,
		h: Math.max(thicknessM * scale, 1)
	});

	const shelves: ElevationShelf[] = [
		{ key: 'top', kind: 'top', box: panel(d.height, tTop) },
		{ key: 'bottom', kind: 'bottom', box: panel(baseM + tBottom, tBottom) },
		...d.shelves.map((s, i): ElevationShelf => ({
			key: String(i),
			kind: s.kind,
			box: panel(s.height, s.thickness ?? d.sides.thickness)
		}))
	];

	// clear openings from the bottom's top face up to the top's underside, shelf by shelf
	const surfaces = [
		{ key: 'bottom', topM: baseM + tBottom, underM: baseM },
		...d.shelves.map((s, i) => ({
			key: String(i),
			topM: s.height,
			underM: s.height - (s.thickness ?? d.sides.thickness)
		})),
		{ key: 'top', topM: d.height, underM: d.height - tTop }
	].sort((a, b) => a.topM - b.topM);
	const openings: Opening[] = [];
	for (let i = 0; i + 1 < surfaces.length; i++) {
		const lower = surfaces[i];
		const upper = surfaces[i + 1];
		const clearM = upper.underM - lower.topM;
		if (clearM > 0)
			openings.push({ y1: yOf(lower.topM), y2: yOf(upper.underM), clearM, below: lower.key });
	}

	const frame: Box[] = [];
	const f = d.faceFrame;
	if (f) {
		const stile = f.stileWidth * scale;
		const rail = f.railWidth * scale;
		frame.push(
			{ x: x0, y: yOf(d.height), w: stile, h: H - baseM * scale },
			{ x: x0 + W - stile, y: yOf(d.height), w: stile, h: H - baseM * scale },
			{ x: x0 + stile, y: yOf(d.height), w: W - 2 * stile, h: rail },
			{ x: x0 + stile, y: yOf(baseM + f.railWidth), w: W - 2 * stile, h: rail }
		);
	}

	return {
		width: MARGIN.left + W + MARGIN.right,
		height: MARGIN.top + H + MARGIN.bottom,
		scale,
		outline: { x: x0, y: MARGIN.top, w: W, h: H },
		floorY,
		sides: [
			{ x: x0, y: MARGIN.top, w: side, h: H - baseM * scale },
			{ x: x0 + W - side, y: MARGIN.top, w: side, h: H - baseM * scale }
		],
		shelves,
		frame,
		base: baseM > 0 ? { x: x0, y: yOf(baseM), w: W, h: baseM * scale } : null,
		back: d.back !== undefined,
		openings,
		dims: {
			width: { x1: x0, x2: x0 + W, y: MARGIN.top - 14, m: d.width },
			height: { x: x0 - 26, y1: MARGIN.top, y2: floorY, m: d.height },
			spacingX: x0 + W + 16
		}
	};
}
