import { describe, expect, it } from 'vitest';
import { event } from './support/actors';
import * as joints from '../../src/routes/api/v1/joints/+server';
import * as stability from '../../src/routes/api/v1/stability/+server';
import * as cases from '../../src/routes/api/v1/cases/check/+server';
import { openApiDocument } from '../../src/lib/server/openapi';
import { planJoint } from '../../src/lib/compute';

const LBF = 4.4482216152605;

const joint = {
	kind: 'shelf-to-side',
	fastener: 'pocket-screw',
	length: '11 1/4"',
	endPiece: { material: 'red-oak', thickness: '3/4"' },
	facePiece: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	demand: { shear: '40 lbf' }
};

const bookcase = {
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

const post = (body: unknown) => event({ actor: null, method: 'POST', body });

describe('POST /api/v1/joints (open to anyone)', () => {
	it('plans the joint the engine plans for the same JSON, without signing in', async () => {
		const res = await joints.POST(post(joint));
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body).toEqual(JSON.parse(JSON.stringify(planJoint(joint as never))));
		expect(body.demand.shearN).toBeCloseTo(40 * LBF, 9);
		expect(body.estimate).toBe(true);
		expect(body.cautions.length).toBeGreaterThan(0);
	});

	it('names the bad fields with 422, and unreadable JSON with 400', async () => {
		const res = await joints.POST(post({ ...joint, length: 'a bit', fastener: 'nail' }));
		expect(res.status).toBe(422);
		const body = await res.json();
		const paths = body.issues.map((i: { path: string[] }) => i.path.join('.'));
		expect(paths).toEqual(expect.arrayContaining(['length', 'fastener']));
		expect((await joints.POST(post('{not json'))).status).toBe(400);
	});
});

describe('POST /api/v1/stability', () => {
	it('returns the tip-over result with cautions', async () => {
		const res = await stability.POST(
			post({ height: '80"', width: '36"', depth: '17"', construction: { weight: '100 lb' } })
		);
		expect(res.status).toBe(200);
		const body = await res.json();
		// 100 lbf · 8.5" / 80" = 10.625 lbf at the top (statics)
		expect(body.tipForceAtTopN.empty / LBF).toBeCloseTo(10.625, 6);
		expect(body.cautions.join(' ')).toMatch(/Anchor/);
	});

	it('rejects a set-back deeper than the case', async () => {
		const res = await stability.POST(
			post({
				height: '80"',
				width: '36"',
				depth: '17"',
				construction: { weight: '100 lb' },
				base: { setback: '18"' }
			})
		);
		expect(res.status).toBe(422);
	});
});

describe('POST /api/v1/cases/check', () => {
	it('checks a whole case', async () => {
		const res = await cases.POST(post(bookcase));
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body.shelves).toHaveLength(2);
		expect(body.joints.map((j: { id: string }) => j.id)).toEqual([
			'shelf-1',
			'shelf-2',
			'top',
			'bottom'
		]);
		expect(body.margins.length).toBeGreaterThan(0);
		expect(body.estimate).toBe(true);
	});

	it('names a shelf above the case top', async () => {
		const res = await cases.POST(post({ ...bookcase, shelves: [{ height: '90"' }] }));
		expect(res.status).toBe(422);
		const body = await res.json();
		expect(body.issues[0].path).toEqual(['shelves', 0, 'height']);
	});
});

describe('OpenAPI', () => {
	it('describes the three routes with their JSON Schemas, open to anyone', () => {
		// the document as the API serves it (JSON)
		const doc: {
			paths: Record<string, Record<string, Record<string, unknown>>>;
		} = JSON.parse(JSON.stringify(openApiDocument('test')));
		for (const path of ['/joints', '/stability', '/cases/check']) {
			const op = doc.paths[path].post as {
				security: unknown[];
				requestBody: {
					content: { 'application/json': { schema: { properties: Record<string, unknown> } } };
				};
			};
			expect(op.security).toEqual([]);
			expect(
				Object.keys(op.requestBody.content['application/json'].schema.properties).length
			).toBeGreaterThan(3);
		}
	});
});
