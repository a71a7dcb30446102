/**
 * The cut list: identical parts grouped, each group with a part mark (A, B, …, Z, AA, …) that the
 * elevation and the sheet layouts also show, finished and rough sizes, and the banding it takes.
 */
import type { Material, PartRole, WallPart } from '../wall/types';

export interface CutGroup {
	mark: string;
	role: PartRole;
	name: string;
	count: number;
	lengthM: number;
	widthM: number;
	thicknessM: number;
	/** finished size plus the rough-cut allowance on length and width */
	roughLengthM: number;
	roughWidthM: number;
	material: Material;
	materialName: string;
	grain: 'length' | 'any';
	grainReason?: 'strength' | 'looks';
	banding: { long: number; short: number };
	/** banding on one part */
	bandingM: number;
	machining: string[];
	/** the cases it goes into, by index (a run-wide part has none) */
	cases: number[];
	/** the parts of the group, by their index in the wall's part list */
	parts: number[];
}

export interface CutList {
	groups: CutGroup[];
	/** each part's mark, in the order of the wall's part list */
	marks: string[];
	roughAllowanceM: number;
}

/** A, B, …, Z, AA, AB, … */
function markOf(i: number): string {
	let s = '';
	let n = i + 1;
	while (n > 0) {
		const r = (n - 1) % 26;
		s = String.fromCharCode(65 + r) + s;
		n = Math.floor((n - 1) / 26);
	}
	return s;
}

const mm = (m: number) => Math.round(m * 1e6);

/** Group identical parts (same role, material, sizes to the micrometre, grain, banding and work). */
export function cutList(parts: WallPart[], roughAllowanceM: number): CutList {
	const groups: CutGroup[] = [];
	const byKey = new Map<string, CutGroup>();
	const marks: string[] = [];
	parts.forEach((p, i) => {
		const key = JSON.stringify([
			p.role,
			p.materialName,
			mm(p.lengthM),
			mm(p.widthM),
			mm(p.thicknessM),
			p.grain,
			p.banding.long,
			p.banding.short,
			p.machining
		]);
		let g = byKey.get(key);
		if (!g) {
			g = {
				mark: markOf(groups.length),
				role: p.role,
				name: p.role,
				count: 0,
				lengthM: p.lengthM,
				widthM: p.widthM,
				thicknessM: p.thicknessM,
				roughLengthM: p.lengthM + roughAllowanceM,
				roughWidthM: p.widthM + roughAllowanceM,
				material: p.material,
				materialName: p.materialName,
				grain: p.grain,
				grainReason: p.grainReason,
				banding: p.banding,
				bandingM: p.banding.long * p.lengthM + p.banding.short * p.widthM,
				machining: p.machining,
				cases: [],
				parts: []
			};
			groups.push(g);
			byKey.set(key, g);
		}
		g.count++;
		g.parts.push(i);
		if (p.caseIndex !== null && !g.cases.includes(p.caseIndex)) g.cases.push(p.caseIndex);
		marks.push(g.mark);
	});
	return { groups, marks, roughAllowanceM };
}

export interface BandingTotal {
	materialName: string;
	/** banding as the edges need it */
	netM: number;
	/** with the waste allowance */
	lengthM: number;
}

/** Edge banding per material (banding matches the face it covers), with a share added for waste. */
export function bandingTotals(groups: CutGroup[], wasteShare: number): BandingTotal[] {
	const out = new Map<string, number>();
	for (const g of groups)
		if (g.bandingM > 0)
			out.set(g.materialName, (out.get(g.materialName) ?? 0) + g.count * g.bandingM);
	return [...out].map(([materialName, netM]) => ({
		materialName,
		netM,
		lengthM: netM * (1 + wasteShare)
	}));
}
