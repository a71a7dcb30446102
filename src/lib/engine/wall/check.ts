import { ContentMap } from '../memo';
import { anchoringSuggestion, jointSuggestions, shelfSuggestions } from '../case/suggest';
import { analyseShelves, ShelfAnalyses } from '../case/shelves';
import { jointRequests, assumedStocks } from '../case/joints';
import { caseMargins } from '../case/margins';
import { stockOf } from '../case/geometry';
import type { CaseJoint, CaseMargin, CaseSuggestion, DesignChange } from '../case/types';
import { JOINT_CAUTIONS } from '../joinery/cautions';
import { planJointSI } from '../joinery/plan';
import type { JointPlan, JointRequest } from '../joinery/types';
import { InputError } from '../errors';
import { F2057_CARPET_BLOCK_M, F2057_FILL_KG_PER_M3 } from '../../../../reference/tipping';
import { STABILITY_CAUTIONS } from '../stability/cautions';
import { checkStabilitySI } from '../stability/check';
import type { StabilityRequest } from '../stability/types';
import { STANDARD_GRAVITY } from '../units/si';
import type { ShelfInput } from '../shelf/types';
import type { ShelfResult } from '../shelf/types';
import { ENGINE_VERSION } from '../version';
import { asCaseDesign, shelfSpans, wallCaseGeometry, type WallCaseGeometry } from './geometry';
import { checkDividers, dividerMargins, dividerSuggestions } from './dividers';
import { caseParts, partSink } from './parts';
import { runParts } from './run-parts';
import type {
	WallCaseCheck,
	WallCaseDesign,
	WallDesign,
	WallPart,
	WallResult,
	WallShelfCheck
} from './types';

const WALL_CAUTIONS = [
	'Shelf sag, joints and tip-over are estimates from published material data, beam theory and statics; real boards and joints vary.',
	'Do not overload shelves: the Architectural Woodwork Standards cap one shelf at 200 lb.',
	'Drawers are checked open with 60 lb on the front, after ASTM F2057-23, a test for clothing storage units cited here as the nearest published test; it does not rate bookcases.'
];

/** The shelf engine, told each shelf's own spans: a shelf in a bay spans the bay, a shelf over
 * dividers is a continuous shelf on several supports. */
class WallShelfAnalyses extends ShelfAnalyses {
	constructor(private spans: Map<string, number[]>) {
		super();
	}
	override run(request: ShelfInput, path: (string | number)[]): ShelfResult {
		const s = this.spans.get(path.join('.'));
		if (!s) return super.run(request, path);
		if (s.length === 1) return super.run({ ...request, span: s[0] }, path);
		const ends = request.support === 'fixed' ? 'fixed' : 'simple';
		return super.run(
			{ ...request, span: s.reduce((a, b) => a + b, 0), support: { spans: s, ends } },
			path
		);
	}
}

const prefixed = (ci: number, e: unknown): never => {
	if (e instanceof InputError) {
		const issues = e.issues.map((i) => ({
			path: i.path[0] === 'cases' ? i.path : ['cases', ci, ...i.path],
			message: i.message
		}));
		throw new InputError(issues);
	}
	throw e;
};

/**
 * Check a wall of cases: each shelf (in its bay, or continuous over dividers), each joint, each
 * case's tip-over with its drawers opened and doors swung, the margins worst first with the fixes
 * that clear them, and every part of the run. SI input (src/lib/schemas/wall.ts parses what users
 * type). Throws InputError naming the field.
 */
