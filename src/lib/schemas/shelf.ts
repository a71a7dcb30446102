/**
 * The shelf request, once: used by the API routes, the forms and src/lib/compute.ts. Quantities
 * arrive as strings or SI numbers and leave as SI numbers in the engine's input types
 * (src/lib/engine/shelf/types.ts).
 */
import { z } from 'zod';
import { DEFLECTION_LIMITS, geometryIssues, type NamedLimit } from '../engine/shelf';
import { lengthField, quantityField } from './quantity';

/** Guards against unit slips (e.g. 900 m meant as 900 mm); no shelf is this large. */
export const MAX_SPAN_M = 10;
const MAX_DEPTH_M = 2;
const MAX_THICKNESS_M = 0.3;
const MAX_DIVIDER_M = 0.1;

const positiveLength = (max: number, description?: string) =>
	lengthField({ bound: 'positive', max, description });
const position = (description: string) =>
	lengthField({ bound: 'nonnegative', max: MAX_SPAN_M * 12, description });

const customMaterialSchema = z.object({
	name: z.string().trim().min(1).max(80),
	/** modulus of elasticity with the grain (or of the panel's face grain) */
	modulus: quantityField('modulus', { max: 1e11 }),
	/** modulus across the grain; when absent the material is taken as the same both ways */
	modulusAcross: quantityField('modulus', { max: 1e11 }).optional(),
	/** modulus of rupture (bending strength) */
	rupture: quantityField('modulus', { max: 1e10 }),
	density: quantityField('density', { max: 3000 }),
	shearModulus: quantityField('modulus', { max: 1e11 }).optional(),
	/** long-term sag over instant sag under permanent load, e.g. 1.6 (at least 1) */
	creepFactor: z.number().min(1).max(10).optional()
});

/** A library id (see GET /api/v1/materials) or a material given by its figures. */
export const materialSchema = z.union([z.string().trim().min(1).max(60), customMaterialSchema], {
	error:
		'Expected a library material id (GET /api/v1/materials) or { name, modulus, rupture, density }.'
});

const supportSchema = z.union(
	[
		z.enum(['simple', 'fixed', 'cantilever']),
		z.object({
			/**
			 * lengths of the spans, left to right (a shelf over dividers): clear spans between the
			 * faces of the supports when `divider` is given, else from support to support
			 */
			spans: z.array(positiveLength(MAX_SPAN_M)).min(2).max(12),
			/** how the two outer ends are held (default: simply supported) */
			ends: z.enum(['simple', 'fixed']).default('simple'),
			/**
			 * thickness of each divider; each span next to one is checked over half of it more (the
			 * shelf taken as resting at the divider's centre). Left out: spans from support to support
			 */
			divider: positiveLength(MAX_DIVIDER_M, 'thickness of each divider').optional()
		})
	],
	{
		error:
			"Expected 'simple', 'fixed', 'cantilever' or { spans: [two or more lengths], ends, divider }."
	}
);

const areaLoadSchema = z.object({
	kind: z.literal('area'),
	/** over the whole top of the shelf, e.g. `40 lbf/ft^2` */
	pressure: quantityField('pressure', { bound: 'nonnegative', max: 1e6 })
});
const lineLoadSchema = z.object({
	kind: z.literal('line'),
	/** along the shelf, e.g. `20 lbf/ft` */
	intensity: quantityField('lineLoad', { bound: 'nonnegative', max: 1e7 }),
	from: position('start, measured from the left end (the wall for a cantilever)').optional(),
	to: position('end, measured from the left end (the wall for a cantilever)').optional()
});
const pointLoadSchema = z.object({
	kind: z.literal('point'),
	force: quantityField('force', { bound: 'nonnegative', max: 1e6 }),
	at: position('position, measured from the left end (the wall for a cantilever)')
});
export const loadSchema = z.discriminatedUnion('kind', [
	areaLoadSchema,
	lineLoadSchema,
	pointLoadSchema
]);

export const edgeSchema = z.object({
	/** front or back: glued to that edge, top flush with the panel; below: a cleat under it */
	side: z.enum(['front', 'back', 'below']),
	material: materialSchema,
	/** vertical size of the strip */
	height: positiveLength(0.5),
	/** horizontal size of the strip, across the shelf's depth */
	thickness: positiveLength(0.3)
});

/** The limits offered by name: the engine's one list (engine/shelf/limits.ts). */
const namedLimits = Object.keys(DEFLECTION_LIMITS) as [NamedLimit, ...NamedLimit[]];

/**
 * "0.02in-per-ft" was offered until it was found to have no publisher. Analyses saved with it
 * still open: 0.02" per foot is exactly L/600 (0.02 / 12 = 1/600), so they are read as L/600 and
 * the result's limit source says why.
 */
export const RETIRED_PER_FOOT_LIMIT = '0.02in-per-ft';
export const RETIRED_PER_FOOT_AS_RATIO = {
	ratio: 600,
	source:
		'L/600, the same sag as 0.02" per foot, the limit this analysis was saved with; that preset is no longer offered because it has no published source'
};

