/**
 * The record in words for a reader who is not an engineer: one plain verdict, the key inputs, what
 * to do, every caution, and the sources behind the figures. Only wording: every figure comes from
 * the engine's stored result.
 */
import { findMaterial, formatLength, type ShelfInput, type ShelfResult } from '$lib/engine';
import type { CaseResult } from '$lib/engine/case/types';
import type { WallResult } from '$lib/engine/wall/types';
import type { JointPlan } from '$lib/engine/joinery';
import type { StabilityResult } from '$lib/engine/stability';
import { count, type ReaderUnit as LengthUnit } from '$lib/kinds/words';
import type { AnalysisKind } from './db/tables';
import { describeAnalysis, describeInput } from '$lib/kinds/registry';
import type { ComparisonResult } from '$lib/kinds/comparison';
import { aboutLength, describeShelf } from '$lib/kinds/shelf-words';

const pct = (share: number) => `${Math.round(Math.abs(share) * 100)}%`;

interface RecordWords {
	verdict: string;
	inputs: [string, string][];
	steps: string[];
	cautions: string[];
	/** where the published figures come from (numbered in the record's notes) */
	sources: string[];
	/** terms the record uses that a newcomer may not know */
	terms: string[];
}

/** Shown with every record: what kind of answer this is. */
export const GENERAL_CAUTION =
	'These are engineering estimates from published average figures and beam theory; real boards vary. Follow local codes, and ask a licensed professional wherever a failure could hurt someone.';

export const GLOSSARY: Record<string, string> = {
	sag: 'how far a shelf bends down below straight under its load.',
	span: 'the clear distance between the supports a shelf rests on.',
	limit:
		'the most sag allowed, written as the span divided by a number: L/144 allows a sag of one 144th of the span.',
	creep:
		'a shelf that carries the same load for months keeps sagging slowly; "in the long run" figures include it.',
	anchoring:
		'fixing a tall case to the wall so that it cannot tip forward onto someone, even when climbed or pulled.',
	'tip force': 'the push at the top front edge that would make a free-standing case fall forward.',
	capacity: 'the load a joint is estimated to carry safely.',
	'bending stress':
		'how hard the wood fibres are pulled and pushed as the shelf bends; too much and it cracks or breaks.'
};

/** A figure recalled rather than read, or not yet checked against a copy of its source. */
export function isUnverified(source: string) {
	return /from memory|unverified|verify/i.test(source);
}

/** The shelf check's own sentences (the kinds registry's writer); the stress only when it fails. */
function shelfVerdict(input: ShelfInput, r: ShelfResult, unit: LengthUnit) {
	const s = describeShelf(r, unit, {
		brief: input.duration === 'short',
		cantilever: input.support === 'cantilever'
	});
	return [s.sag, s.verdict, ...(r.strength.pass ? [] : [s.stress])].join(' ');
}

function shelfSources(input: ShelfInput, r: ShelfResult) {
	const out = [r.limit.source];
	const material = typeof input.material === 'string' ? findMaterial(input.material) : null;
	if (material)
		out.push(
			`${material.name}, stiffness: ${material.sources.modulus}`,
			`${material.name}, strength: ${material.sources.rupture}`,
			`${material.name}, weight: ${material.sources.density}`,
			`Sag in the long run (creep): ${material.sources.creep}`
		);
	else out.push(`${r.material.name}: the figures were typed in by the shop, not published ones.`);
	for (const w of r.warnings) if (w.source) out.push(w.source);
	return out;
}

function shelfWords(input: ShelfInput, r: ShelfResult, unit: LengthUnit): RecordWords {
	const pass = r.limit.pass && r.strength.pass;
	return {
		verdict: shelfVerdict(input, r, unit),
		inputs: describeInput('shelf', input, unit),
		steps: pass
			? [
					'Build the shelf as described above: the span, thickness and material are what was checked.'
				]
			: [
					'Do not build this shelf as described.',
					'Shorten the span, use thicker stock, add a solid strip along the front edge, or add a support in the middle, then have it checked again.'
				],
		cautions: r.warnings.map((w) => w.message),
		sources: shelfSources(input, r),
		terms: [
			'sag',
			'span',
			'limit',
			...(r.sag.checked === 'longTerm' ? ['creep'] : []),
			...(r.strength.pass ? [] : ['bending stress'])
		]
	};
}

function comparisonWords(input: unknown, r: ComparisonResult, unit: LengthUnit): RecordWords {
	const rows = r.candidates.map((c): [string, string] => [
		c.label,
		`${c.pass ? 'meets' : 'does not meet'} ${c.limit.name}: sags ${aboutLength(
			c.sag.checked === 'longTerm' ? c.sag.longTerm : c.sag.instant,
			unit
		)}${c.sag.checked === 'longTerm' ? ' in the long run' : ''}`
	]);
	const warnings = [...new Set(r.candidates.flatMap((c) => c.warnings.map((w) => w.message)))];
	const sources = [
		...new Set(
			r.candidates.flatMap((c) => [
				c.limit.source,
				...c.warnings.flatMap((w) => (w.source ? [w.source] : []))
			])
		)
	];
	return {
		verdict: describeAnalysis('comparison', input, r, unit),
		inputs: [...describeInput('comparison', input, unit).slice(0, 10), ...rows],
		steps: r.candidates.some((c) => c.pass)
			? [
					'Choose one of the candidates that meets the limit; the one with the least sag is named above.'
				]
			: ['None of the candidates is stiff enough: try a shorter span or thicker stock.'],
		cautions: warnings,
		sources,
		terms: ['sag', 'span', 'limit']
	};
}

