/**
 * The analysis of one shelf: sags instant and long-term, the checks per span, moments, stress,
 * reactions, the curve and the cautions.
 */
import { AWS_MAX_LOAD_PER_SHELF_LB } from '../../../../reference/materials';
import {
	addSagPieces,
	breakPoints,
	maxMoment,
	pieceAt,
	piecesAt,
	reactions,
	sagAt,
	segmentOf,
	segmentPeak,
	solveAgain,
	solveBeam,
	totalLoad,
	type BeamLoads,
	type BeamModel,
	type BeamSolution,
	type SagPieces,
	withoutShear
} from './beam';
import { InputError } from '../errors';
import { buildModel, isStocked, type ShelfModel } from './model';
import { NEWTONS_PER_LBF } from '../units/si';
import { partStresses } from './section';
import type {
	SafeResult,
	ShelfInput,
	InputIssue,
	ShelfResult,
	ShelfWarning,
	SpanCheck
} from './types';
import { ENGINE_VERSION } from '../version';

function merge(a: BeamLoads, b: BeamLoads): BeamLoads {
	return { points: [...a.points, ...b.points], udls: [...a.udls, ...b.udls] };
}

/** The solved beams a shelf needs: everything else is read from them. */
export interface Solved {
	model: ShelfModel;
	all: BeamSolution;
	/** the shelf's own weight alone on the instant beam; null when it weighs nothing */
	selfWeightInstant: BeamSolution | null;
	/** the governing sag as one quartic per segment (see SagPieces) */
	pieces: SagPieces;
	/** sag that governs: instant sag plus creep under the permanent load */
	longTerm: (x: number) => number;
	creepApplies: boolean;
}

/** A beam of the model's supports with the given stiffnesses (written out in full: spreading an
 * object while adding keys is slow on the hot path of the solvers). */
function beamOf(model: ShelfModel, ei: number, ga: number): BeamModel {
	return { length: model.length, left: model.left, right: model.right, inner: model.inner, ei, ga };
}

function beamsOf(model: ShelfModel): { instant: BeamModel; creep: BeamModel; loads: BeamLoads } {
	const { section, input } = model;
	const shear = input.options.shearDeflection;
	return {
		instant: beamOf(model, section.ei, shear ? section.ga : Infinity),
		creep: beamOf(model, section.eiLongTerm, shear ? section.gaLongTerm : Infinity),
		loads: merge(model.applied, model.selfWeight)
	};
}

/** The instant beam under all the loads: what a strength search needs on every step. */
export function instantSolution(model: ShelfModel): BeamSolution {
	const { instant, loads } = beamsOf(model);
	return solveBeam(instant, loads);
}

/**
 * k_def when every part of the section creeps alike (one board, or strips of the same creep
 * figure) on a beam without inner supports, else null. Then the long-term beam is the instant beam with EI and κGA both divided by
 * 1 + k_def: the same moments and shears, every sag times 1 + k_def, so it is the instant beam
 * scaled, not a second solve.
 */
export function uniformCreep(model: ShelfModel): number | null {
	// over dividers the long-term beam is still solved: there a span that lifts has its largest
	// sag at a support, zero to rounding, and which end it is hangs on that rounding (the stored
	// answers of tests/engine/solver-answers.json keep theirs)
	if (model.inner.length > 0) return null;
	const { parts } = model.section;
	const k = parts[0].kdef;
	for (let i = 1; i < parts.length; i++) if (parts[i].kdef !== k) return null;
	return k;
}

/**
 * The solved beams of a shelf. `general` solves the long-term beam even when it is the instant
 * one scaled (tests/engine/shelf-shortcuts.property.test.ts compares the two ways).
 */
