/**
 * Inverse questions: the longest span, the thinnest stocked thickness, the smallest front strip
 * and the largest load that meet the limit. Each runs the whole analysis (bending, shear, creep,
 * self-weight) inside a bracketed root find, so none is a closed-form shortcut. The closed forms
 * only give each search its starting estimate (shelf/root.ts grows a bracket from it).
 *
 * Speed (issue 12): a try never builds a request; it lays the model out again with its own spans,
 * thickness, strips or loads (buildModel's and relayOut's arguments).
 */
import { maxMoment } from './beam';
import {
	analyzeInput,
	checkPieces,
	instantSolution,
	longTermPieces,
	marginOfModel
} from './analyze';
import { InputError } from '../errors';
import { buildModel, relayOut, spansOf, type ShelfModel } from './model';
import { bracketedRoot, rootNear } from './root';
import { partStresses } from './section';
import type {
	MaxLoadInput,
	MaxSpanInput,
	MinEdgeInput,
	MinThicknessInput,
	ShelfInput,
	ShelfResult
} from './types';
import { METRES_PER_INCH } from '../units/length';

const INCH = METRES_PER_INCH;
const MAX_SPAN_M = 10;
const MIN_SPAN_M = 0.01;

function rejectPositioned(input: { loads: ShelfInput['loads'] }, what: string) {
	const issues = input.loads.flatMap((l, i) =>
		l.kind === 'point' || (l.kind === 'line' && (l.from !== undefined || l.to !== undefined))
			? [
					{
						path: ['loads', i],
						message: `Loads at a position depend on the span, so ${what} takes area loads and full-length line loads only. Give the span and ask for the largest load instead.`
					}
				]
			: []
	);
	if (issues.length) throw new InputError(issues);
}

export interface MaxSpanResult {
	/** longest total length that meets the limit, m (10 m at most) */
	span: number;
	/** the spans at that length (several spans keep their proportions) */
	spans: number[];
	/** true when even the longest span tried (10 m) meets the limit */
	capped: boolean;
	analysis: ShelfResult;
}

/** The longest span that meets the limit (for several spans: their common scale). */
export function maxSpanInput(input: MaxSpanInput): MaxSpanResult {
	rejectPositioned(input, 'the longest-span search');
	const base = typeof input.support === 'object' ? input.support.spans : [1];
	let baseTotal = 0;
	for (const b of base) baseTotal += b;
	const spansAt = (total: number) => {
		const s = total / baseTotal;
		const out = new Array<number>(base.length);
		for (let i = 0; i < base.length; i++) out[i] = base[i] * s;
		return out;
	};
	// a request parsed without a span has no span key: give it one first, so each try below only
	// overrides keys (adding a key to a spread copy is slow on Node 20, issue 12)
	const withSpan: ShelfInput = 'span' in input ? input : { span: undefined, ...input };
	const at = (total: number): ShelfInput =>
		typeof withSpan.support === 'object'
			? { ...withSpan, span: undefined, support: { ...withSpan.support, spans: spansAt(total) } }
			: { ...withSpan, span: total };
	// the section, materials and limit do not hang on the span: build them once
	const model = buildModel(at(1));
	const g = (total: number) => marginOfModel(relayOut(model, spansAt(total)));
	// closed-form start: under a uniform load the sag grows as L⁴ and an L/n limit as L, so
	// sag/allowed grows as L³ from its value at 1 m
	const r1 = 1 - g(1);
	const estimate = r1 > 0 ? Math.cbrt(1 / r1) : MAX_SPAN_M;
	const found = rootNear(g, estimate, MIN_SPAN_M, MAX_SPAN_M, 1e-5, false, 1.005);
	if (!found.found && found.bound === 'min')
		throw new InputError([
			{
				path: ['thickness'],
				message: 'Even a 10 mm span does not meet the limit: check the figures.'
			}
		]);
	const capped = !found.found;
	const span = found.x;
	const final = at(span);
	return {
		span,
		spans: typeof final.support === 'object' ? final.support.spans : [span],
		capped,
		analysis: analyzeInput(final)
	};
}

export interface ThicknessTrial {
	thickness: number;
	label: string;
	sag: number;
	allowed: number;
	pass: boolean;
}

