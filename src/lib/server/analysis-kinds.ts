/**
 * What each kind of saved analysis is: the shared schema its input must pass, the engine call
 * that computes its result on the server (a result sent by a client is never stored), and the one
 * plain sentence that says its governing result. Kinds whose engine is not in the tree are absent:
 * saving them is refused with a 422, never faked.
 */
import type { z } from 'zod';
import {
	ENGINE_VERSION,
	formatLength,
	safeAnalyzeShelf,
	shelfRequestSchema,
	type ShelfResult
} from '$lib/engine';
import type { LengthUnit } from '$lib/schemas/preferences';
import {
	comparisonRequestSchema,
	comparisonShelf,
	type AnalysisKindName,
	type ComparisonInput
} from '$lib/schemas/analysis';
import type { AnalysisKind } from './db/schema';
import type { ProblemIssue } from './http';
import { caseKind, jointKind, stabilityKind, type KindOf } from './analysis-kinds-case';
import {
	comparisonSentence,
	edgesWords,
	materialName,
	shelfInputRows,
	shelfSentence,
	shelfSettingRows
} from './analysis-words';

// the shared list and the database column must name the same kinds
const sameKinds: [AnalysisKindName, AnalysisKind] extends [AnalysisKind, AnalysisKindName]
	? true
	: never = true;
void sameKinds;

export interface Computed {
	result: unknown;
	pass: boolean | null;
	engineVersion: string;
}

export interface AnalysisKindSpec<S extends z.ZodType = z.ZodType> {
	schema: S;
	/** run the engine on a validated input; engine refusals come back as issues */
	compute(
		input: z.output<S>
	): { ok: true; computed: Computed } | { ok: false; issues: ProblemIssue[] };
	/** the governing result in one sentence, lengths in the reader's unit */
	describe(input: z.output<S>, result: never, unit: LengthUnit): string;
	/** the input as label/value rows for reading an earlier version */
	inputRows(input: z.output<S>, unit: LengthUnit): [string, string][];
}

// ---- shelf: one shelf through analyzeShelf ----
const shelf: AnalysisKindSpec<typeof shelfRequestSchema> = {
	schema: shelfRequestSchema,
	compute(input) {
		const run = safeAnalyzeShelf(input);
		if (!run.ok) return run;
		const result = run.result;
		return {
			ok: true,
			computed: {
				result,
				pass: result.limit.pass && result.strength.pass,
				engineVersion: result.engineVersion
			}
		};
	},
	describe: (_input, result: ShelfResult, unit) => shelfSentence(result, unit),
	inputRows: (input, unit) => shelfInputRows(input, unit)
};

// ---- comparison: the same shelf in 2–8 materials and thicknesses ----
export interface ComparisonCandidateResult {
	label: string;
	material: ShelfResult['material'];
	thickness: number;
	sag: ShelfResult['sag'];
	limit: Omit<ShelfResult['limit'], 'spans'>;
	ratio: number | null;
	strength: ShelfResult['strength'];
	load: ShelfResult['load'];
	warnings: ShelfResult['warnings'];
	pass: boolean;
}
export interface ComparisonResult {
	engineVersion: string;
	candidates: ComparisonCandidateResult[];
}

function candidateLabel(input: ComparisonInput, i: number) {
	const c = input.candidates[i];
	if (c.label) return c.label;
	const edges = c.edges?.length ? ` with ${c.edges.length === 1 ? 'a strip' : 'strips'}` : '';
	return `${formatLength(c.thickness)} ${materialName(c.material)}${edges}`;
}

