import type { StabilityResult } from '../stability/types';
import type { CaseJoint, CaseMargin, CaseShelf } from './types';

/** Every margin of the case, worst first; failures that are not numbers come before all others. */
export function caseMargins(
	shelves: CaseShelf[],
	joints: CaseJoint[],
	stability: StabilityResult
): CaseMargin[] {
	const out: CaseMargin[] = [];
	for (const s of shelves) {
		const key = s.path.join('.');
		out.push({
			key: `${key}:sag`,
			what: `${s.name}: sag against ${s.analysis.limit.name}`,
			path: s.path,
			margin: s.analysis.limit.margin,
			pass: s.analysis.limit.pass
		});
		out.push({
			key: `${key}:strength`,
			what: `${s.name}: bending stress against the allowed stress`,
			path: s.path,
			margin: 1 - s.analysis.strength.utilisation,
			pass: s.analysis.strength.pass
		});
	}
	for (const j of joints) {
		const noFit = j.plan.count === 0;
		out.push({
			key: `joint:${j.id}`,
			what: `${j.where}: ${j.plan.description}${noFit ? ' does not fit' : ''}`,
			path: j.path,
			margin: noFit ? null : 1 - Math.min(j.plan.utilisation, 1e6),
			pass: j.plan.pass
		});
	}
	const edges = stability.frontEdgeLoads.filter((l) => l.marginToF2057 !== null);
	if (edges.length) {
		const worst = edges.reduce((a, b) => (b.marginToF2057! < a.marginToF2057! ? b : a));
		const held = stability.restraint.adequate;
		out.push({
			key: 'stability:front-edge',
			what: `tipping: load on ${worst.where} against the 60 lb ASTM F2057-23 test weight${held && !worst.passF2057 ? ', held by the wall restraint' : ''}`,
			path: ['anchoring'],
			margin: worst.marginToF2057! - 1,
			pass: worst.passF2057 || held
		});
	}
	stability.standards.forEach((st, i) => {
		if (!st.name.startsWith('EN') || !st.applies || st.margin === null) return; // F2057: the front-edge entry above
		out.push({
			key: `stability:en14749-${i}`,
			what: `tipping: ${st.name}${!st.pass && stability.restraint.adequate ? ', held by the wall restraint' : ''}`,
			path: ['anchoring'],
			margin: st.margin - 1,
			pass: st.pass || stability.restraint.adequate
		});
	});
	if (stability.anchoring.required && !stability.restraint.adequate)
		out.push({
			key: 'stability:anchoring',
			what: stability.restraint.anchored
				? 'anchoring: the restraint is not fixed into studs'
				: 'anchoring: a case this tall must be fixed to the wall',
			path: ['anchoring'],
			margin: null,
			pass: false
		});
	return out.sort((a, b) => Number(a.pass) - Number(b.pass) || rank(a) - rank(b));
}

/** Failures first; within each group the smallest margin first, a non-number failure before all. */
const rank = (m: CaseMargin) => (m.margin === null ? (m.pass ? Infinity : -Infinity) : m.margin);