export interface MinThicknessResult {
	/** thinnest candidate that meets the limit, m; null when none does */
	thickness: number | null;
	label: string | null;
	/** the thickness that would just meet it, ignoring what is sold, m; null above 300 mm */
	exact: number | null;
	tried: ThicknessTrial[];
	analysis: ShelfResult | null;
}

/** The thinnest stocked (or given) thickness that meets the limit. */
export function minThicknessInput(input: MinThicknessInput): MinThicknessResult {
	// the request with a thickness in it (tried, then replaced by each candidate's)
	// key first, then set: a request parsed without a thickness has no thickness key, and adding a
	// key to a spread copy is slow on Node 20 (issue 12)
	const shelf: ShelfInput = { thickness: 0.019, ...input } as ShelfInput;
	shelf.thickness = 0.019;
	const lib = buildModel(shelf).panel;
	const candidates = (
		input.candidates?.map((t) => ({ thickness: t, label: `${(t * 1000).toFixed(1)} mm` })) ??
		lib.thicknesses.map((t) => ({ thickness: t.actualM, label: t.label }))
	).sort((a, b) => a.thickness - b.thickness);
	if (!candidates.length)
		throw new InputError([
			{
				path: ['candidates'],
				message:
					'A material given by its figures has no stocked thicknesses: expected a list of candidate thicknesses.'
			}
		]);
	const g = (t: number) => marginOfModel(buildModel(shelf, t));
	const tried: ThicknessTrial[] = [];
	let chosen: (typeof candidates)[number] | undefined;
	// the last candidate that failed and the first that passed bracket the exact thickness
	let below: { t: number; g: number } | undefined;
	let above: { t: number; g: number } | undefined;
	for (const c of candidates) {
		const model = buildModel(shelf, c.thickness);
		const check = checkPieces(model, longTermPieces(model));
		const gov = check.governing;
		const pass = check.spans.every((s) => s.pass);
		tried.push({
			thickness: c.thickness,
			label: c.label,
			sag: gov.sag,
			allowed: gov.allowed,
			pass
		});
		if (pass) {
			chosen = c;
			above = { t: c.thickness, g: check.margin };
			break;
		}
		below = { t: c.thickness, g: check.margin };
	}
	const lo = 0.001;
	const hi = 0.3;
	let exact: number | null;
	if (below && above && below.g < 0 && above.g >= 0)
		exact = bracketedRoot(g, below.t, above.t, 1e-6, below.g, above.g);
	else {
		// closed-form start: sag falls as 1/t³, so t·(sag/allowed)^(1/3) just meets the limit
		const near = above ?? below!;
		const estimate = near.g < 1 ? near.t * Math.cbrt(1 - near.g) : lo;
		const found = rootNear(g, estimate, lo, hi, 1e-6, true, 1.01);
		exact = found.found ? found.x : found.bound === 'min' ? lo : null;
	}
	return {
		thickness: chosen?.thickness ?? null,
		label: chosen?.label ?? null,
		exact,
		tried,
		analysis: chosen ? analyzeInput({ ...shelf, thickness: chosen.thickness }) : null
	};
}

export interface MinEdgeResult {
	/** false when the shelf meets the limit without a strip */
	needed: boolean;
	/** smallest strip height that meets the limit, m; null when even the tallest tried fails */
	height: number | null;
	/** that height rounded up to the next 1/16", m */
	heightRounded: number | null;
	analysis: ShelfResult | null;
}

/** The smallest height of a strip (of given material and thickness) that makes the shelf meet it. */
export function minEdgeInput(input: MinEdgeInput): MinEdgeResult {
	const { strip } = input;
	const others = input.edges.filter((e) => e.side !== strip.side);
	const edgesWith = (h: number) => [
		...others,
		{ side: strip.side, material: strip.material, thickness: strip.thickness, height: h }
	];
	const withStrip = (h: number): ShelfInput => ({ ...input, edges: edgesWith(h) });
	const bare: ShelfInput = { ...input, edges: others };
	const g0 = marginOfModel(buildModel(bare));
	if (g0 >= 0) return { needed: false, height: 0, heightRounded: 0, analysis: analyzeInput(bare) };
	const maxHeight = strip.maxHeight ?? 6 * INCH; // 6": taller strips are aprons, not nosings
	const g = (h: number) => marginOfModel(buildModel(input, input.thickness, edgesWith(h)));
	const lo = 0.0005;
	// closed-form start: the strip must add the stiffness the bare shelf lacks, EI·(sag/allowed − 1);
	// a strip of height h adds about E·b·h³/12 (more once it stands below the panel's axis)
	const bareModel = buildModel(bare);
	const need = bareModel.section.ei * -g0;
	const stripModel = buildModel(input, input.thickness, edgesWith(INCH));
	const perCube = Math.max(1e-9, stripModel.section.ei - bareModel.section.ei) / INCH ** 3;
	const estimate = Math.cbrt(need / perCube);
	const found = rootNear(g, estimate, lo, maxHeight, 1e-6, true, 1.01);
	if (!found.found && found.bound === 'max')
		return { needed: true, height: null, heightRounded: null, analysis: null };
	const height = found.x;
	let rounded = Math.ceil(height / (INCH / 16) - 1e-9) * (INCH / 16);
	if (g(rounded) < 0) rounded += INCH / 16;
	return {
		needed: true,
		height,
		heightRounded: rounded,
		analysis: analyzeInput(withStrip(rounded))
	};
}