export function checkWall(w: WallDesign): WallResult {
	const n = w.cases.length;
	const xs: number[] = [];
	w.cases.reduce((x, c) => (xs.push(x), x + c.width), 0);
	const geoms = w.cases.map((c, ci) => {
		try {
			return wallCaseGeometry(c, `cases.${ci}`);
		} catch (e) {
			return prefixed(ci, e);
		}
	});
	const parts: WallPart[] = [];
	const sink = partSink(parts);
	w.cases.forEach((c, ci) => {
		try {
			caseParts(c, ci, xs[ci], geoms[ci], touchesOf(ci, n), sink);
		} catch (e) {
			prefixed(ci, e);
		}
	});
	const notes = runParts(w, geoms, xs, sink);
	const cases = w.cases.map((c, ci) => {
		try {
			return checkOne(c, ci, xs[ci], geoms[ci], parts, n);
		} catch (e) {
			return prefixed(ci, e);
		}
	});
	const margins = cases
		.flatMap((k) =>
			k.margins.map((m) => ({
				...m,
				caseIndex: k.index,
				key: `cases.${k.index}.${m.key}`,
				what: `${k.name}: ${m.what}`,
				path: ['cases', k.index, ...m.path]
			}))
		)
		.sort((a, b) => Number(a.pass) - Number(b.pass) || rank(a) - rank(b));
	const suggestions = cases.flatMap((k) =>
		k.suggestions.map((s) => ({
			...s,
			caseIndex: k.index,
			title: `${k.name}: ${s.title}`,
			fixes: s.fixes.map((f) => `cases.${k.index}.${f}`),
			changes: s.changes.map((ch: DesignChange) => ({
				...ch,
				path: ['cases', k.index, ...ch.path]
			}))
		}))
	);
	// a fix for the worst failure first
	const order = new Map(margins.map((m, i) => [m.key, i]));
	suggestions.sort(
		(a, b) =>
			Math.min(...a.fixes.map((f) => order.get(f) ?? 1e9)) -
			Math.min(...b.fixes.map((f) => order.get(f) ?? 1e9))
	);
	const failures = margins.filter((m) => !m.pass).length;
	return {
		estimate: true,
		engineVersion: ENGINE_VERSION,
		name: w.name ?? null,
		pass: failures === 0,
		widthM: xs[n - 1] + w.cases[n - 1].width,
		cases,
		margins,
		suggestions,
		summary: { failures, worst: margins.slice(0, 5) },
		parts,
		warnings: [
			...new Set([...notes, ...cases.flatMap((k) => k.warnings.map((x) => `${k.name}: ${x}`))])
		],
		cautions: [...WALL_CAUTIONS, ...JOINT_CAUTIONS, ...STABILITY_CAUTIONS]
	};
}

const rank = (m: CaseMargin) => (m.margin === null ? (m.pass ? Infinity : -Infinity) : m.margin);
const touchesOf = (ci: number, n: number) => ({ left: ci > 0, right: ci < n - 1 });

