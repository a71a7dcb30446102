/**
 * A fixed set of solver, analysis and case requests (SI, already validated) over materials,
 * supports, limits, durations, strips and load shapes. tests/engine/solver-answers.json holds what
 * the engine answered for them before the solvers were rewritten for speed (issue 12); the test
 * beside it checks the answers stay the same within each solver's stated tolerance.
 * Regenerate the answers only on purpose: `npx tsx tests/engine/support/solver-answers.ts`.
 */
import {
	DEFAULT_SHELF_OPTIONS,
	analyzeInput,
	checkCaseSI,
	maxLoadInput,
	maxSpanInput,
	minEdgeInput,
	minThicknessInput,
	type CaseDesign,
	type ShelfInput
} from '../../../src/lib/engine';
import { caseDesignSchema, type CaseDesignInput } from '../../../src/lib/schemas/case';

type Support = ShelfInput['support'];
type Limit = ShelfInput['limit'];

const oak = 'red-oak';
const custom = {
	name: 'a board of our own',
	modulus: 9e9,
	rupture: 6e7,
	density: 550
};
const materials: ShelfInput['material'][] = [
	oak,
	'mdf',
	'hardwood-plywood-veneer-core',
	'particleboard-m2',
	'melamine-particleboard',
	custom
];
const supports: Support[] = [
	'simple',
	'fixed',
	'cantilever',
	{ spans: [1, 2], ends: 'simple' },
	{ spans: [1, 1, 1], ends: 'fixed' }
];
const limits: Limit[] = ['L/144', 'L/240', '1/16in-per-ft', { ratio: 360 }, { length: 0.004 }];

/** A small deterministic generator, so the set is the same on every machine. */
function* picks(seed: number) {
	let s = seed >>> 0;
	for (;;) {
		s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
		yield s / 2 ** 32;
	}
}

export function shelfCases(count: number, seed = 7): ShelfInput[] {
	const r = picks(seed);
	const next = () => r.next().value as number;
	const pick = <T>(xs: T[]): T => xs[Math.floor(next() * xs.length)];
	const out: ShelfInput[] = [];
	for (let i = 0; i < count; i++) {
		const material = pick(materials);
		const support = pick(supports);
		const span = 0.3 + next() * 1.2;
		const strip =
			next() < 0.3
				? [
						{
							side: 'front' as const,
							material: oak,
							height: 0.02 + next() * 0.04,
							thickness: 0.019
						}
					]
				: [];
		const loads: ShelfInput['loads'] =
			next() < 0.7
				? [{ kind: 'area', pressure: 300 + next() * 3000 }]
				: [{ kind: 'line', intensity: 50 + next() * 600 }];
		out.push({
			span: typeof support === 'object' ? undefined : span,
			depth: 0.2 + next() * 0.4,
			thickness: pick([0.0127, 0.016, 0.019, 0.0254]),
			material,
			grain: 'along',
			support,
			loads,
			selfWeight: next() < 0.85,
			edges: strip,
			duration: next() < 0.75 ? 'long' : 'short',
			service: pick(['dry', 'dry', 'humid'] as const),
			limit: pick(limits),
			options: { ...DEFAULT_SHELF_OPTIONS, shearDeflection: next() < 0.85 }
		});
	}
	return out;
}

type Answer = Record<string, unknown> | { error: (string | number)[][] };

function attempt(fn: () => Record<string, unknown>): Answer {
	try {
		return fn();
	} catch (e) {
		if (e instanceof Error && 'issues' in e)
			return { error: (e.issues as { path: (string | number)[] }[]).map((i) => i.path) };
		throw e;
	}
}

const withoutSpan = (s: ShelfInput) => ({ ...s, span: undefined });