export function solveShelf(model: ShelfModel, general = false): Solved {
	const { instant, creep, loads } = beamsOf(model);
	const all = solveBeam(instant, loads);
	const perm = model.selfWeight;
	// the same beam under its own weight alone: its equations are factored already
	const selfWeightInstant = totalLoad(perm) > 0 ? solveAgain(instant, perm) : null;
	const xs = breakPoints(instant, loads);
	const c = new Float64Array(5 * Math.max(0, xs.length - 1));
	const pieces = { xs, c };
	const longTerm = (x: number) => piecesAt(pieces, x);
	const k = general ? null : uniformCreep(model);
	// Creep acts on the permanent load: the shelf's own weight always, the contents when the
	// duration is long (EN 1995-1-1 §2.3.2.2: final = instant × (1 + k_def) under permanent load).
	if (model.input.duration === 'long') {
		if (k === null) addSagPieces(solveBeam(creep, loads), xs, c);
		else addSagPieces(all, xs, c, 1 + k);
		const creepApplies = totalLoad(loads) > 0;
		return { model, all, selfWeightInstant, pieces, longTerm, creepApplies };
	}
	addSagPieces(all, xs, c);
	if (!selfWeightInstant)
		return { model, all, selfWeightInstant, pieces, longTerm, creepApplies: false };
	if (k !== null) addSagPieces(selfWeightInstant, xs, c, k);
	else {
		addSagPieces(solveBeam(creep, perm), xs, c);
		addSagPieces(selfWeightInstant, xs, c, -1);
	}
	return { model, all, selfWeightInstant, pieces, longTerm, creepApplies: true };
}

/**
 * Only the governing sag of solveShelf, as pieces: what a solver needs on every step. Under long
 * duration one solve (the long-term beam, or the instant one scaled when the section creeps alike);
 * otherwise, when it creeps alike, the creep under the shelf's own weight is its instant sag × k_def.
 */
export function longTermPieces(model: ShelfModel): SagPieces {
	const { instant, creep, loads } = beamsOf(model);
	const xs = breakPoints(instant, loads);
	const c = new Float64Array(5 * Math.max(0, xs.length - 1));
	// the same arithmetic as solveShelf's, so that a solver's answer passes its analysis
	const k = uniformCreep(model);
	if (model.input.duration === 'long') {
		if (k === null) addSagPieces(solveBeam(creep, loads), xs, c);
		else addSagPieces(solveBeam(instant, loads), xs, c, 1 + k);
		return { xs, c };
	}
	addSagPieces(solveBeam(instant, loads), xs, c);
	const perm = model.selfWeight;
	if (totalLoad(perm) === 0) return { xs, c };
	const permInstant = solveAgain(instant, perm);
	if (k !== null) {
		addSagPieces(permInstant, xs, c, k);
		return { xs, c };
	}
	addSagPieces(solveBeam(creep, perm), xs, c);
	addSagPieces(permInstant, xs, c, -1);
	return { xs, c };
}

export interface Check {
	spans: SpanCheck[];
	governing: SpanCheck;
	/** (allowed − sag) / allowed of the governing span */
	margin: number;
}

/**
 * Largest sag of the pieces between x0 and x1 (both break points) and where. Segments are read
 * left to right; the first of equal peaks is kept.
 */
function spanPeak(pieces: SagPieces, x0: number, x1: number): { x: number; y: number } {
	const { xs, c } = pieces;
	let i = segmentOf(xs, x0);
	let bestX = x0;
	let best = -Infinity;
	for (; i < xs.length - 1 && xs[i] < x1; i++) {
		const p = segmentPeak(c, i, xs[i + 1] - xs[i]);
		if (p.y > best) {
			best = p.y;
			bestX = xs[i] + p.t;
		}
	}
	return { x: bestX, y: best };
}

/** Margin of the governing span only: what the solvers iterate on. */
export function marginOfModel(model: ShelfModel): number {
	const pieces = longTermPieces(model);
	let x0 = 0;
	let margin = Infinity;
	for (const l of model.spans) {
		const sag = Math.max(0, spanPeak(pieces, x0, x0 + l).y);
		const allowed = model.limit.allowed(l);
		const m = (allowed - sag) / allowed;
		if (m < margin) margin = m;
		x0 += l;
	}
	return margin;
}

/** Each span's largest long-term sag against the limit; the governing one has the least margin. */
export function checkSpans(solved: Solved): Check {
	return checkPieces(solved.model, solved.pieces);
}

