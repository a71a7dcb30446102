/**
 * What each kind of saved analysis is, keyed by the names in ./names.ts: the shared schema an input
 * must pass (parsed once: its output is what is stored and what the engine computes with), the
 * engine call (a result sent by a client is never stored), the verdict, and the one sentence
 * writer that says the result. Framework-free: the screens, the server and the tests share it.
 */
import type { z } from 'zod';
import { analyzeInput, safely, type ShelfResult } from '../engine/index';
import { checkCaseSI } from '../engine/case/index';
import type { CaseResult } from '../engine/case/types';
import { InputError } from '../engine/errors';
import { planJointSI } from '../engine/joinery/index';
import type { JointPlan } from '../engine/joinery/types';
import { checkStabilitySI } from '../engine/stability/index';
import type { StabilityResult } from '../engine/stability/types';
import { ENGINE_VERSION } from '../engine/version';
import { caseDesignSchema } from '../schemas/case';
import { toWallDesign, wallDesignSchema } from '../schemas/wall';
import { checkWall } from '../engine/wall/check';
import type { WallResult } from '../engine/wall/types';
import { fieldIssues } from '../schemas/issues';
import { jointShape, toJointRequest } from '../schemas/joinery';
import { shelfRequestSchema } from '../schemas/shelf';
import { stabilityShape, toStabilityRequest } from '../schemas/stability';
import { describeCase } from './case-words';
import { comparisonSchema, computeComparison, type ComparisonResult } from './comparison';
import { comparisonRows, jointRows, shelfRows, stabilityRows } from './input-rows';
import { describeJoint } from './joint-words';
import { ANALYSIS_KINDS, type AnalysisKind } from './names';
import { describeShelf } from './shelf-words';
import { describeStability } from './stability-words';
import type { ReaderUnit } from './words';
import { comparisonSentence } from './comparison-words';

export interface Issue {
	path: (string | number)[];
	message: string;
}
export type EngineRun<R> = { ok: true; result: R } | { ok: false; issues: Issue[] };

interface KindSpec<S extends z.ZodType, R> {
	schema: S;
	/** run the engine on a parsed input; engine refusals come back as issues */
	compute(input: z.output<S>): EngineRun<R>;
	pass(result: R): boolean | null;
	engineVersion(result: R): string;
	/** the governing result in one line, in the reader's unit (the stored input as sent, unread) */
	summary(result: R, unit: ReaderUnit, input: unknown): string;
	/** the input as label/value rows for reading an earlier version */
	inputRows(input: z.output<S>, unit: ReaderUnit): [string, string][];
}

/** Run an engine call; its typed input errors become issues, anything else a plain issue. */
function engine<T>(run: () => T): EngineRun<T> {
	try {
		return { ok: true, result: run() };
	} catch (e) {
		if (e instanceof InputError) return { ok: false, issues: e.issues };
		return {
			ok: false,
			issues: [{ path: [], message: 'This could not be computed. Check the figures.' }]
		};
	}
}

const analyzeParsed = safely(analyzeInput);

/** A shelf input whose loads are brief (a stored input, read without trusting its shape). */
const isBrief = (input: unknown) =>
	typeof input === 'object' && input !== null && 'duration' in input && input.duration === 'short';

const shelfKind: KindSpec<typeof shelfRequestSchema, ShelfResult> = {
	schema: shelfRequestSchema,
	compute: (input) => {
		const run = analyzeParsed(input);
		return run.ok ? run : { ok: false, issues: run.issues };
	},
	pass: (r) => r.limit.pass && r.strength.pass,
	engineVersion: (r) => r.engineVersion,
	summary: (r, unit, input) => describeShelf(r, unit, { brief: isBrief(input) }).summary,
	inputRows: shelfRows
};

const comparisonKind: KindSpec<typeof comparisonSchema, ComparisonResult> = {
	schema: comparisonSchema,
	compute: computeComparison,
	pass: (r) => r.candidates.some((c) => c.pass),
	engineVersion: (r) => r.engineVersion,
	summary: (r, unit) =>
		comparisonSentence(
			r.candidates.map((c) => ({
				label: c.label,
				pass: c.pass,
				sagM: c.sag.checked === 'longTerm' ? c.sag.longTerm : c.sag.instant,
				limitName: c.limit.name,
				margin: c.limit.margin
			})),
			unit
		),
	inputRows: comparisonRows
};

export const jointKind: KindSpec<typeof jointShape, JointPlan> = {
	schema: jointShape,
	compute: (input) => engine(() => planJointSI(toJointRequest(input))),
	pass: (plan) => plan.pass,
	engineVersion: () => ENGINE_VERSION,
	summary: (plan, unit) => describeJoint(plan, unit).summary,
	inputRows: jointRows
};

