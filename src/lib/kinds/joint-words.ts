/**
 * A joint plan in plain words, the one writer for the joint screen, the saved summary and the
 * client's record. Every figure is the engine's; forces in the reader's system.
 */
import type { JointPlan } from '../engine/joinery/types';
import { formatForce, formatMoment } from '../engine/units/quantity';
import { count, percent, type ReaderUnit } from './words';

const FASTENER_WORDS: Record<JointPlan['fastener'], [string, string]> = {
	biscuit: ['biscuit', 'biscuits'],
	'pocket-screw': ['pocket screw', 'pocket screws'],
	screw: ['screw', 'screws'],
	'shelf-pin': ['shelf pin', 'shelf pins'],
	dado: ['dado', 'dados']
};

const fastenerCount = (fastener: JointPlan['fastener'], n: number) =>
	count(n, ...FASTENER_WORDS[fastener]);

export interface JointSentences {
	/** "3 pocket screws (#8 × 1-1/4" coarse thread) along the joint." */
	plan: string;
	/** the governing check against what the joint must carry */
	verdict: string;
	/** each capacity check in words */
	checks: string[];
	summary: string;
	pass: boolean;
}

export function describeJoint(plan: JointPlan, unit: ReaderUnit): JointSentences {
	const metric = unit === 'mm';
	const amount = (value: number, what: JointPlan['checks'][number]['unit']) =>
		what === 'N'
			? formatForce(value, { unit: metric ? 'N' : 'lbf' })
			: what === 'N·m'
				? formatMoment(value, { unit: metric ? 'N·m' : 'lbf·in' })
				: `${Math.round(value / 1000)} kPa`;
	const what = fastenerCount(plan.fastener, plan.count);
	const head = `${what[0].toUpperCase()}${what.slice(1)}`;
	const loaded = plan.checks.some((c) => c.demand > 0);
	const verdict = !loaded
		? 'No load was given, so the plan follows the usual spacing only; give the load the joint carries to check it.'
		: plan.pass
			? `It carries the load at ${percent(plan.utilisation)} of its estimated allowable capacity.`
			: `It is overloaded: the load is ${percent(plan.utilisation)} of its estimated allowable capacity. Add fasteners, choose a stronger joint, or shorten the span it carries.`;
	const checks = plan.checks.map(
		(c) =>
			`${c.what}: ${amount(c.demand, c.unit)} against ${amount(c.design, c.unit)} allowed` +
			(c.pass ? '.' : ' — too much.')
	);
	const summary = !loaded
		? `${head}; no load given.`
		: plan.pass
			? `${head}; carries the load at ${percent(plan.utilisation)} of its estimated capacity.`
			: `${head}; overloaded: ${percent(plan.utilisation)} of its estimated capacity.`;
	// "pocket screw #8 × 1-1/4" coarse thread" → "each #8 × 1-1/4" coarse thread"
	const [one] = FASTENER_WORDS[plan.fastener];
	const each = plan.description.startsWith(one)
		? plan.description.slice(one.length).trim()
		: plan.description;
	const spec = each ? (plan.count === 1 ? `, ${each}` : `, each ${each}`) : '';
	return { plan: `${head}${spec}.`, verdict, checks, summary, pass: plan.pass };
}