/** checkSpans on the governing sag's pieces alone (longTermPieces): what a solver needs. */
export function checkPieces(model: ShelfModel, pieces: SagPieces): Check {
	const spans: SpanCheck[] = [];
	let x0 = 0;
	let governing: SpanCheck | undefined;
	let margin = Infinity;
	for (const l of model.spans) {
		const p = spanPeak(pieces, x0, x0 + l);
		const allowed = model.limit.allowed(l);
		const sag = Math.max(0, p.y);
		const check = { from: x0, to: x0 + l, sag, at: p.x, allowed, pass: sag <= allowed };
		const m = (allowed - sag) / allowed;
		if (m < margin) {
			margin = m;
			governing = check;
		}
		spans.push(check);
		x0 += l;
	}
	return { spans, governing: governing!, margin };
}

function strengthOf(model: ShelfModel, moment: number) {
	const sf = model.input.options.safetyFactor;
	const stresses = partStresses(model.section, moment);
	let gi = 0;
	let use = -1;
	for (let i = 0; i < stresses.length; i++) {
		const u = stresses[i] / (model.section.parts[i].rupturePa / sf);
		if (u > use) {
			use = u;
			gi = i;
		}
	}
	const part = model.section.parts[gi];
	return {
		panelStress: stresses[0],
		strength: {
			rupture: part.rupturePa,
			safetyFactor: sf,
			allowed: part.rupturePa / sf,
			utilisation: use,
			pass: use <= 1,
			governing: part.name
		}
	};
}

function cautions(model: ShelfModel, utilisation: number, uplift: boolean): ShelfWarning[] {
	const { input, panel } = model;
	const out: ShelfWarning[] = [...model.warnings];
	const applied = totalLoad(model.applied);
	if (applied > AWS_MAX_LOAD_PER_SHELF_LB * NEWTONS_PER_LBF)
		out.push({
			code: 'over-200-lb',
			message:
				'The load is more than 200 lb on one shelf, beyond what the woodwork standard allows for any single shelf.',
			source: 'Architectural Woodwork Standards (AWI/AWMAC/WI, 2009) §1.2.21.2'
		});
	if (
		input.grain === 'across' &&
		panel.kind === 'panel' &&
		panel.modulusAcrossPa! < panel.modulusAlongPa
	)
		out.push({
			code: 'across-grain',
			message: `The face grain runs across the span: ${panel.name} is only about ${Math.round((100 * panel.modulusAcrossPa!) / panel.modulusAlongPa)}% as stiff that way. Turn the grain along the span if you can.`,
			source: 'see the material’s stiffness source'
		});
	const fixed = model.left === 'fixed' && model.right === 'fixed';
	if (fixed)
		out.push({
			code: 'fixed-ends',
			message:
				'Fixed ends assume joints that do not rotate at all. Real glued or screwed joints are only partly fixed, so the true sag lies between this and a simply supported shelf: check that case too.'
		});
	if (model.left === 'fixed' && model.right === 'free')
		out.push({
			code: 'cantilever',
			message:
				'A wall-hung shelf is only as good as its brackets and anchors: this checks the board, not the fixing. Fix into studs or solid blocking, never into drywall alone, and follow the bracket maker’s rating.'
		});
	if (utilisation > 1)
		out.push({
			code: 'overstressed',
			message: `The bending stress is ${utilisation.toFixed(1)} times what is allowed with the stated safety factor: the shelf could crack or break. Do not load it so.`,
			source: 'modulus of rupture of the material divided by the safety factor'
		});
	if (uplift)
		out.push({
			code: 'uplift',
			message:
				'Part of the shelf lifts off a support under this load. A loose shelf could tip or slide off its supports: fix it down or spread the load.'
		});
	if (!isStocked(model))
		out.push({
			code: 'thickness-not-stocked',
			message: `This thickness is not one ${panel.name} is commonly sold in; the material’s general figures were used.`
		});
	out.push({
		code: 'estimate',
		message:
			'These are estimates from average published material figures and beam theory. Real boards vary, and knots, joints and moisture change the result. For shelving that could hurt someone if it failed, follow local building codes and ask a licensed professional.'
	});
	return out;
}