const comparison: AnalysisKindSpec<typeof comparisonRequestSchema> = {
	schema: comparisonRequestSchema,
	compute(input) {
		const candidates: ComparisonCandidateResult[] = [];
		for (let i = 0; i < input.candidates.length; i++) {
			const run = safeAnalyzeShelf(comparisonShelf(input, i));
			if (!run.ok)
				return {
					ok: false,
					issues: run.issues.map((x) => ({ ...x, path: ['candidates', i, ...x.path] }))
				};
			const r = run.result;
			const { spans: _spans, ...limit } = r.limit;
			void _spans;
			candidates.push({
				label: candidateLabel(input, i),
				material: r.material,
				thickness: input.candidates[i].thickness,
				sag: r.sag,
				limit,
				ratio: r.ratio,
				strength: r.strength,
				load: r.load,
				warnings: r.warnings,
				pass: r.limit.pass && r.strength.pass
			});
		}
		const result: ComparisonResult = { engineVersion: ENGINE_VERSION, candidates };
		return {
			ok: true,
			computed: { result, pass: candidates.some((c) => c.pass), engineVersion: ENGINE_VERSION }
		};
	},
	describe: (_input, result: ComparisonResult, unit) =>
		comparisonSentence(
			result.candidates.map((c) => ({
				label: c.label,
				pass: c.pass,
				sagM: c.sag.checked === 'longTerm' ? c.sag.longTerm : c.sag.instant,
				limitName: c.limit.name,
				margin: c.limit.margin
			})),
			unit
		),
	inputRows: (input, unit) => [
		...shelfSettingRows(input.shelf, unit),
		...input.candidates.map((c, i): [string, string] => [
			`Candidate ${i + 1}`,
			`${c.label ? `${c.label}: ` : ''}${formatLength(c.thickness, { unit })} ${materialName(c.material)}` +
				(c.edges ? `; edges: ${edgesWords(c.edges, unit)}` : '')
		])
	]
};

// ---- joint, stability, case: the joinery engine (analysis-kinds-case.ts) ----
/** Top-level fields as rows; nested parts as compact JSON (SI numbers). */
function plainRows(input: unknown): [string, string][] {
	return Object.entries(input as Record<string, unknown>).map(([key, value]) => [
		key,
		typeof value === 'object' ? JSON.stringify(value) : String(value)
	]);
}

function fromKind<S extends z.ZodType, R>(k: KindOf<S, R>): AnalysisKindSpec<S> {
	return {
		schema: k.stored,
		compute(input) {
			const run = k.run(input);
			if (!run.ok) return run;
			const result = run.value as R & { engineVersion?: string };
			return {
				ok: true,
				computed: {
					result,
					pass: k.pass(result),
					engineVersion: result.engineVersion ?? ENGINE_VERSION
				}
			};
		},
		describe: (_input, result: R, unit) => k.describe(result, unit),
		inputRows: (input) => plainRows(input)
	};
}

const registry: Partial<Record<AnalysisKind, AnalysisKindSpec>> = {
	shelf: shelf as unknown as AnalysisKindSpec,
	comparison: comparison as unknown as AnalysisKindSpec,
	joint: fromKind(jointKind) as unknown as AnalysisKindSpec,
	stability: fromKind(stabilityKind) as unknown as AnalysisKindSpec,
	case: fromKind(caseKind) as unknown as AnalysisKindSpec
};

/** Kinds that can be saved now. */
export function registeredKinds(): AnalysisKind[] {
	return Object.keys(registry) as AnalysisKind[];
}

export type Computation =
	| { ok: true; input: unknown; result: unknown; pass: boolean | null; engineVersion: string }
	| { ok: false; issues: ProblemIssue[] };

/** Validate an input of this kind and compute it with the engine; issues name `input.…` fields. */
export function computeAnalysis(kind: AnalysisKind, raw: unknown): Computation {
	const spec = registry[kind];
	if (!spec)
		return {
			ok: false,
			issues: [{ path: ['kind'], message: `Saving a ${kind} analysis is not available yet.` }]
		};
	const parsed = spec.schema.safeParse(raw);
	if (!parsed.success)
		return {
			ok: false,
			issues: parsed.error.issues.map((i) => ({
				path: ['input', ...i.path.filter((p): p is string | number => typeof p !== 'symbol')],
				message: i.message
			}))
		};
	const run = spec.compute(parsed.data);
	if (!run.ok)
		return { ok: false, issues: run.issues.map((i) => ({ ...i, path: ['input', ...i.path] })) };
	return { ok: true, input: parsed.data, ...run.computed };
}

/** The governing sentence of a stored result; '' when the kind is unknown or the data is old. */
export function describeAnalysis(
	kind: AnalysisKind,
	input: unknown,
	result: unknown,
	unit: LengthUnit
): string {
	const spec = registry[kind];
	if (!spec || result == null) return '';
	try {
		return spec.describe(input, result as never, unit);
	} catch {
		return '';
	}
}

/** A stored input as label/value rows; raw JSON when the kind cannot read it. */
export function describeInput(
	kind: AnalysisKind,
	input: unknown,
	unit: LengthUnit
): [string, string][] {
	const spec = registry[kind];
	try {
		if (spec) return spec.inputRows(input, unit);
	} catch {
		// fall through to the raw form
	}
	return [['Input', JSON.stringify(input, null, 1)]];
}
