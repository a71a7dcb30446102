/**
 * Inverse questions: the longest span, the thinnest stocked thickness, the smallest front strip
 * and the largest load that meet the limit. Each runs the whole analysis (bending, shear, creep,
 * self-weight) inside a bracketed root find, so none is a closed-form shortcut.
 */
import { maxMoment } from './beam';
import { analyzeInput, checkSpans, marginOfModel, solveShelf } from './analyze';
import { InputError } from '../errors';
import { buildModel, relayOut, type ShelfModel } from './model';
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

/**
 * Root of g on [a, b] where g(a) and g(b) differ in sign: regula falsi with the Illinois
 * correction, falling back to bisection when a step would not shrink the bracket enough.
 */
export function bracketedRoot(
	g: (x: number) => number,
	a: number,
	b: number,
	tolerance: number,
	ga = g(a),
	gb = g(b)
): number {
	if (ga === 0) return a;
	if (gb === 0) return b;
	if (ga * gb > 0) throw new Error('bracketedRoot: the bracket holds no sign change');
	let side = 0;
	for (let i = 0; i < 200 && Math.abs(b - a) > tolerance; i++) {
		let c = (a * gb - b * ga) / (gb - ga);
		const width = Math.abs(b - a);
		if (!(c > Math.min(a, b) && c < Math.max(a, b)) || i % 8 === 7) c = (a + b) / 2;
		const gc = g(c);
		if (gc === 0) return c;
		if (gc * gb > 0) {
			b = c;
			gb = gc;
			if (side === -1) ga /= 2;
			side = -1;
		} else {
			a = c;
			ga = gc;
			if (side === 1) gb /= 2;
			side = 1;
		}
		if (Math.abs(b - a) > 0.9 * width && i % 8 !== 7) {
			// a slow step: the next pass bisects
			side = 0;
		}
	}
	// the side that passes (g ≥ 0)
	return ga >= 0 ? a : b;
}

/** Governing margin of a validated input: positive passes. */
export function marginOf(input: ShelfInput): number {
	return marginOfModel(buildModel(input));
}

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
	const baseTotal = base.reduce((a, b) => a + b, 0);
	const at = (total: number): ShelfInput => {
		const s = total / baseTotal;
		if (typeof input.support === 'object')
			return {
				...input,
				span: undefined,
				support: { ...input.support, spans: base.map((b) => b * s) }
			};
		return { ...input, span: total };
	};
	// the section, materials and limit do not hang on the span: build them once
	const model = buildModel(at(1));
	const g = (total: number) => marginOfModel(relayOut(model, at(total)));
	let lo = 0.01;
	const glo = g(lo);
	if (glo < 0)
		throw new InputError([
			{
				path: ['thickness'],
				message: 'Even a 10 mm span does not meet the limit: check the figures.'
			}
		]);
	let hi = 0.5;
	let ghi = g(hi);
	while (ghi >= 0 && hi < MAX_SPAN_M) {
		lo = hi;
		hi = Math.min(hi * 2, MAX_SPAN_M);
		ghi = g(hi);
	}
	const capped = ghi >= 0;
	const span = capped ? MAX_SPAN_M : bracketedRoot(g, lo, hi, 1e-5, g(lo), ghi);
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
	const lib = buildModel({ ...input, thickness: 0.019 }).panel;
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
	const tried: ThicknessTrial[] = [];
	let chosen: (typeof candidates)[number] | undefined;
	for (const c of candidates) {
		const check = checkSpans(solveShelf(buildModel({ ...input, thickness: c.thickness })));
		const g = check.governing;
		tried.push({
			thickness: c.thickness,
			label: c.label,
			sag: g.sag,
			allowed: g.allowed,
			pass: check.spans.every((s) => s.pass)
		});
		if (tried[tried.length - 1].pass) {
			chosen = c;
			break;
		}
	}
	const g = (t: number) => marginOf({ ...input, thickness: t });
	const lo = 0.001;
	const hi = 0.3;
	const glo = g(lo);
	const ghi = g(hi);
	const exact = glo >= 0 ? lo : ghi < 0 ? null : bracketedRoot(g, lo, hi, 1e-6, glo, ghi);
	return {
		thickness: chosen?.thickness ?? null,
		label: chosen?.label ?? null,
		exact,
		tried,
		analysis: chosen ? analyzeInput({ ...input, thickness: chosen.thickness }) : null
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
	const withStrip = (h: number): ShelfInput => ({
		...input,
		edges: [
			...others,
			{ side: strip.side, material: strip.material, thickness: strip.thickness, height: h }
		]
	});
	const bare: ShelfInput = { ...input, edges: others };
	if (marginOf(bare) >= 0)
		return { needed: false, height: 0, heightRounded: 0, analysis: analyzeInput(bare) };
	const maxHeight = strip.maxHeight ?? 6 * INCH; // 6": taller strips are aprons, not nosings
	const g = (h: number) => marginOf(withStrip(h));
	const lo = 0.0005;
	const glo = g(lo);
	const ghi = g(maxHeight);
	if (ghi < 0) return { needed: true, height: null, heightRounded: null, analysis: null };
	const height = glo >= 0 ? lo : bracketedRoot(g, lo, maxHeight, 1e-6, glo, ghi);
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
	const at = (x: number): ShelfInput => ({ ...input, loads: [...input.loads, loadOf(x)] });
	// the section, materials and limit do not hang on the load: build them once
	const base = buildModel(at(0));
	const modelAt = (x: number): ShelfModel => relayOut(base, at(x));
	const utilisation = (x: number) => {
		const model = modelAt(x);
		const solved = solveShelf(model);
		const m = maxMoment(solved.all).moment;
		const stresses = partStresses(model.section, m);
		let u = 0;
		stresses.forEach(
			(s, i) =>
				(u = Math.max(u, s / (model.section.parts[i].rupturePa / input.options.safetyFactor)))
		);
		return u;
	};
	const deflection = (x: number) => marginOfModel(modelAt(x));
	const strength = (x: number) => 1 - utilisation(x);
	const solveFor = (g: (x: number) => number) => {
		const g0 = g(0);
		if (g0 < 0) return 0;
		let lo = 0;
		let glo = g0;
		let hi = shape.kind === 'area' ? 500 : shape.kind === 'line' ? 500 : 100; // SI: Pa, N/m, N
		let ghi = g(hi);
		while (ghi >= 0 && hi < 1e7) {
			lo = hi;
			glo = ghi;
			hi *= 4;
			ghi = g(hi);
		}
		if (ghi >= 0) return hi;
		return bracketedRoot(g, lo, hi, 1e-7 * hi, glo, ghi);
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
