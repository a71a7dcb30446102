/**
 * The joint request, once: used by planJoint, POST /api/v1/joints and the forms. Quantities arrive
 * as strings (`3/4"`, `200 lbf`, `15 N m`) or SI numbers and leave as SI numbers in the engine's
 * shape (keys ending in M, N, NM).
 */
import { z } from 'zod';
import { STOCK_HOLDING } from '../../../reference/stock-holding';
import { FASTENER_KINDS, JOINT_KINDS, type JointRequest } from '../engine/joinery/types';
import { lengthField, quantityField } from './quantity';

const stockIds = STOCK_HOLDING.map((s) => s.id);

/** A stock id (the shelf materials' ids where they match) or a stock by kind and specific gravity. */
const stockSchema = z.union([
	z.enum(stockIds as [string, ...string[]]),
	z.object({
		name: z.string().trim().min(1).max(80).optional(),
		kind: z.enum(['hardwood', 'softwood', 'plywood', 'mdf', 'particleboard']),
		specificGravity: z.number().min(0.1).max(1.5)
	})
]);

const jointStockSchema = z.object({
	material: stockSchema,
	thickness: lengthField({ max: 0.3, description: 'actual thickness of the piece' })
});

const jointKindSchema = z.enum(JOINT_KINDS);
const fastenerKindSchema = z.enum(FASTENER_KINDS);

const jointDemandSchema = z.object({
	/** the reaction this joint carries (from the shelf analysis), e.g. `45 lbf` */
	shear: quantityField('force', { bound: 'nonnegative', max: 1e6 }).optional(),
	/** the end moment of a shelf taken as fixed, e.g. `150 lbf in`; its size counts, not its sign */
	moment: quantityField('moment', { bound: 'any', max: 1e6 }).optional()
});

const jointOptionsSchema = z.object({
	count: z.number().int().min(1).max(200).optional(),
	screwGauge: z.number().int().min(4).max(14).optional(),
	screwLength: lengthField({ max: 0.3 }).optional(),
	pinDiameter: lengthField({ max: 0.02 }).optional(),
	dadoDepth: lengthField({ max: 0.05 }).optional()
});

/** A joint as people and programs send it; stored in this shape (SI numbers). */
export const jointShape = z.object({
	kind: jointKindSchema,
	fastener: fastenerKindSchema,
	/** length of the meeting line, usually the shelf depth */
	length: lengthField({ max: 3, description: 'length of the joint, usually the shelf depth' }),
	/** the piece whose end or edge meets the other: shelf, top, bottom, rail, divider */
	endPiece: jointStockSchema,
	/** the piece whose face receives it: case side, stile, the shelf under a divider */
	facePiece: jointStockSchema,
	demand: jointDemandSchema.optional(),
	options: jointOptionsSchema.optional()
});

export type JointInput = z.input<typeof jointShape>;

/** A parsed joint in the engine's SI shape. */
export const toJointRequest = (j: z.output<typeof jointShape>): JointRequest => ({
	kind: j.kind,
	fastener: j.fastener,
	lengthM: j.length,
	endPiece: { material: j.endPiece.material, thicknessM: j.endPiece.thickness },
	facePiece: { material: j.facePiece.material, thicknessM: j.facePiece.thickness },
	demand: { shearN: j.demand?.shear ?? 0, momentNM: Math.abs(j.demand?.moment ?? 0) },
	options: {
		count: j.options?.count,
		screwGauge: j.options?.screwGauge,
		screwLengthM: j.options?.screwLength,
		pinDiameterM: j.options?.pinDiameter,
		dadoDepthM: j.options?.dadoDepth
	}
});

/** POST /api/v1/joints and planJoint */
export const jointRequestSchema = jointShape.transform(toJointRequest);
