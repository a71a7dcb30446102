import { findMaterial } from '../../../../reference/materials';
import { InputError } from '../errors';
import { formatLength } from '../units/length';
import { planJointSI } from '../joinery/plan';
import type { JointRequest } from '../joinery/types';
import type { MaxSpanInput } from '../shelf/types';
import { maxSpanInput, minEdgeInput } from '../shelf/solvers';
import type { CaseGeometry } from './geometry';
import { asShelf, shelfRequest, type ShelfAnalyses, type ShelfChange } from './shelves';
import type { CaseDesign, CaseJoint, CaseShelf, CaseSuggestion, DesignPath } from './types';
import { METRES_PER_INCH } from '../units/length';

const INCH = METRES_PER_INCH;
const SIXTEENTH = INCH / 16;
/** A 3/4" solid-wood nosing is the usual strip (common practice, no source); red oak when the shelf
 * itself is not solid wood (a choice of this tool). */
const NOSING_THICKNESS_M = 0.75 * INCH;
const NOSING_FALLBACK = 'red-oak';
const len = (m: number) => formatLength(m, { unit: 'frac16' });

type DesignShelf = CaseDesign['shelves'][number];

function designShelf(d: CaseDesign, path: DesignPath): DesignShelf {
	return path[0] === 'shelves'
		? d.shelves[path[1] as number]
		: asShelf(d, path[0] as 'top' | 'bottom');
}

/** Thicker stock, a nosing, a shorter span: each checked by a fresh analysis of that shelf. */
export function shelfSuggestions(
	d: CaseDesign,
	g: CaseGeometry,
	runs: ShelfAnalyses,
	shelf: CaseShelf,
	label = shelf.name
): CaseSuggestion[] {
	const out: CaseSuggestion[] = [];
	const s = designShelf(d, shelf.path);
	const key = shelf.path.join('.');
	const fixes = [`${key}:sag`, `${key}:strength`].filter((k) =>
		k.endsWith('sag') ? !shelf.analysis.limit.pass : !shelf.analysis.strength.pass
	);
	const passes = (change: ShelfChange) => {
		const a = runs.run(shelfRequest(d, g, s, change), shelf.path);
		return a.limit.pass && a.strength.pass;
	};
	const material = s.material ?? d.sides.material;
	const lib = typeof material === 'string' ? findMaterial(material) : undefined;

	const thicker = lib?.thicknesses
		.filter((t) => t.actualM > shelf.thicknessM + 1e-6)
		.sort((a, b) => a.actualM - b.actualM)
		.find((t) => passes({ thickness: t.actualM }));
	if (thicker)
		out.push({
			title: `Make ${label} ${thicker.label} thick`,
			detail: `${lib!.name} is stocked at ${thicker.label} (${len(thicker.actualM)} actual); at that thickness the shelf meets the limit and the allowed stress.`,
			fixes,
			changes: [{ path: [...shelf.path, 'thickness'], value: thicker.actualM }],
			verified: true
		});

	if (!s.nosing) {
		const nosingMaterial = lib?.kind === 'solid' ? material : NOSING_FALLBACK;
		try {
			const base = shelfRequest(d, g, s, {
				nosing: { material: nosingMaterial, height: 0.01, thickness: NOSING_THICKNESS_M }
			});
			base.edges = [];
			const found = minEdgeInput(
				Object.assign(base, {
					strip: { side: 'front' as const, material: nosingMaterial, thickness: NOSING_THICKNESS_M }
				})
			);
			if (found.heightRounded !== null) {
				const nosing = {
					material: nosingMaterial,
					height: found.heightRounded,
					thickness: NOSING_THICKNESS_M
				};
				out.push({
					title: `Glue a ${len(nosing.height)} × 3/4" nosing to the front of ${label}`,
					detail: `A solid-wood strip (${findMaterial(String(nosingMaterial))?.name ?? 'solid wood'}), ${len(nosing.height)} tall and 3/4" thick, glued along the front edge; the panel behind it gets 3/4" shallower.`,
					fixes,
					changes: [{ path: [...shelf.path, 'nosing'], value: nosing }],
					verified: passes({ nosing })
				});
			}
		} catch (e) {
			// no nosing of a sensible height does it: say nothing rather than guess
			if (!(e instanceof InputError)) throw e;
		}
	}

	try {
		const request: MaxSpanInput = shelfRequest(d, g, s);
		request.span = undefined;
		const longest = maxSpanInput(request).span;
		const width = Math.floor((longest + 2 * d.sides.thickness) / SIXTEENTH) * SIXTEENTH;
		if (width < d.width - 1e-3 && width - 2 * d.sides.thickness > 0.05)
			out.push({
				title: `Narrow the case to ${len(width)}, or add a divider`,
				detail: `The longest span this shelf carries within the limit is ${len(longest)}; a case ${len(width)} wide, or a divider so that no span exceeds it, keeps every shelf of this make within it.`,
				fixes,
				changes: [{ path: ['width'], value: width }],
				verified: passes({ spanM: width - 2 * d.sides.thickness })
			});
	} catch (e) {
		// the span solver found no span: the thickness suggestion above is the one to follow
		if (!(e instanceof InputError)) throw e;
	}
	return out;
}