export const stabilityKind: KindSpec<typeof stabilityShape, StabilityResult> = {
	schema: stabilityShape,
	compute: (input) => engine(() => checkStabilitySI(toStabilityRequest(input))),
	pass: (r) => describeStability(r, 'mm').pass,
	engineVersion: () => ENGINE_VERSION,
	summary: (r, unit) => describeStability(r, unit).summary,
	inputRows: stabilityRows
};

const caseKind: KindSpec<typeof caseDesignSchema, CaseResult> = {
	schema: caseDesignSchema,
	compute: (input) => engine(() => checkCaseSI(input)),
	pass: (r) => r.pass,
	engineVersion: () => ENGINE_VERSION,
	summary: (r) => describeCase(r).summary,
	inputRows: (input) => plainRows(input)
};

const wallKind: KindSpec<typeof wallDesignSchema, WallResult> = {
	schema: wallDesignSchema,
	compute: (input) => engine(() => checkWall(toWallDesign(input))),
	pass: (r) => r.pass,
	engineVersion: () => ENGINE_VERSION,
	// the same sentence as a case: count of checks, the worst first
	summary: (r) => describeCase(r).summary,
	inputRows: (input) => plainRows(input)
};

/** Top-level fields as rows; nested parts as compact JSON (SI numbers). */
function plainRows(input: object): [string, string][] {
	return Object.entries(input).map(([key, value]) => [
		key,
		typeof value === 'object' ? JSON.stringify(value) : String(value)
	]);
}

// ---- the same operations for a kind chosen at run time (the API, the list, the history) ----

type Computation =
	| { ok: true; input: unknown; result: unknown; pass: boolean | null; engineVersion: string }
	| { ok: false; issues: Issue[] };

/** What the registry does for one kind, with its types closed over (no casts at the call site). */
interface KindOps {
	compute(raw: unknown): Computation;
	summary(result: unknown, unit: ReaderUnit, input: unknown): string;
	inputRows(input: unknown, unit: ReaderUnit): [string, string][];
}

function opsOf<S extends z.ZodType, R>(spec: KindSpec<S, R>): KindOps {
	return {
		compute(raw) {
			const parsed = spec.schema.safeParse(raw);
			if (!parsed.success)
				return {
					ok: false,
					issues: fieldIssues(parsed.error)
				};
			return computeParsed(spec, parsed.data);
		},
		// a stored result was written by this kind's compute (an older engine's shape is caught)
		summary: (result, unit, input) => spec.summary(result as R, unit, input),
		inputRows(input, unit) {
			const parsed = spec.schema.safeParse(input);
			if (!parsed.success) throw new Error('not readable by this kind');
			return spec.inputRows(parsed.data, unit);
		}
	};
}

/** Compute an input that has already passed this kind's schema (a superforms save). */
function computeParsed<S extends z.ZodType, R>(
	spec: KindSpec<S, R>,
	input: z.output<S>
): Computation {
	const run = spec.compute(input);
	if (!run.ok) return run;
	return {
		ok: true,
		input,
		result: run.result,
		pass: spec.pass(run.result),
		engineVersion: spec.engineVersion(run.result)
	};
}

/** Parse, then compute, for a screen: the parsed input and the result, or the issues by field. */
export function runKind<S extends z.ZodType, R>(
	spec: KindSpec<S, R>,
	raw: unknown
): { ok: true; input: z.output<S>; result: R } | { ok: false; issues: Issue[] } {
	const parsed = spec.schema.safeParse(raw);
	if (!parsed.success) return { ok: false, issues: fieldIssues(parsed.error) };
	const run = spec.compute(parsed.data);
	return run.ok ? { ok: true, input: parsed.data, result: run.result } : run;
}

const OPS: Record<AnalysisKind, KindOps> = {
	shelf: opsOf(shelfKind),
	comparison: opsOf(comparisonKind),
	joint: opsOf(jointKind),
	stability: opsOf(stabilityKind),
	case: opsOf(caseKind),
	wall: opsOf(wallKind)
};

export { ANALYSIS_KINDS };

/** Validate an input of this kind (once) and compute it with the engine; issues name `input.…`. */
export function computeAnalysis(kind: AnalysisKind, raw: unknown): Computation {
	const run = OPS[kind].compute(raw);
	if (run.ok) return run;
	return { ok: false, issues: run.issues.map((i) => ({ ...i, path: ['input', ...i.path] })) };
}

/** The governing sentence of a stored result; '' when the data is of an older shape. */
export function describeAnalysis(
	kind: AnalysisKind,
	input: unknown,
	result: unknown,
	unit: ReaderUnit
): string {
	if (result == null) return '';
	try {
		return OPS[kind].summary(result, unit, input);
	} catch {
		return '';
	}
}

/** A stored input as label/value rows; raw JSON when the kind cannot read it. */
export function describeInput(
	kind: AnalysisKind,
	input: unknown,
	unit: ReaderUnit
): [string, string][] {
	try {
		return OPS[kind].inputRows(input, unit);
	} catch {
		return [['Input', JSON.stringify(input, null, 1)]];
	}
}
