// One real request of each open compute route (and the open reads), with the status it answers.
import { event } from './actors';
import * as cases from '../../../src/routes/api/v1/cases/check/+server';
import * as joints from '../../../src/routes/api/v1/joints/+server';
import * as stability from '../../../src/routes/api/v1/stability/+server';
import * as shelf from '../../../src/routes/api/v1/shelf/+server';
import * as maxSpan from '../../../src/routes/api/v1/shelf/max-span/+server';
import * as minThickness from '../../../src/routes/api/v1/shelf/min-thickness/+server';
import * as minEdge from '../../../src/routes/api/v1/shelf/min-edge/+server';
import * as maxLoad from '../../../src/routes/api/v1/shelf/max-load/+server';
import * as materials from '../../../src/routes/api/v1/materials/+server';
import * as health from '../../../src/routes/api/v1/health/+server';
import * as wallCheck from '../../../src/routes/api/v1/walls/check/+server';
import * as wallCutList from '../../../src/routes/api/v1/walls/cutlist/+server';
import * as wallSheets from '../../../src/routes/api/v1/walls/sheets/+server';

export const aShelf = {
	span: '32"',
	depth: '11 1/4"',
	thickness: '3/4"',
	material: 'red-oak',
	loads: [{ kind: 'area', pressure: '40 psf' }]
};
const { span: _span, ...noSpan } = aShelf;

export const aJoint = {
	kind: 'shelf-to-side',
	fastener: 'pocket-screw',
	length: '11 1/4"',
	endPiece: { material: 'red-oak', thickness: '3/4"' },
	facePiece: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	demand: { shear: '40 lbf' }
};

export const aBookcase = {
	width: '36"',
	height: '80"',
	depth: '12"',
	sides: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	back: { material: 'hardwood-plywood-veneer-core', thickness: '1/4"' },
	shelves: [
		{ height: '20"', kind: 'adjustable', loads: [{ kind: 'area', pressure: '40 lbf/ft^2' }] },
		{
			height: '40"',
			kind: 'fixed',
			joint: 'pocket-screw',
			loads: [{ kind: 'area', pressure: '40 lbf/ft^2' }]
		}
	]
};

/** Two units side by side, as in the wall API test. */
export const aWall = {
	name: 'Two units',
	cases: [
		{
			name: 'bookcase',
			width: '30"',
			height: '80"',
			depth: '17"',
			sides: { material: 'mdo', thickness: '23/32"' },
			back: { material: 'softwood-plywood', thickness: '1/4"' },
			base: { height: '3 1/2"' },
			shelves: [
				{ height: '40"', kind: 'fixed', loads: [{ kind: 'area', pressure: '40 lbf/ft^2' }] }
			]
		},
		{
			name: 'low unit',
			width: '30"',
			height: '30"',
			depth: '17"',
			sides: { material: 'mdo', thickness: '23/32"' },
			base: { height: '3 1/2"' }
		}
	]
};

type Handler = (e: never) => Response | Promise<Response>;
const post = (h: unknown, body: unknown, url?: string) =>
	(h as Handler)(event({ actor: null, method: 'POST', body, url }) as never);
const get = (h: unknown) => (h as Handler)(event({ actor: null }) as never);

export interface ComputeRow {
	route: string;
	label: string;
	status: number;
	call: () => Promise<Response> | Response;
}

