/**
 * The material comparison's engine call: the same shelf in 2–8 materials and thicknesses, each
 * candidate computed from the input parsed once.
 */
import { analyzeInput, safely, type ShelfResult } from '../engine/index';
import { formatLength } from '../engine/units/length';
import { ENGINE_VERSION } from '../engine/version';
import {
	comparisonRequestSchema,
	comparisonShelf,
	type ComparisonInput
} from '../schemas/analysis';
import { materialName } from './input-rows';
import type { EngineRun } from './registry';

export const comparisonSchema = comparisonRequestSchema;

interface ComparisonCandidateResult {
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

const analyzeParsed = safely(analyzeInput);

export function computeComparison(input: ComparisonInput): EngineRun<ComparisonResult> {
	const candidates: ComparisonCandidateResult[] = [];
	for (let i = 0; i < input.candidates.length; i++) {
		const run = analyzeParsed(comparisonShelf(input, i));
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
	return { ok: true, result: { engineVersion: ENGINE_VERSION, candidates } };
}
