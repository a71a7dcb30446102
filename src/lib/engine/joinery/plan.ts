import { planBiscuits } from './biscuits';
import { resolveStock } from './capacity';
import { GOOD_PRACTICE, JOINT_CAUTIONS } from './cautions';
import type { FastenerPart, PlanContext } from './part';
import { planPocketScrews, planThroughScrews } from './screws';
import { planDado, planShelfPins } from './supports';
import { JOINT_KINDS, type FastenerKind, type JointPlan, type JointRequest } from './types';
import { InputError } from '../errors';
import { nonNegative, positive } from './validate';

const PLANNERS: Record<FastenerKind, (ctx: PlanContext) => FastenerPart> = {
	biscuit: planBiscuits,
	'pocket-screw': planPocketScrews,
	screw: planThroughScrews,
	'shelf-pin': planShelfPins,
	dado: planDado
};

/**
 * Plan one joint (SI numbers): the fasteners, where they go, what each holds and what the joint
 * must carry. Throws InputError naming a bad field. An estimate for planning; every result
 * carries the cautions.
 */
export function planJointSI(req: JointRequest): JointPlan {
	if (!(JOINT_KINDS as readonly string[]).includes(req.kind))
		throw InputError.at('kind', `expected one of ${JOINT_KINDS.join(', ')}`);
	const planner = PLANNERS[req.fastener];
	if (!planner)
		throw InputError.at('fastener', `expected one of ${Object.keys(PLANNERS).join(', ')}`);
	positive(req.lengthM, 'lengthM');
	positive(req.endPiece?.thicknessM, 'endPiece.thicknessM');
	positive(req.facePiece?.thicknessM, 'facePiece.thicknessM');
	const o = req.options ?? {};
	if (o.count !== undefined && (!Number.isInteger(o.count) || o.count < 1 || o.count > 200))
		throw InputError.at('options.count', 'expected a whole number from 1 to 200');
	if (
		o.screwGauge !== undefined &&
		(!Number.isInteger(o.screwGauge) || o.screwGauge < 4 || o.screwGauge > 14)
	)
		throw InputError.at('options.screwGauge', 'expected a whole screw gauge from 4 to 14');
	for (const k of ['screwLengthM', 'pinDiameterM', 'dadoDepthM'] as const)
		if (o[k] !== undefined) positive(o[k], `options.${k}`);
	const ctx: PlanContext = {
		req,
		end: resolveStock(req.endPiece.material, 'endPiece.material'),
		face: resolveStock(req.facePiece.material, 'facePiece.material'),
		shearN: nonNegative(req.demand?.shearN ?? 0, 'demand.shearN'),
		momentNM: Math.abs(nonNegative(Math.abs(req.demand?.momentNM ?? 0), 'demand.momentNM'))
	};
	const part = planner(ctx);
	const utilisation = part.checks.reduce((m, c) => Math.max(m, c.utilisation), 0);
	return {
		estimate: true,
		kind: req.kind,
		fastener: req.fastener,
		...part,
		demand: { shearN: ctx.shearN, momentNM: ctx.momentNM },
		utilisation,
		pass: part.checks.every((c) => c.pass) && part.count > 0,
		notes: [...part.notes, ...goodPractice(ctx)],
		cautions: JOINT_CAUTIONS,
		sources: [...new Set(part.checks.map((c) => c.basis))]
	};
}

function goodPractice(ctx: PlanContext): string[] {
	const out: string[] = [];
	const f = ctx.req.fastener;
	if (f === 'biscuit') out.push(GOOD_PRACTICE.biscuit);
	if (f === 'pocket-screw') out.push(GOOD_PRACTICE.pocket);
	const screwed = f === 'pocket-screw' || f === 'screw';
	const fibre = (k: string) => k === 'mdf' || k === 'particleboard';
	if (screwed && (fibre(ctx.end.kind) || fibre(ctx.face.kind))) out.push(GOOD_PRACTICE.mdfEdge);
	if (screwed && (ctx.end.isPanel || ctx.face.isPanel)) out.push(GOOD_PRACTICE.panelCorner);
	if (f === 'screw' && !ctx.end.isPanel) out.push(GOOD_PRACTICE.endGrain);
	if (ctx.momentNM > 0) out.push(GOOD_PRACTICE.partialFixity);
	return out;
}
