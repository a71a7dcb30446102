/**
 * A whole case described once: used by checkCase, POST /api/v1/cases/check and the forms.
 * Quantities as in the shelf engine (strings such as `35 1/2"` or SI numbers); the parsed design
 * has SI numbers under the same keys, so a suggested change (a path and an SI value) can be written
 * straight back into the design the user typed.
 */
import { z } from 'zod';
import { lengthField } from './quantity';
import { limitSchema, loadSchema, materialSchema } from './shelf';
import { stabilityShape } from './stability';

const MAX_CASE_M = 5;
const size = (description: string) => lengthField({ max: MAX_CASE_M, description });
const thickness = (description: string) => lengthField({ max: 0.1, description });
const place = (description: string) =>
	lengthField({ bound: 'nonnegative', max: MAX_CASE_M, description });

/** How a shelf, top or bottom is joined to the case sides. */
export const caseJointSchema = z.enum(['biscuit', 'pocket-screw', 'screw', 'dado']);

const panelSchema = z.object({
	material: materialSchema,
	thickness: thickness('actual thickness')
});

const endPanelSchema = z.object({
	/** default: the sides' material and thickness */
	material: materialSchema.optional(),
	thickness: thickness('actual thickness').optional(),
	joint: caseJointSchema.default('biscuit'),
	/** fasteners per end instead of the planned number */
	jointCount: z.number().int().min(1).max(60).optional(),
	/** what it carries, as in the shelf engine (none by default) */
	loads: z.array(loadSchema).max(20).default([])
});

const nosingSchema = z.object({
	material: materialSchema,
	/** vertical size of the strip */
	height: thickness('height of the nosing'),
	/** front-to-back size of the strip */
	thickness: thickness('thickness of the nosing')
});

export const caseShelfSchema = z.object({
	name: z.string().trim().max(80).optional(),
	/** height of the shelf's top face above the floor */
	height: place('height of the shelf top above the floor'),
	kind: z.enum(['fixed', 'adjustable']).default('adjustable'),
	material: materialSchema.optional(),
	thickness: thickness('actual thickness').optional(),
	/** fixed shelves: how it is joined to the sides */
	joint: caseJointSchema.default('biscuit'),
	jointCount: z.number().int().min(1).max(60).optional(),
	/** fixed shelves: take the ends as fixed (the joint must then carry the end moment) */
	ends: z.enum(['simple', 'fixed']).default('simple'),
	loads: z.array(loadSchema).max(20).default([]),
	nosing: nosingSchema.optional(),
	/** height of what stands on it, for the centre of gravity */
	itemHeight: place('height of the items on the shelf').optional()
});

const faceFrameSchema = z.object({
	material: materialSchema,
	thickness: thickness('thickness of the frame'),
	stileWidth: thickness('width of a stile'),
	railWidth: thickness('width of a rail'),
	/** how rails meet stiles */
	joint: z.enum(['pocket-screw', 'biscuit']).default('pocket-screw'),
	/** how the frame meets the case front */
	attach: z.enum(['biscuit', 'pocket-screw']).default('biscuit')
});

export const caseDesignShape = z.object({
	name: z.string().trim().max(120).optional(),
	/** overall outside sizes; the depth includes the back and any face frame */
	width: size('overall width'),
	height: size('overall height'),
	depth: size('overall depth, back and face frame included'),
	sides: panelSchema,
	top: endPanelSchema.default({ joint: 'biscuit', loads: [] }),
	bottom: endPanelSchema.default({ joint: 'biscuit', loads: [] }),
	/** a back fitted in a rabbet in the sides, or applied over the back edges */
	back: panelSchema.extend({ fitted: z.enum(['rabbet', 'applied']).default('rabbet') }).optional(),
	shelves: z.array(caseShelfSchema).max(40).default([]),
	faceFrame: faceFrameSchema.optional(),
	/** a plinth or feet: the bottom sits at `height`, the front support line is `setback` behind the front */
	base: z
		.object({
			height: place('height of the base').optional(),
			setback: place('set-back of the front support').optional()
		})
		.optional(),
	drawers: stabilityShape.shape.drawers,
	doors: stabilityShape.shape.doors,
	floorTiltDeg: z.number().min(0).max(15).optional(),
	anchoring: stabilityShape.shape.anchoring,
	seismicRegion: z.boolean().optional(),
	limit: limitSchema.default('L/144'),
	service: z.enum(['dry', 'humid', 'wet']).default('dry')
});

export type CaseDesignInput = z.input<typeof caseDesignShape>;
export type { CaseDesign } from '../engine/case/types';

/** Checks across fields: parts must fit inside the case. */
export const caseDesignSchema = caseDesignShape.superRefine((d, ctx) => {
	if (2 * d.sides.thickness >= d.width)
		ctx.addIssue({
			code: 'custom',
			path: ['sides', 'thickness'],
			message: 'The two sides are wider than the case.'
		});
	const frame = d.faceFrame?.thickness ?? 0;
	const back = d.back?.thickness ?? 0;
	if (frame + back >= d.depth)
		ctx.addIssue({
			code: 'custom',
			path: ['depth'],
			message: 'The back and face frame leave no depth inside.'
		});
	d.shelves.forEach((s, i) => {
		if (s.height > d.height)
			ctx.addIssue({
				code: 'custom',
				path: ['shelves', i, 'height'],
				message: 'The shelf is above the top of the case.'
			});
	});
	if ((d.base?.setback ?? 0) >= d.depth)
		ctx.addIssue({
			code: 'custom',
			path: ['base', 'setback'],
			message: 'The set-back must be less than the depth.'
		});
	if ((d.base?.height ?? 0) >= d.height)
		ctx.addIssue({
			code: 'custom',
			path: ['base', 'height'],
			message: 'The base must be lower than the case.'
		});
});
