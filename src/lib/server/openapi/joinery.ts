import { caseDesignSchema } from '$lib/schemas/case';
import { jointRequestSchema } from '$lib/schemas/joinery';
import { stabilityRequestSchema } from '$lib/schemas/stability';
import {
	caseCheckSchema,
	jointPlanSchema,
	stabilityResultSchema
} from '$lib/schemas/responses/joinery';
import type { ApiOperation } from './types';

const computed = { 422: 'Some fields need attention (each issue names its field)' };

/** Joint plans, tip-over and the whole-case check: open to anyone, nothing stored. */
export const joineryOperations: ApiOperation[] = [
	{
		operationId: 'planJoint',
		method: 'post',
		path: '/joints',
		tag: 'joinery',
		summary:
			'Plan one joint (biscuits, pocket screws, screws, shelf pins or a dado): count, positions, capacity against demand. An estimate with cautions.',
		auth: 'none',
		body: jointRequestSchema,
		rateLimited: true,
		responses: { 200: { description: 'The joint plan', schema: jointPlanSchema }, ...computed }
	},
	{
		operationId: 'checkStability',
		method: 'post',
		path: '/stability',
		tag: 'joinery',
		summary:
			'Tip-over of a case: centre of gravity, tipping forces, front-edge load against ASTM F2057-23, EN 14749 forces, restraint pull against ASTM F3096 and anchoring advice. An estimate with cautions.',
		auth: 'none',
		body: stabilityRequestSchema,
		rateLimited: true,
		responses: {
			200: { description: 'The stability result', schema: stabilityResultSchema },
			...computed
		}
	},
	{
		operationId: 'checkCase',
		method: 'post',
		path: '/cases/check',
		tag: 'joinery',
		summary:
			'Check a whole case: every shelf, every joint, tip-over, the cut list, margins worst first and suggested design changes. An estimate with cautions.',
		auth: 'none',
		body: caseDesignSchema,
		rateLimited: true,
		responses: { 200: { description: 'The case check', schema: caseCheckSchema }, ...computed }
	}
];
