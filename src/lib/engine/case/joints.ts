import { G_M_PER_S2 } from '../joinery/units';
import type { JointRequest } from '../joinery/types';
import { densityOf, stockOf, type CaseGeometry } from './geometry';
import { endDemand } from './shelves';
import type { CaseDesign, CaseShelf, DesignPath } from './types';

/** The joint requests of the case, each with the design element it belongs to. */
export function jointRequests(d: CaseDesign, g: CaseGeometry, shelves: CaseShelf[]) {
	const side = { material: stockOf(d.sides.material).stock, thicknessM: d.sides.thickness };
	const out: { id: string; path: DesignPath; where: string; joints: number; req: JointRequest }[] =
		[];
	const byPath = new Map<string, CaseShelf>();
	for (const s of shelves) {
		const key = s.path.join('.');
		if (!byPath.has(key)) byPath.set(key, s);
	}
	const analysed = (path: DesignPath) => byPath.get(path.join('.'));

	d.shelves.forEach((s, i) => {
		const path = ['shelves', i];
		const a = analysed(path)!;
		const demand = endDemand(a.analysis);
		const end = {
			material: stockOf(s.material ?? d.sides.material).stock,
			thicknessM: a.thicknessM
		};
		const adjustable = s.kind === 'adjustable';
		out.push({
			id: `shelf-${i + 1}`,
			path,
			where: `${s.name ?? `shelf ${i + 1}`}, each end`,
			joints: 2,
			req: {
				kind: 'shelf-to-side',
				fastener: adjustable ? 'shelf-pin' : s.joint,
				lengthM: a.depthM,
				endPiece: end,
				facePiece: side,
				demand: {
					shearN: demand.shearN,
					momentNM: adjustable || s.ends === 'simple' ? 0 : demand.momentNM
				},
				options: { count: adjustable ? undefined : s.jointCount }
			}
		});
	});

	for (const key of ['top', 'bottom'] as const) {
		const p = d[key];
		const t = p.thickness ?? d.sides.thickness;
		const m = p.material ?? d.sides.material;
		const a = analysed([key]);
		// unloaded: each end carries half the panel's own weight (statics)
		const ownN = (g.innerWidthM * g.insideDepthM * t * densityOf(m) * G_M_PER_S2) / 2;
		out.push({
			id: key,
			path: [key],
			where: `${key}, each end`,
			joints: 2,
			req: {
				kind: key === 'top' ? 'top-to-side' : 'bottom-to-side',
				fastener: p.joint,
				lengthM: g.insideDepthM,
				endPiece: { material: stockOf(m).stock, thicknessM: t },
				facePiece: side,
				demand: { shearN: a ? endDemand(a.analysis).shearN : ownN, momentNM: 0 },
				options: { count: p.jointCount }
			}
		});
	}

	const f = d.faceFrame;
	if (f) {
		const frame = { material: stockOf(f.material).stock, thicknessM: f.thickness };
		out.push({
			id: 'rail-to-stile',
			path: ['faceFrame'],
			where: 'face frame, each rail end',
			joints: 4,
			req: {
				kind: 'rail-to-stile',
				fastener: f.joint,
				lengthM: f.railWidth,
				endPiece: frame,
				facePiece: frame
			}
		});
		out.push({
			id: 'frame-to-case',
			path: ['faceFrame'],
			where: 'face frame to each case side',
			joints: 2,
			req: {
				kind: 'frame-to-case',
				fastener: f.attach,
				lengthM: d.height,
				endPiece: side,
				facePiece: frame
			}
		});
	}
	return out;
}

/** Whether any stock in the design was given by figures, so its fastener holding is assumed. */
export function assumedStocks(d: CaseDesign): boolean {
	const all = [
		d.sides.material,
		d.top.material,
		d.bottom.material,
		...d.shelves.map((s) => s.material),
		d.faceFrame?.material
	];
	return all.some((m) => m !== undefined && stockOf(m).assumed);
}
