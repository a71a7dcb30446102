/**
 * The joint, stability and whole-case kinds of saved analysis, over the joinery engine. Their
 * shared schemas turn the input into the engine's SI request; what is stored is the input in its
 * own shape (SI numbers), so that it validates again on restore and duplicate.
 */
import type { z } from 'zod';
import { ENGINE_VERSION, formatForce } from '$lib/engine';
import { checkCaseSI, type CaseResult } from '$lib/engine/case';
import { JoineryInputError, planJointSI, type JointPlan } from '$lib/engine/joinery';
import { checkStabilitySI, type StabilityResult } from '$lib/engine/stability';
import { caseDesignSchema } from '$lib/schemas/case';
import { jointRequestSchema } from '$lib/schemas/joinery';
import { stabilityRequestSchema, stabilityShape } from '$lib/schemas/stability';
import type { LengthUnit } from '$lib/schemas/preferences';
import type { ProblemIssue } from './http';

const pct = (share: number) => `${Math.round(Math.abs(share) * 100)}%`;
const force = (n: number, unit: LengthUnit) =>
	formatForce(n, { unit: unit === 'mm' ? 'N' : 'lbf' });

/** Run an engine call; its typed input errors become issues, anything else a plain issue. */
function engine<T>(run: () => T): { ok: true; value: T } | { ok: false; issues: ProblemIssue[] } {
	try {
		return { ok: true, value: run() };
	} catch (e) {
		if (e instanceof JoineryInputError) return { ok: false, issues: e.issues };
		return {
			ok: false,
			issues: [{ path: [], message: 'This could not be computed. Check the figures.' }]
		};
	}
}

export interface KindOf<Stored extends z.ZodType, R> {
	/** validates and gives the input to store (its own shape, SI numbers) */
	stored: Stored;
	run(stored: z.output<Stored>): { ok: true; value: R } | { ok: false; issues: ProblemIssue[] };
	pass(result: R): boolean;
	describe(result: R, unit: LengthUnit): string;
}

const FASTENER_WORDS: Record<JointPlan['fastener'], [string, string]> = {
	biscuit: ['biscuit', 'biscuits'],
	'pocket-screw': ['pocket screw', 'pocket screws'],
	screw: ['screw', 'screws'],
	'shelf-pin': ['shelf pin', 'shelf pins'],
	dado: ['dado', 'dados']
};

export const jointKind: KindOf<typeof jointRequestSchema.in, JointPlan> = {
	stored: jointRequestSchema.in,
	run: (stored) => engine(() => planJointSI(jointRequestSchema.parse(stored))),
	pass: (plan) => plan.pass,
	describe(plan) {
		const [one, many] = FASTENER_WORDS[plan.fastener];
		const what = `${plan.count} ${plan.count === 1 ? one : many}`;
		const verdict = plan.pass
			? `carries the load at ${pct(plan.utilisation)} of its estimated capacity`
			: `overloaded: ${pct(plan.utilisation)} of its estimated capacity`;
		return `${what[0].toUpperCase()}${what.slice(1)}; ${verdict}.`;
	}
};

function stabilityPass(r: StabilityResult) {
	const edgesHold = r.frontEdgeLoads.every((l) => l.passF2057) || r.restraint.adequate;
	return edgesHold && (!r.anchoring.required || r.restraint.adequate);
}

export const stabilityKind: KindOf<typeof stabilityShape, StabilityResult> = {
	stored: stabilityShape,
	run: (stored) => engine(() => checkStabilitySI(stabilityRequestSchema.parse(stored))),
	pass: stabilityPass,
	describe(r, unit) {
		const tip = `Tips forward under ${force(r.tipForceAtTopN.loaded, unit)} at the top when loaded`;
		const hold = r.anchoring.required
			? r.restraint.adequate
				? `; anchored, the restraint holds the ${force(r.restraint.requiredN, unit)} it must`
				: `; must be anchored to hold ${force(r.restraint.requiredN, unit)}`
			: '';
		return `${tip}${hold}.`;
	}
};

export const caseKind: KindOf<typeof caseDesignSchema, CaseResult> = {
	stored: caseDesignSchema,
	run: (stored) => engine(() => checkCaseSI(stored)),
	pass: (r) => r.pass,
	describe(r) {
		const worst = r.margins[0];
		const head = r.pass
			? `All ${r.margins.length} checks pass`
			: `${r.summary.failures} of ${r.margins.length} checks fail`;
		if (!worst) return `${head}.`;
		const by =
			worst.margin === null
				? ''
				: worst.pass
					? `, ${pct(worst.margin)} to spare`
					: `, over by ${pct(worst.margin)}`;
		return `${head}; ${r.pass ? 'least margin' : 'worst'}: ${worst.what}${by}.`;
	}
};

export { ENGINE_VERSION };
