import {
	maxLoadRequestSchema,
	maxSpanRequestSchema,
	minEdgeRequestSchema,
	minThicknessRequestSchema,
	shelfRequestSchema
} from '$lib/schemas/shelf';
import {
	materialListSchema,
	maxLoadResultSchema,
	maxSpanResultSchema,
	minEdgeResultSchema,
	minThicknessResultSchema,
	shelfAnalysisSchema
} from '$lib/schemas/responses/shelf';
import type { z } from 'zod';
import { curveQuerySchema } from '$lib/server/compute-api';
import type { ApiOperation } from './types';

const computed = (schema: z.ZodType) => ({
	200: { description: 'Computed (SI units: m, N, Pa, N·m)', schema },
	422: 'A field needs attention; each issue names its path and what was expected'
});

export const shelfOperations: ApiOperation[] = [
	{
		operationId: 'analyseShelf',
		method: 'post',
		path: '/shelf',
		summary: 'Analyse a shelf: instant and long-term sag, limit check, stress, reactions, curve',
		tag: 'shelf',
		body: shelfRequestSchema,
		query: curveQuerySchema,
		auth: 'none',
		rateLimited: true,
		responses: computed(shelfAnalysisSchema)
	},
	{
		operationId: 'findMaxSpan',
		method: 'post',
		path: '/shelf/max-span',
		summary: 'The longest span that meets the limit (shear, creep and self-weight included)',
		tag: 'shelf',
		body: maxSpanRequestSchema,
		query: curveQuerySchema,
		auth: 'none',
		rateLimited: true,
		responses: computed(maxSpanResultSchema)
	},
	{
		operationId: 'findMinThickness',
		method: 'post',
		path: '/shelf/min-thickness',
		summary: 'The thinnest stocked (or given) thickness that meets the limit',
		tag: 'shelf',
		body: minThicknessRequestSchema,
		query: curveQuerySchema,
		auth: 'none',
		rateLimited: true,
		responses: computed(minThicknessResultSchema)
	},
	{
		operationId: 'findMinEdge',
		method: 'post',
		path: '/shelf/min-edge',
		summary: 'The smallest strip (front, back or below) that makes a shelf meet the limit',
		tag: 'shelf',
		body: minEdgeRequestSchema,
		query: curveQuerySchema,
		auth: 'none',
		rateLimited: true,
		responses: computed(minEdgeResultSchema)
	},
	{
		operationId: 'findMaxLoad',
		method: 'post',
		path: '/shelf/max-load',
		summary:
			'The largest load of a given shape the shelf carries within the limit and its strength',
		tag: 'shelf',
		body: maxLoadRequestSchema,
		query: curveQuerySchema,
		auth: 'none',
		rateLimited: true,
		responses: computed(maxLoadResultSchema)
	},
	{
		operationId: 'listMaterials',
		method: 'get',
		path: '/materials',
		summary: 'The shelf material library with a source for every figure',
		tag: 'shelf',
		auth: 'none',
		responses: { 200: { description: 'The materials (SI units)', schema: materialListSchema } }
	}
];
