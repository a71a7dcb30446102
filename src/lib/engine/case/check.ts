import { JOINT_CAUTIONS } from '../joinery/cautions';
import { planJointSI } from '../joinery/plan';
import type { JointPlan, JointRequest } from '../joinery/types';
import { checkStabilitySI } from '../stability/check';
import { STABILITY_CAUTIONS } from '../stability/cautions';
import { ENGINE_VERSION } from '../version';
import { ContentMap } from '../memo';
import type { ShelfResult } from '../shelf/types';
import { caseGeometry, partsList } from './geometry';
import { assumedStocks, jointRequests } from './joints';
import { caseMargins } from './margins';
import { analyseShelves, ShelfAnalyses } from './shelves';
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
 * suggestion is worked out once and applies to all of them. ShelfAnalyses gives one analysis
 * object to every request of the same content, so that object names the group. */
function sameShelves(failing: CaseShelf[]): CaseShelf[][] {
	const groups = new Map<ShelfResult, CaseShelf[]>();
	for (const s of failing) {
		const group = groups.get(s.analysis);
		if (group) group.push(s);
		else groups.set(s.analysis, [s]);
	}
	return [...groups.values()];
}

/** A suggestion worked out for the first shelf of a group, written for every shelf of it. */
function forAll(x: CaseSuggestion, first: CaseShelf, group: CaseShelf[]): CaseSuggestion {
	const prefix = first.path.join('.');
	const n = first.path.length;
	const own = (path: DesignPath) => path.slice(0, n).join('.') === prefix;
	const keys = group.map((s) => s.path.join('.'));
	const fixes: string[] = [];
	for (const key of keys) for (const k of x.fixes) fixes.push(key + k.slice(prefix.length));
	const changes: CaseSuggestion['changes'] = [];
	for (const c of x.changes) {
		if (!own(c.path)) {
			changes.push(c);
			continue;
		}
		const rest = c.path.slice(n);
		for (const s of group) changes.push({ path: [...s.path, ...rest], value: c.value });
	}
	return { ...x, fixes, changes };
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
	const plans = new ContentMap<JointPlan>();
	const planOnce = (req: JointRequest) => {
		let plan = plans.get(req);
		if (!plan) plans.set(req, (plan = planJointSI(req)));
		return plan;
	};
	// written out, not spread: adding a key to a spread object is slow on Node 20 (issue 12)
	const joints: CaseJoint[] = requests.map((r) => ({
		id: r.id,
		path: r.path,
		where: r.where,
		joints: r.joints,
		plan: planOnce(r.req)
	}));
	const stability = checkStabilitySI(stabilityRequestOf(d, g, shelves));
	const margins = caseMargins(shelves, joints, stability);
	const failing = new Set(margins.filter((m) => !m.pass).map((m) => m.key));

	const suggestions: CaseSuggestion[] = [];
	for (const group of sameShelves(shelves.filter((s) => !s.pass))) {
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
