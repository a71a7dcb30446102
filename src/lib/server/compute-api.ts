import { z } from 'zod';
import {
	analyzeInput,
	maxLoadInput,
	maxSpanInput,
	minEdgeInput,
	minThicknessInput,
	InputError
} from '$lib/engine';
import { checkCaseSI } from '$lib/engine/case';
import { planJointSI } from '$lib/engine/joinery';
import { checkStabilitySI } from '$lib/engine/stability';
import { checkWall, wallSheets, wallShop } from '$lib/engine/wall';
import { caseDesignSchema } from '$lib/schemas/case';
import { jointRequestSchema } from '$lib/schemas/joinery';
import {
	maxLoadRequestSchema,
	maxSpanRequestSchema,
	minEdgeRequestSchema,
	minThicknessRequestSchema,
	shelfRequestSchema
} from '$lib/schemas/shelf';
import { stabilityRequestSchema } from '$lib/schemas/stability';
import { toSheetRequest, toWallDesign, wallDesignSchema } from '$lib/schemas/wall';
import { zodIssues, type ProblemIssue } from './http';

/**
 * One open compute endpoint: the shared schema its body must pass, the engine call, and the engine's
 * own input error (problems the schema cannot see: an unknown material, solid wood across the grain),
 * which answers 422 with the field named. Read both by the SvelteKit routes and by the fast path.
 */
export interface ComputeEndpoint<S extends z.ZodType = z.ZodType> {
	schema: S;
	compute: (input: z.output<S>) => unknown;
	inputError: abstract new (...args: never[]) => Error & { issues: ProblemIssue[] };
	/** the shelf endpoints: their answer's curve can be asked shorter (the `curve` query) */
	curve?: boolean;
}

function endpoint<S extends z.ZodType>(
	schema: S,
	compute: (input: z.output<S>) => unknown,
	inputError: ComputeEndpoint['inputError'],
	curve = false
): ComputeEndpoint {
	return { schema, compute, inputError, curve } as ComputeEndpoint;
}

/** The most points a curve can be asked for (as the request schema's options.curvePoints). */
export const MAX_CURVE_POINTS = 2001;

/**
 * The query of the shelf endpoints: `curve=none` answers without the deflected curve, `curve=N`
 * with N points on it (2 to 2001) instead of the request's options.curvePoints (101 by default,
 * about 5 KB of the answer). Every other figure of the answer stays the same.
 */
export const curveQuerySchema = z.object({
	curve: z
		.union([z.literal('none'), z.coerce.number().int().min(2).max(MAX_CURVE_POINTS)], {
			error: `Expected none, or a whole number of points from 2 to ${MAX_CURVE_POINTS}.`
		})
		.optional()
		.meta({
			description:
				'Points on the deflected curve of the answer: `none` for no curve (an empty list), or 2 to 2001 (default: the body’s options.curvePoints, 101)'
		})
});

/** The open compute routes by path: free to call, nothing stored, limited per address. */
export const COMPUTE_ENDPOINTS: ReadonlyMap<string, ComputeEndpoint> = new Map([
	['/api/v1/shelf', endpoint(shelfRequestSchema, analyzeInput, InputError, true)],
	['/api/v1/shelf/max-span', endpoint(maxSpanRequestSchema, maxSpanInput, InputError, true)],
	[
		'/api/v1/shelf/min-thickness',
		endpoint(minThicknessRequestSchema, minThicknessInput, InputError, true)
	],
	['/api/v1/shelf/min-edge', endpoint(minEdgeRequestSchema, minEdgeInput, InputError, true)],
	['/api/v1/shelf/max-load', endpoint(maxLoadRequestSchema, maxLoadInput, InputError, true)],
	['/api/v1/joints', endpoint(jointRequestSchema, planJointSI, InputError)],
	['/api/v1/stability', endpoint(stabilityRequestSchema, checkStabilitySI, InputError)],
	['/api/v1/cases/check', endpoint(caseDesignSchema, checkCaseSI, InputError)],
	[
		'/api/v1/walls/check',
		endpoint(wallDesignSchema, (d) => checkWall(toWallDesign(d)), InputError)
	],
	[
		'/api/v1/walls/cutlist',
		endpoint(
			wallDesignSchema,
			(d) => {
				const { cutList, banding, hardware } = wallShop(toWallDesign(d));
				return { estimate: true, cutList, banding, hardware };
			},
			InputError
		)
	],
	[
		'/api/v1/walls/sheets',
		endpoint(wallDesignSchema, (d) => wallSheets(toWallDesign(d), toSheetRequest(d)), InputError)
	]
]);

/** The endpoint of an open compute path (the routes name theirs with this, so a typo fails loudly). */
export function computeEndpoint(path: string): ComputeEndpoint {
	const found = COMPUTE_ENDPOINTS.get(path);
	if (!found) throw new Error(`no compute endpoint at ${path}`);
	return found;
}

/**
 * What a compute endpoint answers for a body that passed its schema: 200, or 422 from the engine,
 * or 422 for a `curve` query it cannot read. Other query parameters are ignored, as they always were.
 */
export function computeAnswer(
	endpoint: ComputeEndpoint,
	input: unknown,
	query?: URLSearchParams
): { status: number; body: unknown } {
	if (endpoint.curve && query?.has('curve')) {
		const read = curveQuerySchema.safeParse({ curve: query.get('curve') });
		if (!read.success)
			return {
				status: 422,
				body: { error: 'Some query parameters need attention.', issues: zodIssues(read.error) }
			};
		const points = read.data.curve === 'none' ? 0 : read.data.curve!;
		const shelf = input as { options: { curvePoints: number } };
		// a copy: the parsed options may be the schema's own default object
		shelf.options = { ...shelf.options, curvePoints: points };
	}
	try {
		return { status: 200, body: endpoint.compute(input) };
	} catch (e) {
		if (e instanceof endpoint.inputError)
			return { status: 422, body: { error: 'Some fields need attention.', issues: e.issues } };
		throw e;
	}
}