function jointWords(input: unknown, plan: JointPlan, unit: LengthUnit): RecordWords {
	return {
		verdict: describeAnalysis('joint', input, plan, unit),
		inputs: [],
		steps: plan.pass
			? [...plan.notes]
			: ['Do not build this joint as planned: add fasteners or choose a stronger joint.'],
		cautions: [...plan.warnings, ...plan.cautions],
		sources: plan.sources,
		terms: ['capacity']
	};
}

function stabilityWords(input: unknown, r: StabilityResult, unit: LengthUnit): RecordWords {
	return {
		verdict: describeAnalysis('stability', input, r, unit),
		inputs: [],
		steps: r.anchoring.recommendations,
		cautions: [...r.warnings, ...r.cautions],
		sources: r.sources,
		terms: ['tip force', 'anchoring']
	};
}

function caseVerdict(r: CaseResult) {
	const failing = r.margins.filter((m) => !m.pass);
	const worst = r.margins[0];
	if (r.pass)
		return `Every shelf, joint and the tipping check of this case pass (${count(r.margins.length, 'check')}).${
			worst?.margin != null
				? ` The closest is ${worst.what}, with ${pct(worst.margin)} to spare.`
				: ''
		}`;
	return `${failing.length} of ${count(r.margins.length, 'check')} of this case ${failing.length === 1 ? 'does' : 'do'} not pass; the worst is ${worst.what}. Change the design before it is built.`;
}

function caseWords(input: unknown, r: CaseResult, unit: LengthUnit): RecordWords {
	const steps = [...r.stability.anchoring.recommendations];
	if (!r.pass) steps.unshift(...r.suggestions.slice(0, 3).map((s) => `${s.title}: ${s.detail}`));
	const shelfSources = r.shelves.flatMap((s) => [
		s.analysis.limit.source,
		...s.analysis.warnings.flatMap((w) => (w.source ? [w.source] : []))
	]);
	const jointSources = r.joints.flatMap((j) => j.plan.sources);
	return {
		verdict: caseVerdict(r),
		inputs: r.shelves.map((s): [string, string] => [
			s.name,
			`${formatLength(s.spanM, { unit })} span, ${formatLength(s.thicknessM, { unit })} thick: ${
				s.pass ? 'passes' : 'does not pass'
			}; sags ${aboutLength(s.analysis.sag[s.analysis.sag.checked], unit)}`
		]),
		steps,
		cautions: [...new Set([...r.warnings, ...r.cautions])],
		sources: [...new Set([...shelfSources, ...jointSources, ...r.stability.sources])],
		terms: ['sag', 'span', 'limit', 'anchoring', 'tip force']
	};
}

function wallWords(input: unknown, r: WallResult, unit: LengthUnit): RecordWords {
	const worst = r.margins[0];
	const failing = r.margins.filter((m) => !m.pass).length;
	const verdict = r.pass
		? `Every case of this wall passes its shelf, joint and tipping checks (${count(r.margins.length, 'check')}).`
		: `${failing} of ${count(r.margins.length, 'check')} of this wall ${failing === 1 ? 'does' : 'do'} not pass; the worst is ${r.cases[worst.caseIndex]?.name ?? 'a case'}: ${worst.what}. Change the design before it is built.`;
	const anchoring = [...new Set(r.cases.flatMap((c) => c.stability.anchoring.recommendations))];
	const fixes = r.pass ? [] : r.suggestions.slice(0, 3).map((s) => `${s.title}: ${s.detail}`);
	return {
		verdict,
		inputs: r.cases.map((c): [string, string] => [
			c.name,
			`${formatLength(c.widthM, { unit })} wide, ${formatLength(c.heightM, { unit })} tall: ${
				c.pass ? 'passes' : 'does not pass'
			}`
		]),
		steps: [...fixes, ...anchoring],
		cautions: [...new Set([...r.warnings, ...r.cautions, ...r.cases.flatMap((c) => c.warnings)])],
		sources: [...new Set(r.cases.flatMap((c) => c.stability.sources))],
		terms: ['sag', 'span', 'limit', 'anchoring', 'tip force']
	};
}

/** The record's words for one stored analysis (input and result as the engine left them). */
export function recordWords(
	kind: AnalysisKind,
	input: unknown,
	result: unknown,
	unit: LengthUnit
): RecordWords {
	switch (kind) {
		case 'shelf':
			return shelfWords(input as ShelfInput, result as ShelfResult, unit);
		case 'comparison':
			return comparisonWords(input, result as ComparisonResult, unit);
		case 'joint':
			return jointWords(input, result as JointPlan, unit);
		case 'stability':
			return stabilityWords(input, result as StabilityResult, unit);
		case 'case':
			return caseWords(input, result as CaseResult, unit);
		case 'wall':
			return wallWords(input, result as WallResult, unit);
		default:
			return {
				verdict: describeAnalysis(kind, input, result, unit),
				inputs: describeInput(kind, input, unit),
				steps: [],
				cautions: [],
				sources: [],
				terms: []
			};
	}
}
