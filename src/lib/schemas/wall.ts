/**
 * A wall of cases described once: used by POST /api/v1/walls/check, /walls/cutlist, /walls/sheets,
 * the saved wall analysis and its screen. Quantities as everywhere (strings such as `35 1/2"` or SI
 * numbers); the parsed wall is the engine's WallDesign (SI numbers under the same keys).
 */
import { z } from 'zod';
import type { SheetRequest, WallDesign } from '../engine/wall';
import { caseDesignShape, caseJointSchema, caseShelfSchema } from './case';
import { lengthField, quantityField } from './quantity';
import { materialSchema } from './shelf';

const MAX_CASE_M = 5;
const INCH = 0.0254;
const small = (description: string, max = 0.1) => lengthField({ max, description });
const place = (description: string) =>
	lengthField({ bound: 'nonnegative', max: MAX_CASE_M, description });
const gap = (description: string) => lengthField({ bound: 'nonnegative', max: 0.1, description });

const frontSchema = z.object({
	material: materialSchema,
	thickness: small('thickness of the front'),
	mount: z.enum(['overlay', 'inset']).default('overlay'),
	/** overlay mount: how far the front covers each edge of the opening */
	overlay: gap('overlay on each edge').default(0.375 * INCH),
	/** between fronts, and around an inset front */
	gap: gap('gap between fronts').default(0.125 * INCH)
});

const dividerSchema = z.object({
	name: z.string().trim().max(80).optional(),
	/** its centre, from the case's outside left face */
	at: place('centre of the divider from the case’s left face'),
	thickness: small('thickness of the divider').optional(),
	material: materialSchema.optional(),
	bottom: place('height of its lower end (default: on the bottom)').optional(),
	top: place('height of its upper end (default: under the top)').optional(),
	joint: caseJointSchema.default('dado')
});

const drawerOpeningSchema = z.object({
	name: z.string().trim().max(80).optional(),
	bay: z.number().int().min(0).max(20).optional(),
	bottom: place('height of the opening’s bottom above the floor'),
	/** each drawer's front height, lowest first */
	heights: z
		.array(lengthField({ max: 1, description: 'height of a drawer front' }))
		.min(1)
		.max(12),
	box: z.object({
		material: materialSchema,
		thickness: small('thickness of the box sides'),
		bottom: z.object({ material: materialSchema, thickness: small('thickness of the bottom') }),
		grooveDepth: gap('depth of the groove for the bottom').default(0.25 * INCH),
		corners: z.enum(['butt', 'rabbet']).default('butt'),
		heightClearance: gap('box height below the front').default(1 * INCH)
	}),
	slide: z.object({
		sideClearance: gap('room for the slide on each side').default(0.5 * INCH),
		length: lengthField({ max: 1.5, description: 'slide length' }),
		extension: z.enum(['full', 'three-quarter']).default('full')
	}),
	front: frontSchema,
	contentsWeight: quantityField('force', {
		bound: 'nonnegative',
		max: 1e4,
		description: 'what each drawer holds, e.g. 20 lb'
	}).optional()
});

const doorOpeningSchema = z.object({
	name: z.string().trim().max(80).optional(),
	bay: z.number().int().min(0).max(20).optional(),
	bottom: place('height of the opening’s bottom above the floor'),
	height: lengthField({ max: MAX_CASE_M, description: 'height of the opening' }),
	count: z.union([z.literal(1), z.literal(2)]).default(1),
	hinge: z.enum(['left', 'right']).default('left'),
	front: frontSchema
});

const wallCaseSchema = caseDesignShape
	.omit({ drawers: true, doors: true, base: true, shelves: true })
	.extend({
		shelves: z
			.array(caseShelfSchema.extend({ bay: z.number().int().min(0).max(20).optional() }))
			.max(40)
			.default([]),
		dividers: z.array(dividerSchema).max(20).default([]),
		drawers: z.array(drawerOpeningSchema).max(20).default([]),
		doors: z.array(doorOpeningSchema).max(20).default([]),
		base: z
			.object({
				height: place('height of the base'),
				setback: place('set-back of the toe kick').default(3 * INCH),
				kind: z.enum(['plinth', 'sides-to-floor']).default('plinth'),
				material: materialSchema.optional(),
				thickness: small('thickness of the base boards').optional()
			})
			.optional()
	});