function checkOne(
	c: WallCaseDesign,
	ci: number,
	xCase: number,
	g: WallCaseGeometry,
	all: WallPart[],
	n: number
): WallCaseCheck {
	const d = asCaseDesign(c);
	const name = c.name ?? `case ${ci + 1}`;
	const spans = new Map<string, number[]>();
	const placed = new Map<string, { bay: number | null; xM: number }>();
	c.shelves.forEach((s, si) => {
		const t = s.thickness ?? c.sides.thickness;
		const sp = shelfSpans(g, s.bay, s.height - t, s.height, `shelves.${si}`);
		if (g.dividers.length) spans.set(`shelves.${si}`, sp.spans);
		placed.set(`shelves.${si}`, { bay: sp.bay, xM: sp.xM });
	});
	if (g.dividers.length) {
		const top = shelfSpans(g, undefined, g.topUndersideM, c.height, 'top');
		spans.set('top', top.spans);
	}
	const runs = new WallShelfAnalyses(spans);
	const shelves: WallShelfCheck[] = analyseShelves(d, g, runs).map((s) => {
		const key = s.path.join('.');
		const sp = spans.get(key) ?? [g.innerWidthM];
		const at = placed.get(key);
		return {
			...s,
			spanM: sp.reduce((a, b) => a + b, 0),
			spansM: sp,
			bay: at?.bay ?? null,
			xM: xCase + (at?.xM ?? g.sideM)
		};
	});

	const requests = [...jointRequests(d, g, shelves), ...dividerRequests(c, g)];
	const plans = new ContentMap<JointPlan>();
	const planOnce = (req: JointRequest) => {
		let plan = plans.get(req);
		if (!plan) plans.set(req, (plan = planJointSI(req)));
		return plan;
	};
	const mine = all.filter((p) => p.caseIndex === ci);
	// rails between openings join the stiles like the top and bottom rails: two joints each
	const rails = mine.filter((p) => p.role === 'face-frame rail').length;
	const joints: CaseJoint[] = requests.map((r) => {
		const midRails = r.id === 'rail-to-stile' && rails > 2;
		return {
			id: r.id,
			path: r.path,
			where: midRails ? `${r.where} (${rails} rails, mid rails included)` : r.where,
			joints: midRails ? 2 * rails : r.joints,
			plan: planOnce(r.req)
		};
	});

	const stability = checkStabilitySI(stabilityRequest(c, g, shelves, mine));
	const dividers = checkDividers(c, g, xCase, shelves);
	const margins = [...caseMargins(shelves, joints, stability), ...dividerMargins(dividers)].sort(
		(a, b) => Number(a.pass) - Number(b.pass) || rank(a) - rank(b)
	);
	const failing = margins.filter((m) => !m.pass).map((m) => m.key);

	const suggestions: CaseSuggestion[] = [];
	for (const s of shelves.filter((x) => !x.pass)) {
		const own = spans.get(s.path.join('.'));
		// a shelf in a bay: the case engine's suggestions, with the bay's width as the inside width
		const gg = own && own.length === 1 ? { ...g, innerWidthM: own[0] } : g;
		suggestions.push(
			...shelfSuggestions(d, gg, runs, s).filter(
				(x) => !own || !x.changes.some((ch) => ch.path[0] === 'width')
			)
		);
	}
	joints.forEach((j, i) => {
		if (!j.plan.pass) suggestions.push(...jointSuggestions(j, requests[i].req, d, g, runs));
	});
	suggestions.push(
		...dividerSuggestions(dividers, (i) => g.dividers.find((d) => d.index === i)!.thicknessM)
	);
	const tipping = failing.filter((k) => k.startsWith('stability:'));
	if (tipping.length) suggestions.push(anchoringSuggestion(tipping));

	const warnings = [
		...shelves.flatMap((s) =>
			s.analysis.warnings.filter((x) => x.code !== 'estimate').map((x) => `${s.name}: ${x.message}`)
		),
		...joints.flatMap((j) => j.plan.warnings.map((x) => `${j.where}: ${x}`)),
		...stability.warnings
	];
	if (assumedStocks(d))
		warnings.push(
			'A material given by its figures is taken as softwood of its specific gravity for fastener holding.'
		);
	if (c.faceFrame && c.drawers.length)
		warnings.push(
			'Behind a face frame the slides need blocking out to the frame opening; the drawer boxes are sized to the frame opening.'
		);

	const fronts = mine.filter((p) => p.role === 'drawer front' && p.elevation);
	const doors = mine.filter((p) => p.role === 'door' && p.elevation);
	return {
		index: ci,
		name,
		xM: xCase,
		widthM: c.width,
		heightM: c.height,
		depthM: c.depth,
		pass: failing.length === 0,
		shelves,
		joints,
		stability,
		margins,
		suggestions,
		warnings: [...new Set(warnings)],
		dividers,
		touches: touchesOf(ci, n),
		bays: g.bays,
		drawers: fronts.map((p) => ({
			opening: p.path[3] as number,
			index: p.moving!.drawer!,
			xM: p.elevation!.x,
			zM: p.elevation!.z,
			wM: p.elevation!.w,
			hM: p.elevation!.h
		})),
		doors: doors.map((p) => {
			const o = c.doors[p.path[3] as number];
			const first = doors.findIndex((q) => q.path[3] === p.path[3]);
			const leaf = doors.indexOf(p) - first;
			return {
				opening: p.path[3] as number,
				leaf,
				hinge: o.count === 2 ? (leaf === 0 ? 'left' : 'right') : o.hinge,
				xM: p.elevation!.x,
				zM: p.elevation!.z,
				wM: p.elevation!.w,
				hM: p.elevation!.h
			};
		})
	};
}

/** Each divider joined to the panel above and below it. */
function dividerRequests(c: WallCaseDesign, g: WallCaseGeometry) {
	return g.dividers.map((dv) => {
		const m = dv.design.material ?? c.sides.material;
		return {
			id: `divider-${dv.index + 1}`,
			path: ['dividers', dv.index],
			where: `${dv.design.name ?? `divider ${dv.index + 1}`}, each end`,
			joints: 2,
			req: {
				kind: 'divider-to-shelf',
				fastener: dv.design.joint,
				lengthM: g.insideDepthM,
				endPiece: { material: stockOf(m).stock, thicknessM: dv.thicknessM },
				facePiece: {
					material: stockOf(c.top.material ?? c.sides.material).stock,
					thicknessM: g.topM
				},
				demand: { shearN: 0, momentNM: 0 }
			} satisfies JointRequest
		};
	});
}