export const limitSchema = z.union(
	[
		z.enum(namedLimits),
		z.literal(RETIRED_PER_FOOT_LIMIT).transform(() => ({ ...RETIRED_PER_FOOT_AS_RATIO })),
		z.object({ ratio: z.number().min(10).max(10000) }),
		z.object({ length: positiveLength(1) })
	],
	{
		error: `Expected ${Object.keys(DEFLECTION_LIMITS).join(', ')}, { ratio: n } for L/n, or { length }.`
	}
);

const optionsSchema = z.object({
	/** add shear deflection to bending (default true) */
	shearDeflection: z.boolean().default(true),
	/** divide the modulus of rupture by this to get the allowed bending stress (default 3) */
	safetyFactor: z.number().min(1).max(20).default(3),
	/** points on the deflected curve (default 101) */
	curvePoints: z.number().int().min(101).max(2001).default(101)
});

const baseShape = {
	span: positiveLength(MAX_SPAN_M, 'clear span between supports (or the reach of a cantilever)'),
	depth: positiveLength(MAX_DEPTH_M, 'front-to-back depth of the panel'),
	thickness: positiveLength(MAX_THICKNESS_M, 'actual thickness of the panel'),
	material: materialSchema,
	/** face grain (or wood grain) along the span or across it */
	grain: z.enum(['along', 'across']).default('along'),
	support: supportSchema.default('simple'),
	loads: z.array(loadSchema).max(50).default([]),
	selfWeight: z.boolean().default(true),
	edges: z.array(edgeSchema).max(3).default([]),
	/** long: the loads stay for months or years (books), so creep counts; short: brief loads */
	duration: z.enum(['short', 'long']).default('long'),
	/** dry: heated indoor room; humid: unheated or damp room; wet: exposed to weather */
	service: z.enum(['dry', 'humid', 'wet']).default('dry'),
	limit: limitSchema.default('L/144'),
	options: optionsSchema.default({ shearDeflection: true, safetyFactor: 3, curvePoints: 101 })
};

const baseSchema = z.object({ ...baseShape, span: baseShape.span.optional() });

/** Checks that need several fields at once (the engine's geometryIssues); every issue names its field. */
function checkGeometry(
	value: Parameters<typeof geometryIssues>[0],
	ctx: z.RefinementCtx,
	spanNeeded: boolean
) {
	for (const issue of geometryIssues(value, spanNeeded))
		ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
}

/** analyzeShelf (src/lib/compute.ts) and POST /api/v1/shelf */
export const shelfRequestSchema = baseSchema.superRefine((v, ctx) => checkGeometry(v, ctx, true));

/** maxSpan: the span is what is sought (for several spans, their proportions are kept) */
export const maxSpanRequestSchema = z
	.object({ ...baseShape, span: baseShape.span.optional() })
	.superRefine((v, ctx) => checkGeometry({ ...v, span: undefined }, ctx, false));

/** minThickness: the thickness is what is sought, from the stocked or the given thicknesses */
export const minThicknessRequestSchema = z
	.object({
		...baseShape,
		span: baseShape.span.optional(),
		thickness: baseShape.thickness.optional(),
		candidates: z.array(positiveLength(MAX_THICKNESS_M)).min(1).max(40).optional()
	})
	.superRefine((v, ctx) => checkGeometry(v, ctx, true));

/** minEdge: the smallest height of a strip of given thickness and material that meets the limit */
export const minEdgeRequestSchema = z
	.object({
		...baseShape,
		span: baseShape.span.optional(),
		strip: edgeSchema.omit({ height: true }).extend({
			side: z.enum(['front', 'back', 'below']).default('front'),
			/** tallest strip worth trying (default 6") */
			maxHeight: positiveLength(0.5).optional()
		})
	})
	.superRefine((v, ctx) => checkGeometry(v, ctx, true));

/** maxLoad: the largest magnitude of one load of the given shape (other loads stay as given) */
export const maxLoadRequestSchema = z
	.object({
		...baseShape,
		span: baseShape.span.optional(),
		load: z.discriminatedUnion('kind', [
			z.object({ kind: z.literal('area') }),
			z.object({ kind: z.literal('line'), from: areaFree('from'), to: areaFree('to') }),
			z.object({
				kind: z.literal('point'),
				at: position('position of the load, from the left end')
			})
		])
	})
	.superRefine((v, ctx) => checkGeometry(v, ctx, true));

function areaFree(end: 'from' | 'to') {
	return position(`${end === 'from' ? 'start' : 'end'} of the load, from the left end`).optional();
}

export type ShelfRequest = z.input<typeof shelfRequestSchema>;
export type MaxSpanRequest = z.input<typeof maxSpanRequestSchema>;
export type MinThicknessRequest = z.input<typeof minThicknessRequestSchema>;
export type MinEdgeRequest = z.input<typeof minEdgeRequestSchema>;
export type MaxLoadRequest = z.input<typeof maxLoadRequestSchema>;
/** a material as people and programs write it: an id, or figures as quantity strings */
export type {
	CustomMaterial,
	EdgeInput,
	LimitInput,
	LoadInput,
	ShelfInput,
	SupportInput
} from '../engine/shelf';
