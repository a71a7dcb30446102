/**
 * A divider carries the shelves on both sides of it: each shelf in the bay to its left or right
 * bears on it with its end reaction, and a shelf running over it bears with its reaction at that
 * support (both from the shelf engine). The divider is checked as a column: a panel as deep as
 * the inside of the case and as thick as the divider, pinned at both ends (conservative: a dado
 * or a joint holds it more), with Euler's elastic buckling load P = π²·E·I / H² (Timoshenko &
 * Gere, Theory of Elastic Stability, §2.1; the formula is standard, the citation from memory).
 * E is the stiffness along the grain, which the cut list keeps along the divider's height (it
 * carries load), reduced for creep under a lasting load (E / (1 + k_def), Eurocode 5 Table 3.2 as
 * the shelves use it), and the load must stay under a
 * third of P (a factor of safety of 3: a choice of this tool, no source). The divider's own weight
 * and crushing where it bears are left out: for panels of shelf thickness buckling governs.
 */
import { resolveMaterial } from '../shelf/model';
import type { CaseMargin } from '../case/types';
import type { WallCaseGeometry } from './geometry';
import type { WallCaseDesign, WallShelfCheck } from './types';

const DIVIDER_SAFETY_FACTOR = 3;
const SERVICE = { dry: 0, humid: 1, wet: 2 } as const;

export interface DividerCheck {
	index: number;
	name: string;
	/** downward load from the shelves bearing on it, N */
	loadN: number;
	/** elastic buckling load, N, and the load allowed (a third of it) */
	bucklingN: number;
	allowedN: number;
	/** the shelves that bear on it */
	shelves: string[];
	margin: number;
	pass: boolean;
}

export function checkDividers(
	c: WallCaseDesign,
	g: WallCaseGeometry,
	xCase: number,
	shelves: WallShelfCheck[]
): DividerCheck[] {
	return g.dividers.map((dv, k) => {
		const name = dv.design.name ?? `divider ${dv.index + 1}`;
		const x = xCase + dv.xM;
		let loadN = 0;
		const on: string[] = [];
		for (const s of shelves) {
			const z = s.heightM;
			if (z < dv.bottomM - 1e-6 || z > dv.topM + s.thicknessM + 1e-6) continue;
			const left = s.xM;
			const right = s.xM + s.spansM.reduce((a, b) => a + b, 0);
			const reactions = s.analysis.reactions;
			if (!reactions.length) continue;
			let r = 0;
			// a shelf in the bay just left or right of the divider (bays in order across the case) bears with its nearer end
			if (s.bay === k) r = reactions[reactions.length - 1].force;
			else if (s.bay === k + 1) r = reactions[0].force;
			else if (s.bay === null && left < x && x < right) {
				// a shelf over it: the reaction of the support nearest the divider's centre
				const at = x - left;
				const near = reactions.reduce((a, b) =>
					Math.abs(b.at - at) < Math.abs(a.at - at) ? b : a
				);
				if (Math.abs(near.at - at) <= dv.thicknessM) r = near.force;
			}
			if (r > 0) {
				loadN += r;
				on.push(s.name);
			}
		}
		const issues: { path: (string | number)[]; message: string }[] = [];
		const m = resolveMaterial(dv.design.material ?? c.sides.material, ['material'], issues);
		const kdef = m ? (m.creep[SERVICE[c.service ?? 'dry']] ?? m.creep[0] ?? 0) : 0;
		const e = m ? m.modulusAlongPa : 0;
		const I = (g.insideDepthM * dv.thicknessM ** 3) / 12;
		const H = Math.max(1e-3, dv.topM - dv.bottomM);
		const bucklingN = (Math.PI ** 2 * (e / (1 + kdef)) * I) / H ** 2;
		const allowedN = bucklingN / DIVIDER_SAFETY_FACTOR;
		const margin = loadN > 0 ? allowedN / loadN - 1 : 1;
		return {
			index: dv.index,
			name,
			loadN,
			bucklingN,
			allowedN,
			shelves: on,
			margin,
			pass: margin >= 0
		};
	});
}

/** The dividers' margins, in the case's list. */
export function dividerMargins(checks: DividerCheck[]): CaseMargin[] {
	return checks.map((d) => ({
		key: `dividers.${d.index}:column`,
		what: `${d.name}: the shelves on both sides against a third of its buckling load`,
		path: ['dividers', d.index],
		margin: d.margin,
		pass: d.pass
	}));
}

/** For a divider that fails: the thickness that carries the load (the load grows with nothing but
 * the shelves, the buckling load with the cube of the thickness), rounded up to the next 1/16". */
export function dividerSuggestions(checks: DividerCheck[], thicknessOf: (i: number) => number) {
	const sixteenth = 0.0254 / 16;
	return checks
		.filter((d) => !d.pass && d.loadN > 0)
		.map((d) => {
			const t0 = thicknessOf(d.index);
			const t = Math.ceil((t0 * Math.cbrt(d.loadN / d.allowedN)) / sixteenth - 1e-9) * sixteenth;
			return {
				title: `Make ${d.name} thicker`,
				detail: `A divider ${t.toFixed(4)} m thick carries the shelves on both sides with a factor of 3 on its buckling load.`,
				fixes: [`dividers.${d.index}:column`],
				changes: [{ path: ['dividers', d.index, 'thickness'], value: t }],
				verified: false
			};
		});
}
