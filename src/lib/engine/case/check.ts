import { JOINT_CAUTIONS } from '../joinery/cautions';
import { planJointSI } from '../joinery/plan';
import type { JointPlan, JointRequest } from '../joinery/types';
import { checkStabilitySI } from '../stability/check';
import { STABILITY_CAUTIONS } from '../stability/cautions';
import { ENGINE_VERSION } from '../version';
import { caseGeometry, partsList } from './geometry';
import { assumedStocks, jointRequests } from './joints';
import { caseMargins } from './margins';
import { analyseShelves, asShelf, shelfRequest, ShelfAnalyses } from './shelves';
import type { CaseGeometry } from './geometry';
import { anchoringSuggestion, jointSuggestions, shelfSuggestions } from './suggest';
import type {
	CaseDesign,
	CaseJoint,
	CaseResult,
	CaseShelf,
	CaseSuggestion,
	DesignPath
} from './types';
import { stabilityRequestOf } from './weight';

const SHELF_CAUTIONS = [
	'Shelf sag and strength are estimates from published material data and beam theory; real boards vary.',
	'Do not overload shelves: the Architectural Woodwork Standards cap one shelf at 200 lb.'
];

/** Failing shelves that are the same shelf (same request to the shelf engine), grouped so each
 * suggestion is worked out once and applies to all of them. */
function sameShelves(failing: CaseShelf[], d: CaseDesign, g: CaseGeometry): CaseShelf[][] {
	const groups = new Map<string, CaseShelf[]>();
	for (const s of failing) {
		const design =
			s.path[0] === 'shelves'
				? d.shelves[s.path[1] as number]
				: asShelf(d, s.path[0] as 'top' | 'bottom');
		const key = JSON.stringify(shelfRequest(d, g, design));
		groups.set(key, [...(groups.get(key) ?? []), s]);
	}
	return [...groups.values()];
}

/** A suggestion worked out for the first shelf of a group, written for every shelf of it. */
function forAll(x: CaseSuggestion, first: CaseShelf, group: CaseShelf[]): CaseSuggestion {
	const prefix = first.path.join('.');
	const rebase = (path: DesignPath, to: DesignPath) => [...to, ...path.slice(first.path.length)];
	const own = (path: DesignPath) => path.slice(0, first.path.length).join('.') === prefix;
	return {
		...x,
		fixes: group.flatMap((s) => x.fixes.map((k) => s.path.join('.') + k.slice(prefix.length))),
		changes: x.changes.flatMap((c) =>
			own(c.path) ? group.map((s) => ({ path: rebase(c.path, s.path), value: c.value })) : [c]
		)
	};
}

/**
 * Check a whole case (SI numbers): every shelf's analysis, every joint's plan
 * and capacity, tip-over and anchoring, the cut list, the margins worst first, and suggestions that
 * fix each failure as changes to the design. An estimate for planning; the cautions always come
 * with it. Throws InputError naming a bad field.
 */
export function checkCaseSI(d: CaseDesign): CaseResult {
	const g = caseGeometry(d);
	const runs = new ShelfAnalyses();
	const shelves = analyseShelves(d, g, runs);
	const requests = jointRequests(d, g, shelves);
	// identical joints (a column of adjustable shelves) are planned once
	const plans = new Map<string, JointPlan>();
	const planOnce = (req: JointRequest) => {
		const key = JSON.stringify(req);
		let plan = plans.get(key);
		if (!plan) plans.set(key, (plan = planJointSI(req)));
		return plan;
	};
	const joints: CaseJoint[] = requests.map(({ req, ...rest }) => ({
		...rest,
		plan: planOnce(req)
	}));
	const stability = checkStabilitySI(stabilityRequestOf(d, g, shelves));
	const margins = caseMargins(shelves, joints, stability);
	const failing = new Set(margins.filter((m) => !m.pass).map((m) => m.key));

	const suggestions: CaseSuggestion[] = [];
	for (const group of sameShelves(
		shelves.filter((s) => !s.pass),
		d,
		g
	)) {
		const [first] = group;
		const label = group.length > 1 ? group.map((s) => s.name).join(', ') : first.name;
		suggestions.push(
			...shelfSuggestions(d, g, runs, first, label).map((x) => forAll(x, first, group))
		);
	}
	joints.forEach((j, i) => {
		if (!j.plan.pass) suggestions.push(...jointSuggestions(j, requests[i].req, d, g, runs));
	});
	const tipping = [...failing].filter((k) => k.startsWith('stability:'));
	if (tipping.length) suggestions.push(anchoringSuggestion(tipping));

	const warnings = [
		...shelves.flatMap((s) =>
			s.analysis.warnings.filter((w) => w.code !== 'estimate').map((w) => `${s.name}: ${w.message}`)
		),
		...joints.flatMap((j) => j.plan.warnings.map((w) => `${j.where}: ${w}`)),
		...stability.warnings
	];
	if (assumedStocks(d))
		warnings.push(
			'A material given by its figures is taken as softwood of its specific gravity for fastener holding.'
		);

	return {
		estimate: true,
		engineVersion: ENGINE_VERSION,
		name: d.name ?? null,
		pass: failing.size === 0,
		summary: { failures: failing.size, worst: margins.slice(0, 5) },
		shelves,
		joints,
		stability,
		parts: partsList(d, g),
		margins,
		suggestions,
		warnings: [...new Set(warnings)],
		cautions: [...SHELF_CAUTIONS, ...JOINT_CAUTIONS, ...STABILITY_CAUTIONS]
	};
}