/** The requests of each solver, derived from shelfCases with their own seeds. */
export function solverRequests() {
	const loadShapes = [
		{ kind: 'area' as const },
		{ kind: 'line' as const, from: 0.05, to: 0.25 },
		{ kind: 'point' as const, at: 0.2 }
	];
	return {
		maxSpan: shelfCases(48, 11).map(withoutSpan),
		minThickness: shelfCases(36, 12).map((s) => ({
			...s,
			thickness: undefined,
			candidates: typeof s.material === 'object' ? [0.012, 0.016, 0.019, 0.025, 0.032] : undefined
		})),
		minEdge: shelfCases(36, 13).map((s) => ({
			...s,
			edges: [],
			strip: { side: 'front' as const, material: 'red-oak', thickness: 0.019 }
		})),
		maxLoad: shelfCases(36, 14).map((s, i) => ({ ...s, load: loadShapes[i % 3] })),
		analyze: shelfCases(24, 15)
	};
}

const every10th = (curve: [number, number][]) => curve.filter((_, i) => i % 10 === 0);

export function answersOf() {
	const q = solverRequests();
	return {
		maxSpan: q.maxSpan.map((s) =>
			attempt(() => {
				const r = maxSpanInput(s);
				return { span: r.span, spans: r.spans, capped: r.capped, margin: r.analysis.limit.margin };
			})
		),
		minThickness: q.minThickness.map((s) =>
			attempt(() => {
				const r = minThicknessInput(s);
				return { thickness: r.thickness, label: r.label, exact: r.exact, tried: r.tried };
			})
		),
		minEdge: q.minEdge.map((s) =>
			attempt(() => {
				const r = minEdgeInput(s);
				return {
					needed: r.needed,
					height: r.height,
					heightRounded: r.heightRounded,
					pass: r.analysis?.limit.pass ?? null
				};
			})
		),
		maxLoad: q.maxLoad.map((s) =>
			attempt(() => {
				const r = maxLoadInput(s);
				return {
					magnitude: r.magnitude,
					total: r.total,
					byDeflection: r.byDeflection,
					byStrength: r.byStrength,
					governs: r.governs
				};
			})
		),
		analyze: q.analyze.map((s) =>
			attempt(() => {
				const r = analyzeInput(s);
				return { ...r, curve: every10th(r.curve) };
			})
		),
		checkCase: caseDesigns().map((d) =>
			attempt(() => {
				const r = checkCaseSI(d);
				return {
					pass: r.pass,
					summary: r.summary,
					shelves: r.shelves.map((s) => ({
						path: s.path,
						pass: s.pass,
						sag: s.analysis.sag,
						limit: s.analysis.limit,
						strength: s.analysis.strength,
						reactions: s.analysis.reactions
					})),
					joints: r.joints.map((j) => ({ id: j.id, count: j.plan.count, pass: j.plan.pass })),
					stability: {
						centreOfGravity: r.stability.centreOfGravity,
						tipForceAtTopN: r.stability.tipForceAtTopN
					},
					margins: r.margins,
					suggestions: r.suggestions,
					parts: r.parts
				};
			})
		)
	};
}

/** A 96"-tall library case, 36" wide, 12 shelves (every fourth fixed): the bench's case, with the
 * same load on every shelf, a different load on each, and a wider, heavier one that fails more. */
export function caseDesigns(): CaseDesign[] {
	const twelve = (pressure: (i: number) => string, width = '36"'): CaseDesignInput => ({
		name: 'Library wall, bay 1',
		width,
		height: '96"',
		depth: '12"',
		sides: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
		back: { material: 'hardwood-plywood-veneer-core', thickness: '1/4"' },
		shelves: Array.from({ length: 12 }, (_, i) => ({
			height: `${8 + i * 7}"`,
			kind: i % 4 === 3 ? ('fixed' as const) : ('adjustable' as const),
			joint: 'pocket-screw' as const,
			loads: [{ kind: 'area' as const, pressure: pressure(i) }]
		})),
		faceFrame: {
			material: 'red-oak',
			thickness: '3/4"',
			stileWidth: '1 1/2"',
			railWidth: '2 1/2"'
		},
		base: { height: '4"', setback: '3"' },
		anchoring: { kind: 'bracket', intoStuds: true }
	});
	return [
		twelve(() => '40 lbf/ft^2'),
		twelve((i) => `${20 + i * 2} lbf/ft^2`),
		twelve((i) => `${30 + i * 3} lbf/ft^2`, '48"'),
		twelve(() => '15 lbf/ft^2', '24"')
	].map((d) => caseDesignSchema.parse(d));
}
