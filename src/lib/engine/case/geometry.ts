import { findMaterial } from '../../../../reference/materials';
import { findStockHolding } from '../../../../reference/stock-holding';
import type { StockMaterial } from '../joinery/types';
import type { CaseDesign, CasePart } from './types';
import { METRES_PER_INCH } from '../units/length';

type Material = CaseDesign['sides']['material'];

const INCH = METRES_PER_INCH;
/** An adjustable shelf is cut 1/16" shorter than the opening so it drops in (common practice, no source). */
export const ADJUSTABLE_CLEARANCE_M = INCH / 16;

/**
 * The case's inside sizes, from the overall sizes. Sides run the full height; top and bottom sit
 * between them; a rabbeted back sits inside the sides' depth, an applied back behind it; a face
 * frame sits in front of the box.
 */
export function caseGeometry(d: CaseDesign) {
	const side = d.sides.thickness;
	const frame = d.faceFrame?.thickness ?? 0;
	const back = d.back?.thickness ?? 0;
	const box = d.depth - frame;
	const sideDepth = d.back?.fitted === 'applied' ? box - back : box;
	const inside = box - back;
	const baseHeight = d.base?.height ?? 0;
	return {
		innerWidthM: d.width - 2 * side,
		sideDepthM: sideDepth,
		insideDepthM: inside,
		frameM: frame,
		backM: back,
		baseHeightM: baseHeight,
		/** x of the middle of the inside, from the front */
		insideCentreXM: frame + inside / 2
	};
}
export type CaseGeometry = ReturnType<typeof caseGeometry>;

export const materialName = (m: Material) =>
	typeof m === 'string' ? (findMaterial(m)?.name ?? m) : m.name;

export function densityOf(m: Material): number {
	if (typeof m !== 'string') return m.density;
	return findMaterial(m)?.densityKgM3 ?? 0;
}

/**
 * The stock for fastener holding. Library materials share their ids with reference/stock-holding.ts;
 * a material given by its figures is taken as softwood of specific gravity density / 1120 kg/m³
 * (the inverse of the density rule in reference/materials.ts) and the result says so.
 */
export function stockOf(m: Material): { stock: StockMaterial; assumed: boolean } {
	if (typeof m === 'string' && findStockHolding(m)) return { stock: m, assumed: false };
	const density = densityOf(m) || 500;
	return {
		stock: {
			name: materialName(m),
			kind: 'softwood',
			specificGravity: Math.min(1.2, density / 1120)
		},
		assumed: true
	};
}

/** The cut list: every panel and strip with its finished size, identical parts counted together. */
export function partsList(d: CaseDesign, g: CaseGeometry): CasePart[] {
	const out: CasePart[] = [];
	const add = (
		name: string,
		count: number,
		lengthM: number,
		widthM: number,
		thicknessM: number,
		m: Material
	) => {
		const material = materialName(m);
		const same = out.find(
			(p) =>
				p.name === name &&
				p.material === material &&
				near(p.lengthM, lengthM) &&
				near(p.widthM, widthM) &&
				near(p.thicknessM, thicknessM)
		);
		if (same) same.count += count;
		else out.push({ name, count, lengthM, widthM, thicknessM, material });
	};
	add('side', 2, d.height, g.sideDepthM, d.sides.thickness, d.sides.material);
	for (const key of ['top', 'bottom'] as const) {
		const p = d[key];
		add(
			key,
			1,
			g.innerWidthM,
			g.insideDepthM,
			p.thickness ?? d.sides.thickness,
			p.material ?? d.sides.material
		);
	}
	for (const s of d.shelves) {
		const nose = s.nosing?.thickness ?? 0;
		const length = s.kind === 'adjustable' ? g.innerWidthM - ADJUSTABLE_CLEARANCE_M : g.innerWidthM;
		add(
			`${s.kind} shelf`,
			1,
			length,
			g.insideDepthM - nose,
			s.thickness ?? d.sides.thickness,
			s.material ?? d.sides.material
		);
		if (s.nosing) add('nosing', 1, length, s.nosing.height, s.nosing.thickness, s.nosing.material);
	}
	if (d.back) {
		// rabbeted: into half of each side's thickness (common practice, no source)
		const width = d.back.fitted === 'rabbet' ? g.innerWidthM + d.sides.thickness : d.width;
		add('back', 1, d.height - g.baseHeightM, width, d.back.thickness, d.back.material);
	}
	const f = d.faceFrame;
	if (f) {
		add('face-frame stile', 2, d.height, f.stileWidth, f.thickness, f.material);
		add('face-frame rail', 2, d.width - 2 * f.stileWidth, f.railWidth, f.thickness, f.material);
	}
	return out;
}

const near = (a: number, b: number) => Math.abs(a - b) < 1e-6;
