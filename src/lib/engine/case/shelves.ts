import { analyzeInput } from '../shelf/analyze';
import { InputError } from '../errors';
import { DEFAULT_SHELF_OPTIONS, type ShelfInput, type ShelfResult } from '../shelf/types';
import { geometryIssues } from '../shelf/validate';
import { ContentMap } from '../memo';
import type { CaseGeometry } from './geometry';
import type { CaseDesign, CaseNosing, CaseShelf, DesignPath } from './types';

type DesignShelf = CaseDesign['shelves'][number];

/** What a suggestion changes in a shelf before it is analysed again (the rest as designed). */
export interface ShelfChange {
	spanM?: number;
	thickness?: number;
	nosing?: CaseNosing;
	ends?: DesignShelf['ends'];
}

/** The shelf engine's input for one shelf of the case, with a suggestion's changes if any (taken
 * here rather than from a spread copy of the shelf: adding a key to a spread object is slow on
 * Node 20, issue 12). */
export function shelfRequest(
	d: CaseDesign,
	g: CaseGeometry,
	s: DesignShelf,
	change: ShelfChange = {}
): ShelfInput {
	const nosing = change.nosing ?? s.nosing;
	const ends = change.ends ?? s.ends;
	return {
		span: change.spanM ?? g.innerWidthM,
		depth: g.insideDepthM - (nosing?.thickness ?? 0),
		thickness: change.thickness ?? s.thickness ?? d.sides.thickness,
		material: s.material ?? d.sides.material,
		grain: 'along',
		support: s.kind === 'fixed' && ends === 'fixed' ? 'fixed' : 'simple',
		loads: s.loads,
		selfWeight: true,
		edges: nosing
			? [
					{
						side: 'front',
						material: nosing.material,
						height: nosing.height,
						thickness: nosing.thickness
					}
				]
			: [],
		duration: 'long',
		service: d.service,
		limit: d.limit,
		options: DEFAULT_SHELF_OPTIONS
	};
}

/** What the shelf schema would refuse in a shelf the case built: a nosing as deep as the shelf,
 * a load beyond the span. */
function shelfIssues(input: ShelfInput) {
	const issues = geometryIssues(input, true);
	if (!(input.depth > 0))
		issues.unshift({ path: ['depth'], message: 'Must be greater than zero.' });
	return issues;
}

/** Identical shelves are analysed once per check: a case often repeats one shelf many times. */
export class ShelfAnalyses {
	private memo = new ContentMap<ShelfResult>();

	/** The analysis of a request; the same object for every request of the same content. */
	run(request: ShelfInput, path: DesignPath): ShelfResult {
		const hit = this.memo.get(request);
		if (hit) return hit;
		try {
			const issues = shelfIssues(request);
			if (issues.length) throw new InputError(issues);
			const result = analyzeInput(request);
			this.memo.set(request, result);
			return result;
		} catch (e) {
			if (e instanceof InputError) {
				const issues = e.issues.map((i) => ({ path: [...path, ...i.path], message: i.message }));
				throw new InputError(issues);
			}
			throw e;
		}
	}
}

/** Top and bottom count as shelves when they carry something. */
export function asShelf(d: CaseDesign, key: 'top' | 'bottom'): DesignShelf {
	const p = d[key];
	return {
		height: 0,
		kind: 'fixed',
		material: p.material,
		thickness: p.thickness,
		joint: p.joint,
		jointCount: p.jointCount,
		ends: 'simple',
		loads: p.loads
	};
}

export function analyseShelves(d: CaseDesign, g: CaseGeometry, runs: ShelfAnalyses): CaseShelf[] {
	const out: CaseShelf[] = [];
	d.shelves.forEach((s, i) => {
		const path = ['shelves', i];
		const analysis = runs.run(shelfRequest(d, g, s), path);
		out.push(view(path, s.name ?? `shelf ${i + 1}`, s.kind, s.height, g, s, d, analysis));
	});
	for (const key of ['top', 'bottom'] as const) {
		if (!d[key].loads.length) continue;
		const s = asShelf(d, key);
		const analysis = runs.run(shelfRequest(d, g, s), [key]);
		const t = s.thickness ?? d.sides.thickness;
		const height = key === 'top' ? d.height : g.baseHeightM + t;
		out.push(view([key], key, key, height, g, s, d, analysis));
	}
	return out;
}

function view(
	path: DesignPath,
	name: string,
	kind: CaseShelf['kind'],
	heightM: number,
	g: CaseGeometry,
	s: DesignShelf,
	d: CaseDesign,
	analysis: ShelfResult
): CaseShelf {
	return {
		path,
		name,
		kind,
		heightM,
		spanM: g.innerWidthM,
		depthM: g.insideDepthM - (s.nosing?.thickness ?? 0),
		thicknessM: s.thickness ?? d.sides.thickness,
		analysis,
		pass: analysis.limit.pass && analysis.strength.pass
	};
}

/** The larger end reaction and end moment of a shelf, for its joints. */
export function endDemand(a: ShelfResult): { shearN: number; momentNM: number } {
	const first = a.reactions[0];
	const last = a.reactions[a.reactions.length - 1];
	return {
		shearN: Math.max(first?.force ?? 0, last?.force ?? 0, 0),
		momentNM: Math.max(Math.abs(first?.moment ?? 0), Math.abs(last?.moment ?? 0))
	};
}