/** Where the shelf rests, left to right (a cantilever's free end is none). */
function supportsOf(model: ShelfModel): number[] {
	const out = [0];
	for (let i = 0; i < model.inner.length; i++) out.push(model.inner[i]);
	if (model.right !== 'free') out.push(model.length);
	return out;
}

function allPass(spans: SpanCheck[]): boolean {
	for (let i = 0; i < spans.length; i++) if (!spans[i].pass) return false;
	return true;
}

/** Points at which a result looks for uplift (a shelf lifting off a support), however few points
 * its curve has: the default curve's (101). */
const UPLIFT_POINTS = 101;

/** The whole result from a validated request. */
export function analyzeInput(input: ShelfInput): ShelfResult {
	const model = buildModel(input);
	const solved = solveShelf(model);
	const check = checkSpans(solved);
	const g = check.governing;
	const { section } = model;
	const all = solved.all;
	const instantSag = sagAt(all, g.at);
	const bendingOnly = withoutShear(all);
	const bendingSag = sagAt(bendingOnly, g.at);
	const swSag = solved.selfWeightInstant ? sagAt(solved.selfWeightInstant, g.at) : 0;
	const mm = maxMoment(all, solved.pieces.xs);
	const { panelStress, strength } = strengthOf(model, mm.moment);

	const n = input.options.curvePoints;
	const curve: [number, number][] = new Array(n);
	const { xs, c } = solved.pieces;
	const length = model.length;
	const lastSeg = xs.length - 2;
	// Uplift is looked for at UPLIFT_POINTS points at least, however few the curve has: one pass
	// when the curve has that many (the default), the curve's points read on the way.
	const scan = Math.max(n, UPLIFT_POINTS);
	let lowest = 0;
	// x·0 is 0 for a finite x and NaN otherwise: the curve's part of assertFinite, read here
	let curveZero = 0;
	// the points run left to right, so the segment only ever moves forward
	for (let i = 0, seg = 0; i < scan; i++) {
		const x = (length * i) / (scan - 1);
		while (seg < lastSeg && xs[seg + 1] <= x) seg++;
		const t = x - xs[seg];
		const o = 5 * seg;
		const y = c[o] + t * (c[o + 1] + t * (c[o + 2] + t * (c[o + 3] + t * c[o + 4])));
		if (y < lowest) lowest = y;
		if (scan === n) {
			curveZero += x * 0 + y * 0;
			curve[i] = [x, y];
		}
	}
	// a shorter curve than the scan: its own points
	for (let i = 0, seg = 0; scan !== n && i < n; i++) {
		const x = n > 1 ? (length * i) / (n - 1) : 0;
		while (seg < lastSeg && xs[seg + 1] <= x) seg++;
		const y = pieceAt(c, seg, x - xs[seg]);
		curveZero += x * 0 + y * 0;
		curve[i] = [x, y];
	}
	const uplift = lowest < -Math.max(1e-4, 0.05 * g.sag);
	const longTermSag = g.sag;
	const selfWeightN = totalLoad(model.selfWeight);
	const appliedN = totalLoad(model.applied);
	const result: ShelfResult = {
		engineVersion: ENGINE_VERSION,
		span: model.length,
		supports: supportsOf(model),
		sag: {
			instant: Math.max(0, instantSag),
			longTerm: longTermSag,
			at: g.at,
			bending: Math.max(0, bendingSag),
			shear: Math.max(0, instantSag - bendingSag),
			selfWeight: Math.max(0, swSag),
			checked: solved.creepApplies ? 'longTerm' : 'instant',
			creepFactor: instantSag > 0 ? longTermSag / instantSag : 1 + model.section.parts[0].kdef
		},
		limit: {
			name: model.limit.name,
			allowed: g.allowed,
			pass: allPass(check.spans),
			margin: check.margin,
			source: model.limit.source,
			spans: check.spans
		},
		ratio: spanOverSag(g.to - g.from, longTermSag),
		stiffness: section.ei,
		stiffnessLongTerm: section.eiLongTerm,
		shearStiffness: section.ga,
		moment: mm.moment,
		momentAt: mm.at,
		stress: panelStress,
		strength,
		reactions: reactions(all),
		curve,
		load: { total: appliedN + selfWeightN, selfWeight: selfWeightN, applied: appliedN },
		section: {
			neutralAxis: section.neutralAxis,
			area: section.area,
			panelModulus: section.parts[0].modulusPa
		},
		material: { id: model.panel.id, name: model.panel.name },
		warnings: cautions(model, strength.utilisation, uplift)
	};
	if (finiteZero(result) + curveZero !== 0) findNonFinite(result, 'result');
	return result;
}