const sheetStockSchema = z.object({
	/** a material id (or a material's name) as used in the wall */
	material: z.string().trim().min(1).max(80),
	length: lengthField({ max: 6, description: 'sheet length, along its grain' }).default(96 * INCH),
	width: lengthField({ max: 3, description: 'sheet width' }).default(48 * INCH),
	/** keep each part's grain along the sheet's, for looks (parts that carry load always do) */
	keepGrain: z.boolean().optional()
});

const sheetOptionsSchema = z.object({
	kerf: gap('saw kerf').default(0.125 * INCH),
	trim: gap('trim off each factory edge').default(0.25 * INCH),
	stocks: z.array(sheetStockSchema).max(20).default([])
});

const wallDesignShape = z.object({
	name: z.string().trim().max(120).optional(),
	cases: z.array(wallCaseSchema).min(1).max(12),
	sharedFaceFrame: z.boolean().default(false),
	sharedToeKick: z.boolean().default(false),
	roughAllowance: gap('rough-cut allowance on each dimension').default(0.125 * INCH),
	/** share added to the banding for waste, e.g. 0.1 for 10% */
	bandingWaste: z.number().min(0).max(1).default(0.1),
	sheets: sheetOptionsSchema.default({ kerf: 0.125 * INCH, trim: 0.25 * INCH, stocks: [] })
});

export type WallDesignInput = z.input<typeof wallDesignShape>;
type WallDesignParsed = z.output<typeof wallDesignShape>;

/** Checks across fields: parts must fit inside their case. */
export const wallDesignSchema = wallDesignShape.superRefine((w, ctx) => {
	w.cases.forEach((c, ci) => {
		const at = (...p: (string | number)[]) => ['cases', ci, ...p];
		const issue = (path: (string | number)[], message: string) =>
			ctx.addIssue({ code: 'custom', path, message });
		if (2 * c.sides.thickness >= c.width)
			issue(at('sides', 'thickness'), 'The two sides are wider than the case.');
		if ((c.faceFrame?.thickness ?? 0) + (c.back?.thickness ?? 0) >= c.depth)
			issue(at('depth'), 'The back and face frame leave no depth inside.');
		if ((c.base?.height ?? 0) >= c.height)
			issue(at('base', 'height'), 'The base must be lower than the case.');
		if ((c.base?.setback ?? 0) >= c.depth)
			issue(at('base', 'setback'), 'The set-back must be less than the depth.');
		c.shelves.forEach((s, i) => {
			if (s.height > c.height)
				issue(at('shelves', i, 'height'), 'The shelf is above the top of the case.');
		});
		c.dividers.forEach((d, i) => {
			if (d.at <= c.sides.thickness || d.at >= c.width - c.sides.thickness)
				issue(at('dividers', i, 'at'), 'The divider must stand between the sides.');
		});
		c.drawers.forEach((o, i) => {
			const top = o.bottom + o.heights.reduce((a, h) => a + h, 0);
			if (top > c.height)
				issue(at('drawers', i, 'heights'), 'The drawers reach above the top of the case.');
			if (o.box.heightClearance >= Math.min(...o.heights))
				issue(
					at('drawers', i, 'box', 'heightClearance'),
					'The clearance leaves no box under a front.'
				);
			if (o.slide.length > c.depth)
				issue(at('drawers', i, 'slide', 'length'), 'The slide is longer than the case is deep.');
		});
		c.doors.forEach((o, i) => {
			if (o.bottom + o.height > c.height)
				issue(at('doors', i, 'height'), 'The door opening reaches above the top of the case.');
		});
	});
});

/** The engine's wall from the parsed body (the sheet options travel separately). */
export function toWallDesign(w: WallDesignParsed): WallDesign {
	const { sheets: _sheets, ...design } = w;
	return design;
}

/** The sheet stock and saw from the parsed body, for wallSheets. */
export function toSheetRequest(w: WallDesignParsed): SheetRequest {
	return {
		kerfM: w.sheets.kerf,
		trimM: w.sheets.trim,
		stocks: w.sheets.stocks.map((s) => ({
			material: s.material,
			lengthM: s.length,
			widthM: s.width,
			keepGrain: s.keepGrain
		}))
	};
}