export const computeTable: ComputeRow[] = [
	{ route: 'GET /health', label: 'healthy', status: 200, call: () => get(health.GET) },
	{ route: 'GET /materials', label: 'the library', status: 200, call: () => get(materials.GET) },
	{ route: 'POST /shelf', label: 'a shelf', status: 200, call: () => post(shelf.POST, aShelf) },
	{ route: 'POST /shelf', label: 'not JSON', status: 400, call: () => post(shelf.POST, '{') },
	{
		route: 'POST /shelf',
		label: 'a field wrong',
		status: 422,
		call: () => post(shelf.POST, { ...aShelf, span: 'long' })
	},
	{
		route: 'POST /shelf',
		label: 'without its curve',
		status: 200,
		call: () => post(shelf.POST, aShelf, '/api/v1/shelf?curve=none')
	},
	{
		route: 'POST /shelf',
		label: 'a curve query it cannot read',
		status: 422,
		call: () => post(shelf.POST, aShelf, '/api/v1/shelf?curve=1')
	},
	{
		route: 'POST /shelf/max-span',
		label: 'solved, an 11-point curve',
		status: 200,
		call: () => post(maxSpan.POST, noSpan, '/api/v1/shelf/max-span?curve=11')
	},
	{
		route: 'POST /shelf/max-span',
		label: 'solved',
		status: 200,
		call: () => post(maxSpan.POST, noSpan)
	},
	{
		route: 'POST /shelf/min-thickness',
		label: 'solved',
		status: 200,
		call: () => post(minThickness.POST, { ...aShelf, thickness: undefined })
	},
	{
		route: 'POST /shelf/min-edge',
		label: 'solved',
		status: 200,
		call: () =>
			post(minEdge.POST, {
				...aShelf,
				span: '48"',
				material: 'mdf',
				strip: { material: 'red-oak', thickness: '3/4"' }
			})
	},
	{
		route: 'POST /shelf/max-load',
		label: 'solved',
		status: 200,
		call: () => post(maxLoad.POST, { ...aShelf, loads: [], load: { kind: 'area' } })
	},
	{ route: 'POST /joints', label: 'planned', status: 200, call: () => post(joints.POST, aJoint) },
	{
		route: 'POST /joints',
		label: 'a field wrong',
		status: 422,
		call: () => post(joints.POST, { ...aJoint, fastener: 'nail' })
	},
	{
		route: 'POST /stability',
		label: 'checked',
		status: 200,
		call: () =>
			post(stability.POST, {
				height: '80"',
				width: '36"',
				depth: '17"',
				construction: { weight: '100 lb' }
			})
	},
	{
		route: 'POST /walls/check',
		label: 'checked',
		status: 200,
		call: () => post(wallCheck.POST, aWall)
	},
	{
		route: 'POST /walls/check',
		label: 'a field wrong',
		status: 422,
		call: () => post(wallCheck.POST, { ...aWall, cases: 'many' })
	},
	{
		route: 'POST /walls/cutlist',
		label: 'listed',
		status: 200,
		call: () => post(wallCutList.POST, aWall)
	},
	{
		route: 'POST /walls/sheets',
		label: 'laid out',
		status: 200,
		call: () => post(wallSheets.POST, aWall)
	},
	{
		route: 'POST /cases/check',
		label: 'checked',
		status: 200,
		call: () => post(cases.POST, aBookcase)
	}
];

computeTable.push({
	route: 'POST /shelf',
	label: 'a body sent as text',
	status: 415,
	call: () =>
		(shelf.POST as Handler)({
			request: new Request('http://localhost/api/v1/shelf', {
				method: 'POST',
				headers: { 'content-type': 'text/plain' },
				body: JSON.stringify(aShelf)
			})
		} as never)
});

computeTable.push({
	route: 'POST /shelf',
	label: 'over the per-address limit',
	status: 429,
	call: async () => {
		const { computeLimit } = await import('../../../src/lib/server/hooks/compute-limit');
		const { COMPUTE_REQUESTS } = await import('../../../src/lib/server/rate-limit');
		const url = new URL('http://localhost/api/v1/shelf');
		let res: Response = new Response();
		for (let i = 0; i <= COMPUTE_REQUESTS; i++)
			res = await computeLimit({
				event: {
					url,
					request: new Request(url, { method: 'POST' }),
					getClientAddress: () => '192.0.2.250'
				},
				resolve: () => post(shelf.POST, aShelf)
			} as never);
		return res;
	}
});
