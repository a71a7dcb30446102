import { wallDesignSchema } from '$lib/schemas/wall';
import { wallCheckSchema, wallCutListSchema, wallSheetsSchema } from '$lib/schemas/responses/wall';
import type { ApiOperation } from './types';

const computed = { 422: 'Some fields need attention (each issue names its field)' };

/** A wall of cases: the check, the cut list and the sheet layouts. Open to anyone, nothing stored. */
export const wallOperations: ApiOperation[] = [
	{
		operationId: 'checkWall',
		method: 'post',
		path: '/walls/check',
		tag: 'walls',
		summary:
			'Check a wall of cases side by side: every shelf (in its bay, or continuous over dividers), every joint, each case’s tip-over with its drawers open, the margins worst first with suggested changes, and every part placed on the elevation. An estimate with cautions.',
		auth: 'none',
		body: wallDesignSchema,
		rateLimited: true,
		responses: { 200: { description: 'The wall check', schema: wallCheckSchema }, ...computed }
	},
	{
		operationId: 'listWallCuts',
		method: 'post',
		path: '/walls/cutlist',
		tag: 'walls',
		summary:
			'The cut list of a wall (identical parts grouped with a part mark, finished and rough sizes, grain, rabbets and grooves, banded edges), edge banding per material with waste, and the hardware to buy.',
		auth: 'none',
		body: wallDesignSchema,
		rateLimited: true,
		responses: {
			200: { description: 'The cut list, banding and hardware', schema: wallCutListSchema },
			...computed
		}
	},
	{
		operationId: 'layOutWallSheets',
		method: 'post',
		path: '/walls/sheets',
		tag: 'walls',
		summary:
			'Sheet layouts of a wall’s cut list: parts nested on stock sheets with kerf and edge trim, edge-to-edge cuts in order, sheets to buy per material, yield and usable offcuts. The body’s `sheets` sets the kerf, the trim and each material’s sheet size and grain rule.',
		auth: 'none',
		body: wallDesignSchema,
		rateLimited: true,
		responses: { 200: { description: 'The sheet layouts', schema: wallSheetsSchema }, ...computed }
	}
];
