import type { z } from 'zod';
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
import type { ProblemIssue } from './http';

/**
 * One open compute endpoint: the shared schema its body must pass, the engine call, and the engine's
 * own input error (problems the schema cannot see: an unknown material, solid wood across the grain),
 * which answers 422 with the field named. Read both by the SvelteKit routes and by the fast path.
 */
export interface ComputeEndpoint<S extends z.ZodType = z.ZodType> {
	schema: S;
	compute: (input: z.output<S>) => unknown;
	inputError: abstract new (...args: never[]) => Error & { issues: ProblemIssue[] };
}

function endpoint<S extends z.ZodType>(
	schema: S,
	compute: (input: z.output<S>) => unknown,
	inputError: ComputeEndpoint['inputError']
): ComputeEndpoint {
	return { schema, compute, inputError } as ComputeEndpoint;
}

/** The open compute routes by path: free to call, nothing stored, limited per address. */
export const COMPUTE_ENDPOINTS: ReadonlyMap<string, ComputeEndpoint> = new Map([
	['/api/v1/shelf', endpoint(shelfRequestSchema, analyzeInput, InputError)],
	['/api/v1/shelf/max-span', endpoint(maxSpanRequestSchema, maxSpanInput, InputError)],
	[
		'/api/v1/shelf/min-thickness',
		endpoint(minThicknessRequestSchema, minThicknessInput, InputError)
	],
	['/api/v1/shelf/min-edge', endpoint(minEdgeRequestSchema, minEdgeInput, InputError)],
	['/api/v1/shelf/max-load', endpoint(maxLoadRequestSchema, maxLoadInput, InputError)],
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

/** What a compute endpoint answers for a body that passed its schema: 200, or 422 from the engine. */
export function computeAnswer(
	endpoint: ComputeEndpoint,
	input: unknown
): { status: number; body: unknown } {
	try {
		return { status: 200, body: endpoint.compute(input) };
	} catch (e) {
		if (e instanceof endpoint.inputError)
			return { status: 422, body: { error: 'Some fields need attention.', issues: e.issues } };
		throw e;
	}
}