/** Another fastener, a dado, or simple ends: each checked by planning the joint again. */
export function jointSuggestions(
	joint: CaseJoint,
	req: JointRequest,
	d: CaseDesign,
	g: CaseGeometry,
	runs: ShelfAnalyses
): CaseSuggestion[] {
	const out: CaseSuggestion[] = [];
	const fixes = [`joint:${joint.id}`];
	const onShelf = joint.path[0] !== 'faceFrame';
	const f = req.fastener;
	if (
		onShelf &&
		(f === 'biscuit' || f === 'pocket-screw' || f === 'screw') &&
		joint.plan.count > 0
	) {
		for (let n = joint.plan.count + 1; n <= Math.min(60, joint.plan.count * 4 + 4); n++) {
			if (!planJointSI({ ...req, options: { ...req.options, count: n } }).pass) continue;
			out.push({
				title: `Use ${n} fasteners at each end of the ${joint.where.split(',')[0]}`,
				detail: `${n} × ${joint.plan.description} per end carries the demand.`,
				fixes,
				changes: [{ path: [...joint.path, 'jointCount'], value: n }],
				verified: true
			});
			break;
		}
	}
	if (onShelf && f !== 'dado') {
		const asDado = { ...req, fastener: 'dado' as const, options: {} };
		const plan = planJointSI(asDado);
		if (plan.pass)
			out.push({
				title: `Set the ${joint.where.split(',')[0]} in a dado`,
				detail: `A ${plan.description} in each side carries the shelf by bearing${req.demand?.momentNM ? '; its end is then taken as simply supported' : ''}.`,
				fixes,
				changes: [
					...(f === 'shelf-pin' ? [{ path: [...joint.path, 'kind'], value: 'fixed' }] : []),
					{ path: [...joint.path, 'joint'], value: 'dado' },
					...(req.demand?.momentNM ? [{ path: [...joint.path, 'ends'], value: 'simple' }] : [])
				],
				verified: true
			});
	}
	if (onShelf && (req.demand?.momentNM ?? 0) > 0 && joint.path[0] === 'shelves') {
		const s = designShelf(d, joint.path);
		const a = runs.run(shelfRequest(d, g, s, { ends: 'simple' }), joint.path);
		const plan = planJointSI({ ...req, demand: { ...req.demand, momentNM: 0 } });
		out.push({
			title: `Plan the ${joint.where.split(',')[0]} as simply supported`,
			detail:
				'The joint cannot hold the end moment of a fixed shelf; taken as simply supported (the usual, safer assumption) the joint carries only the reaction.',
			fixes,
			changes: [{ path: [...joint.path, 'ends'], value: 'simple' }],
			verified: plan.pass && a.limit.pass && a.strength.pass
		});
	}
	if (!onShelf && joint.plan.count === 0 && f === 'biscuit') {
		const plan = planJointSI({ ...req, fastener: 'pocket-screw', options: {} });
		out.push({
			title: 'Join the face-frame rails with pocket screws',
			detail: 'The rails are too narrow for a biscuit slot.',
			fixes,
			changes: [{ path: ['faceFrame', 'joint'], value: 'pocket-screw' }],
			verified: plan.pass
		});
	}
	return out;
}

export function anchoringSuggestion(fixes: string[]): CaseSuggestion {
	return {
		title: 'Fix the case to the wall',
		detail:
			'L-brackets or a strap at the top, screwed at least 2" into studs (FEMA, Anchor Tall Bookcases and File Cabinets, 2008), with a restraint tested to ASTM F3096.',
		fixes,
		changes: [{ path: ['anchoring'], value: { kind: 'bracket', intoStuds: true } }],
		verified: true
	};
}
