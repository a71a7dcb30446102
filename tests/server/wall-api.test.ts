import { describe, expect, it } from 'vitest';
import { event } from './support/actors';
import * as check from '../../src/routes/api/v1/walls/check/+server';
import * as cutlist from '../../src/routes/api/v1/walls/cutlist/+server';
import * as sheets from '../../src/routes/api/v1/walls/sheets/+server';
import { openApiDocument } from '../../src/lib/server/openapi';

const IN = 0.0254;

/** Two units side by side, typed as a builder types them. */
const wall = {
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
			base: { height: '3 1/2"' },
			drawers: [
				{
					bottom: '4 1/4"',
					heights: ['11"', '11"'],
					box: {
						material: 'birch-multiply',
						thickness: '1/2"',
						bottom: { material: 'birch-multiply', thickness: '1/4"' }
					},
					slide: { length: '14"' },
					front: { material: 'mdo', thickness: '23/32"' }
				}
			]
		}
	]
};

const post = (body: unknown) => event({ actor: null, method: 'POST', body });

describe('POST /api/v1/walls/*', () => {
	it('checks the wall: both cases, the drawers opened in the tip-over check, margins worst first', async () => {
		const res = await check.POST(post(wall));
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body.cases).toHaveLength(2);
		expect(body.cases[1].xM).toBeCloseTo(30 * IN, 9);
		expect(
			body.cases[1].stability.frontEdgeLoads.filter((l: { where: string }) =>
				l.where.startsWith('drawer')
			)
		).toHaveLength(2);
		expect(body.margins[0].pass).toBe(false);
		expect(body.estimate).toBe(true);
		expect(body.cautions.join(' ')).toMatch(/F2057/);
	});

	it('lists the parts with marks and rough sizes (1/8" by default), banding and hardware', async () => {
		const res = await cutlist.POST(post(wall));
		expect(res.status).toBe(200);
		const body = await res.json();
		const side = body.cutList.groups.find((g: { role: string }) => g.role === 'side');
		expect(side.lengthM / IN).toBeCloseTo(80 - 3.5, 9);
		expect(side.roughLengthM / IN).toBeCloseTo(80 - 3.5 + 0.125, 9);
		expect(body.hardware.find((h: { kind: string }) => h.kind === 'slide').count).toBe(2);
		expect(body.banding[0].lengthM).toBeGreaterThan(body.banding[0].netM);
	});

	it('lays out the sheets with the kerf and sheet size asked for', async () => {
		const res = await sheets.POST(
			post({
				...wall,
				sheets: { kerf: '3 mm', stocks: [{ material: 'mdo', length: '2440 mm', width: '1220 mm' }] }
			})
		);
		expect(res.status).toBe(200);
		const body = await res.json();
		const mdo = body.sheets.perMaterial.find((m: { materialName: string }) =>
			m.materialName.startsWith('MDO')
		);
		expect(mdo.lengthM).toBeCloseTo(2.44, 9);
		expect(mdo.sheets).toBeGreaterThanOrEqual(mdo.lowerBound);
		expect(body.sheets.options.kerfM).toBeCloseTo(0.003, 9);
	});

	it('names bad fields with 422: a shelf above the case, a shelf crossing a divider', async () => {
		const bad = structuredClone(wall);
		(bad.cases[0] as { shelves: { height: string }[] }).shelves[0].height = '90"';
		const res = await check.POST(post(bad));
		expect(res.status).toBe(422);
		const paths = (await res.json()).issues.map((i: { path: (string | number)[] }) =>
			i.path.join('.')
		);
		expect(paths).toContain('cases.0.shelves.0.height');
		const crossing = structuredClone(wall) as Record<string, unknown> & typeof wall;
		(crossing.cases[0] as Record<string, unknown>).dividers = [{ at: '15"' }];
		const res2 = await check.POST(post(crossing));
		expect(res2.status).toBe(422);
		const issues = (await res2.json()).issues.map((i: { path: (string | number)[] }) =>
			i.path.join('.')
		);
		expect(issues).toContain('cases.0.shelves.0.bay');
	});

	it('is in the OpenAPI document', () => {
		// the document as the API serves it (JSON)
		const doc: { paths: Record<string, Record<string, unknown>> } = JSON.parse(
			JSON.stringify(openApiDocument('test'))
		);
		for (const p of ['/walls/check', '/walls/cutlist', '/walls/sheets'])
			expect((doc.paths[p].post as { requestBody?: unknown }).requestBody).toBeDefined();
	});
});