/** Tip-over of one case: the carcass from its parts, the shelves' contents, each drawer (box and
 * front, at its own centre) and each door leaf by its own weight. As in ASTM F2057-23, the nearest
 * published test (reference/tipping.ts): every drawer pulled out at once, each filled at the test's
 * 8.5 lb per cubic foot unless the design says it holds more, and the case tilted forward as by the
 * test's 10.9 mm block under its back (the carpet the test simulates); the engine then tries the
 * 60 lb test weight on each open drawer's front. */
function stabilityRequest(
	c: WallCaseDesign,
	g: WallCaseGeometry,
	shelves: WallShelfCheck[],
	mine: WallPart[]
): StabilityRequest {
	const drawers = new Map<
		number,
		{ massKg: number; moment: number; heightM: number; volumeM3: number; part: WallPart }
	>();
	const doors = new Map<number, { massKg: number; widthM: number; centreHeightM: number }>();
	for (const p of mine) {
		const k = p.moving?.drawer;
		if (k !== undefined) {
			const dr = drawers.get(k) ?? { massKg: 0, moment: 0, heightM: 0, volumeM3: 0, part: p };
			dr.massKg += p.massKg;
			dr.moment += p.massKg * p.centre.fromFrontM;
			if (p.role === 'drawer front') dr.heightM = p.elevation!.z;
			if (p.role === 'drawer bottom') dr.volumeM3 += p.lengthM * p.widthM;
			drawers.set(k, dr);
		}
		const dk = p.moving?.door;
		if (dk !== undefined)
			doors.set(dk, { massKg: p.massKg, widthM: p.widthM, centreHeightM: p.centre.heightM });
	}
	// the box's inside volume: its bottom's area times the height of its sides
	const boxHeight = new Map<number, number>();
	for (const p of mine)
		if (p.role === 'drawer side' && p.moving?.drawer !== undefined)
			boxHeight.set(p.moving.drawer, p.widthM);
	const opening = (p: WallPart) => c.drawers[p.path[3] as number];
	const setback = c.base?.setback ?? 0;
	const carpetDeg = (Math.atan(F2057_CARPET_BLOCK_M / (c.depth - setback)) * 180) / Math.PI;
	return {
		heightM: c.height,
		widthM: c.width,
		depthM: c.depth,
		construction: {
			parts: mine
				.filter((p) => !p.moving && p.massKg > 0)
				.map((p) => ({
					name: p.name,
					massKg: p.massKg,
					centreHeightM: p.centre.heightM,
					centreFromFrontM: Math.max(0, p.centre.fromFrontM)
				}))
		},
		contents: shelves
			.filter((s) => s.analysis.load.applied > 0)
			.map((s) => ({
				massKg: s.analysis.load.applied / STANDARD_GRAVITY,
				heightM: Math.min(c.height, s.heightM),
				itemHeightM:
					s.path[0] === 'shelves' ? c.shelves[s.path[1] as number].itemHeight : undefined,
				centreFromFrontM: g.insideCentreXM
			})),
		drawers: [...drawers.entries()].map(([k, dr]) => {
			const o = opening(dr.part);
			const fill = dr.volumeM3 * (boxHeight.get(k) ?? 0) * F2057_FILL_KG_PER_M3;
			return {
				heightM: Math.max(0, dr.heightM),
				massKg: dr.massKg,
				contentsKg: Math.max((o.contentsWeight ?? 0) / STANDARD_GRAVITY, fill),
				extensionM: o.slide.length * (o.slide.extension === 'full' ? 1 : 0.75),
				centreFromFrontM: dr.massKg > 0 ? dr.moment / dr.massKg : undefined
			};
		}),
		doors: [...doors.values()].map((x) => ({ ...x, centreHeightM: Math.max(0, x.centreHeightM) })),
		base: { setbackM: c.base?.setback },
		floorTiltDeg: c.drawers.length ? Math.max(c.floorTiltDeg ?? 0, carpetDeg) : c.floorTiltDeg,
		anchoring: c.anchoring
			? { kind: c.anchoring.kind, heightM: c.anchoring.height, intoStuds: c.anchoring.intoStuds }
			: undefined,
		seismicRegion: c.seismicRegion
	};
}
