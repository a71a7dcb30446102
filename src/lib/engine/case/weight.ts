import { G_M_PER_S2 } from '../joinery/units';
import type { StabilityRequest } from '../stability/types';
import { fittingsRequest } from '../stability/fittings';
import { densityOf, type CaseGeometry } from './geometry';
import type { CaseDesign, CaseShelf } from './types';

type Material = CaseDesign['sides']['material'];

interface WeightPart {
	name: string;
	weight: number;
	centreHeight: number;
	centreFromFront: number;
}

/** The stability request of the case: each panel's weight from its size and density, at its centre;
 * each shelf's contents (the applied load, not the shelf's own weight) at the shelf's height. */
export function stabilityRequestOf(
	d: CaseDesign,
	g: CaseGeometry,
	shelves: CaseShelf[]
): StabilityRequest {
	const parts: WeightPart[] = [];
	const panel = (
		name: string,
		l: number,
		w: number,
		t: number,
		m: Material,
		z: number,
		x: number
	) =>
		parts.push({
			name,
			weight: l * w * t * densityOf(m) * G_M_PER_S2,
			centreHeight: z,
			centreFromFront: x
		});
	const sideX = g.frameM + g.sideDepthM / 2;
	panel(
		'sides',
		2 * d.height,
		g.sideDepthM,
		d.sides.thickness,
		d.sides.material,
		d.height / 2,
		sideX
	);
	const tTop = d.top.thickness ?? d.sides.thickness;
	const tBottom = d.bottom.thickness ?? d.sides.thickness;
	const mid = g.insideCentreXM;
	panel(
		'top',
		g.innerWidthM,
		g.insideDepthM,
		tTop,
		d.top.material ?? d.sides.material,
		d.height - tTop / 2,
		mid
	);
	panel(
		'bottom',
		g.innerWidthM,
		g.insideDepthM,
		tBottom,
		d.bottom.material ?? d.sides.material,
		g.baseHeightM + tBottom / 2,
		mid
	);
	for (const s of d.shelves) {
		const t = s.thickness ?? d.sides.thickness;
		const nose = s.nosing?.thickness ?? 0;
		const z = Math.max(0, s.height - t / 2);
		panel(
			'shelf',
			g.innerWidthM,
			g.insideDepthM - nose,
			t,
			s.material ?? d.sides.material,
			z,
			g.frameM + nose + (g.insideDepthM - nose) / 2
		);
		if (s.nosing)
			panel(
				'nosing',
				g.innerWidthM,
				s.nosing.height,
				s.nosing.thickness,
				s.nosing.material,
				z,
				g.frameM + nose / 2
			);
	}
	if (d.back) {
		const h = d.height - g.baseHeightM;
		panel(
			'back',
			h,
			g.innerWidthM + d.sides.thickness,
			d.back.thickness,
			d.back.material,
			g.baseHeightM + h / 2,
			d.depth - d.back.thickness / 2
		);
	}
	const f = d.faceFrame;
	if (f) {
		panel(
			'stiles',
			2 * d.height,
			f.stileWidth,
			f.thickness,
			f.material,
			d.height / 2,
			f.thickness / 2
		);
		const rail = d.width - 2 * f.stileWidth;
		panel(
			'top rail',
			rail,
			f.railWidth,
			f.thickness,
			f.material,
			d.height - f.railWidth / 2,
			f.thickness / 2
		);
		panel(
			'bottom rail',
			rail,
			f.railWidth,
			f.thickness,
			f.material,
			g.baseHeightM + f.railWidth / 2,
			f.thickness / 2
		);
	}
	const contents = shelves
		.filter((s) => s.analysis.load.applied > 0)
		.map((s) => {
			const design =
				s.kind === 'top' || s.kind === 'bottom' ? undefined : d.shelves[s.path[1] as number];
			return {
				weight: s.analysis.load.applied,
				height: Math.min(d.height, s.heightM),
				itemHeight: design?.itemHeight,
				centreFromFront: g.insideCentreXM
			};
		});
	const kg = (n: number) => n / G_M_PER_S2;
	return {
		heightM: d.height,
		widthM: d.width,
		depthM: d.depth,
		construction: {
			parts: parts
				.filter((p) => p.weight > 0)
				.map((p) => ({
					name: p.name,
					massKg: kg(p.weight),
					centreHeightM: p.centreHeight,
					centreFromFrontM: p.centreFromFront
				}))
		},
		contents: contents.map((x) => ({
			massKg: kg(x.weight),
			heightM: x.height,
			itemHeightM: x.itemHeight,
			centreFromFrontM: x.centreFromFront
		})),
		...fittingsRequest(d)
	};
}