/**
 * No NaN or Infinity leaves the engine; reaching this is a bug, not a bad request. Every number
 * of the result is read once (x·0 is 0 for a finite x and NaN otherwise, so one sum tells);
 * only a failure pays for the walk that names where it was. tests/engine/shelf.test.ts puts a
 * NaN in each number of a result in turn and expects this to find it.
 */
export function assertFinite(r: ShelfResult): void {
	let z = finiteZero(r);
	const { curve } = r;
	for (let i = 0; i < curve.length; i++) z += curve[i][0] * 0 + curve[i][1] * 0;
	if (z !== 0) findNonFinite(r, 'result');
}

/** 0 when every number of the result but the curve is finite, NaN otherwise. */
function finiteZero(r: ShelfResult): number {
	const { sag, limit, strength, load, section } = r;
	let z =
		r.span * 0 +
		(r.ratio ?? 0) * 0 +
		r.stiffness * 0 +
		r.stiffnessLongTerm * 0 +
		r.shearStiffness * 0 +
		r.moment * 0 +
		r.momentAt * 0 +
		r.stress * 0 +
		(sag.instant + sag.longTerm + sag.at + sag.bending + sag.shear + sag.selfWeight) * 0 +
		sag.creepFactor * 0 +
		(limit.allowed + limit.margin) * 0 +
		(strength.rupture + strength.safetyFactor + strength.allowed + strength.utilisation) * 0 +
		(load.total + load.selfWeight + load.applied) * 0 +
		(section.neutralAxis + section.area + section.panelModulus) * 0;
	for (const x of r.supports) z += x * 0;
	for (const s of limit.spans) z += (s.from + s.to + s.sag + s.at + s.allowed) * 0;
	for (const x of r.reactions) z += (x.at + x.force + x.moment) * 0;
	return z;
}

function findNonFinite(value: unknown, path: string): void {
	if (typeof value === 'number') {
		if (!Number.isFinite(value)) throw new Error(`Engine produced a non-finite number at ${path}.`);
	} else if (Array.isArray(value)) value.forEach((v, i) => findNonFinite(v, `${path}[${i}]`));
	else if (value && typeof value === 'object')
		for (const [k, v] of Object.entries(value)) findNonFinite(v, `${path}.${k}`);
}

/** Turn any function of a request into one that never throws: `{ ok, result } | { ok: false, issues }`. */
export function safely<R, T>(fn: (request: R) => T): (request: R) => SafeResult<T> {
	return (request) => {
		try {
			return { ok: true, result: fn(request) };
		} catch (e) {
			if (e instanceof InputError) return { ok: false, issues: e.issues };
			const issues: InputIssue[] = [
				{
					path: [],
					message: 'This shelf could not be computed. Check the figures, or report the request.'
				}
			];
			return { ok: false, issues };
		}
	};
}

/**
 * Span over sag, or null when the shelf does not sag measurably: a sag too small to divide by
 * (a denormal from a vanishing load, found by the superposition property test) gives no ratio
 * rather than Infinity.
 */
export function spanOverSag(spanM: number, sagM: number): number | null {
	const ratio = spanM / sagM;
	return sagM > 0 && Number.isFinite(ratio) ? ratio : null;
}