export interface MaxLoadResult {
	/** largest magnitude of the load: Pa (area), N/m (line) or N (point) */
	magnitude: number;
	/** the same as a total force on the shelf, N */
	total: number;
	/** largest magnitude by the sag limit, and by bending strength with the safety factor */
	byDeflection: number;
	byStrength: number;
	governs: 'deflection' | 'strength';
	analysis: ShelfResult;
}

/** The largest magnitude of one load of a given shape that the shelf carries within the limit. */
export function maxLoadInput(input: MaxLoadInput): MaxLoadResult {
	const shape = input.load;
	const loadOf = (x: number): ShelfInput['loads'][number] =>
		shape.kind === 'area'
			? { kind: 'area', pressure: x }
			: shape.kind === 'line'
				? { kind: 'line', intensity: x, from: shape.from, to: shape.to }
				: { kind: 'point', force: x, at: shape.at };
	const loadsAt = (x: number) => [...input.loads, loadOf(x)];
	const at = (x: number): ShelfInput => ({ ...input, loads: loadsAt(x) });
	// the section, materials, spans and limit do not hang on the load: build them once
	const base = buildModel(at(0));
	const spans = spansOf(base.input);
	const modelAt = (x: number): ShelfModel => relayOut(base, spans, loadsAt(x));
	const allowedStress = base.section.parts.map((p) => p.rupturePa / input.options.safetyFactor);
	const utilisation = (x: number) => {
		const model = modelAt(x);
		const m = maxMoment(instantSolution(model)).moment;
		const stresses = partStresses(model.section, m);
		let u = 0;
		for (let i = 0; i < stresses.length; i++) u = Math.max(u, stresses[i] / allowedStress[i]);
		return u;
	};
	const deflection = (x: number) => marginOfModel(modelAt(x));
	const strength = (x: number) => 1 - utilisation(x);
	// the first try (SI: Pa, N/m, N) and the largest magnitude searched (the first try × 4ⁿ ≥ 10⁷)
	const first = shape.kind === 'point' ? 100 : 500;
	let cap = first;
	while (cap < 1e7) cap *= 4;
	const solveFor = (g: (x: number) => number) => {
		const g0 = g(0);
		if (g0 < 0) return 0;
		// closed-form start: sag and moment grow in proportion to the load, so g is a straight
		// line through its values at 0 and at the first try (exactly so while the peak stays put)
		const g1 = g(first);
		const estimate = g1 < g0 ? (first * g0) / (g0 - g1) : cap;
		const found = rootNear(g, estimate, 1e-9 * first, cap, 1e-7 * estimate, false, 1.0001);
		return found.found ? found.x : found.bound === 'max' ? cap : found.x;
	};
	const byDeflection = solveFor(deflection);
	const byStrength = solveFor(strength);
	const magnitude = Math.min(byDeflection, byStrength);
	const analysis = analyzeInput(at(magnitude));
	const loadLength =
		shape.kind === 'line'
			? Math.min(shape.to ?? analysis.span, analysis.span) - (shape.from ?? 0)
			: analysis.span;
	const total =
		shape.kind === 'area'
			? magnitude * input.depth * analysis.span
			: shape.kind === 'line'
				? magnitude * Math.max(0, loadLength)
				: magnitude;
	return {
		magnitude,
		total,
		byDeflection,
		byStrength,
		governs: byDeflection <= byStrength ? 'deflection' : 'strength',
		analysis
	};
}
