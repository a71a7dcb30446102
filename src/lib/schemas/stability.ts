/**
 * The tip-over request, once: used by checkStability, POST /api/v1/stability and the forms.
 * Lengths as woodworkers write them or metres; weights as forces (`30 lb`, `20 kg`, `130 N`).
 * Output is the engine's SI shape (masses in kg).
 */
import { z } from 'zod';
import { STANDARD_GRAVITY } from '../engine/units';
import type { StabilityRequest } from '../engine/stability/types';
import { fittingsRequest } from '../engine/stability/fittings';
import { lengthField, quantityField } from './quantity';

const MAX_CASE_M = 5;
const size = (description: string) => lengthField({ max: MAX_CASE_M, description });
const place = (description: string) =>
	lengthField({ bound: 'nonnegative', max: MAX_CASE_M, description });
const weight = (description: string) =>
	quantityField('force', { bound: 'nonnegative', max: 1e5, description });
const kg = (n: number | undefined) => (n === undefined ? undefined : n / STANDARD_GRAVITY);

const partSchema = z.object({
	name: z.string().trim().max(80).optional(),
	weight: weight('weight of the part, e.g. 25 lb').optional(),
	length: lengthField({ max: MAX_CASE_M }).optional(),
	width: lengthField({ max: MAX_CASE_M }).optional(),
	thickness: lengthField({ max: 0.3 }).optional(),
	density: quantityField('density', { max: 3000 }).optional(),
	centreHeight: place('height of the part’s centre above the floor'),
	centreFromFront: place('distance of the part’s centre behind the case front')
});

const constructionSchema = z.union([
	z.object({
		weight: weight('weight of the empty case'),
		centreHeight: place('height of its centre of gravity (default: half the height)').optional(),
		centreFromFront: place('its centre behind the front (default: half the depth)').optional()
	}),
	z.object({ parts: z.array(partSchema).min(1).max(200) })
]);

export const stabilityShape = z.object({
	height: size('overall height'),
	width: size('overall width'),
	depth: size('overall depth'),
	construction: constructionSchema,
	contents: z
		.array(
			z.object({
				weight: weight('weight of what the shelf holds'),
				height: place('height of the shelf surface above the floor'),
				itemHeight: place('height of the items themselves').optional(),
				centreFromFront: place('centre of the contents behind the case front').optional()
			})
		)
		.max(200)
		.optional(),
	drawers: z
		.array(
			z.object({
				height: place('height of the drawer above the floor'),
				weight: weight('weight of the empty drawer'),
				contentsWeight: weight('weight of what it holds').optional(),
				extension: place('how far it opens beyond the front').optional()
			})
		)
		.max(100)
		.optional(),
	doors: z
		.array(
			z.object({
				weight: weight('weight of the door'),
				width: size('door width'),
				centreHeight: place('height of the door’s centre')
			})
		)
		.max(100)
		.optional(),
	base: z
		.object({ setback: place('front feet or plinth set back from the front').optional() })
		.optional(),
	floorTiltDeg: z.number().min(0).max(15).optional(),
	anchoring: z
		.object({
			kind: z.enum(['none', 'strap', 'bracket', 'screws-through-back']),
			height: place('height of the restraint above the floor (default: the top)').optional(),
			intoStuds: z.boolean().optional()
		})
		.optional(),
	seismicRegion: z.boolean().optional()
});

export type StabilityInput = z.input<typeof stabilityShape>;
type Parsed = z.output<typeof stabilityShape>;

export function toStabilityRequest(s: Parsed): StabilityRequest {
	const c = s.construction;
	return {
		heightM: s.height,
		widthM: s.width,
		depthM: s.depth,
		construction:
			'parts' in c
				? {
						parts: c.parts.map((p) => ({
							name: p.name,
							massKg: kg(p.weight),
							lengthM: p.length,
							widthM: p.width,
							thicknessM: p.thickness,
							densityKgPerM3: p.density,
							centreHeightM: p.centreHeight,
							centreFromFrontM: p.centreFromFront
						}))
					}
				: {
						massKg: c.weight / STANDARD_GRAVITY,
						centreHeightM: c.centreHeight,
						centreFromFrontM: c.centreFromFront
					},
		contents: s.contents?.map((x) => ({
			massKg: x.weight / STANDARD_GRAVITY,
			heightM: x.height,
			itemHeightM: x.itemHeight,
			centreFromFrontM: x.centreFromFront
		})),
		...fittingsRequest(s)
	};
}

/** POST /api/v1/stability and checkStability */
export const stabilityRequestSchema = stabilityShape.transform(toStabilityRequest);
