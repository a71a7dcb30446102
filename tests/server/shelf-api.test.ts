import { describe, expect, it } from 'vitest';
import { POST as analyse } from '../../src/routes/api/v1/shelf/+server';
import { POST as maxSpan } from '../../src/routes/api/v1/shelf/max-span/+server';
import { POST as minThickness } from '../../src/routes/api/v1/shelf/min-thickness/+server';
import { POST as minEdge } from '../../src/routes/api/v1/shelf/min-edge/+server';
import { POST as maxLoad } from '../../src/routes/api/v1/shelf/max-load/+server';
import { GET as materials } from '../../src/routes/api/v1/materials/+server';
import { openApiDocument } from '../../src/lib/server/openapi';

type Handler = (event: never) => Response | Promise<Response>;

/** Call a handler with the little of a RequestEvent it reads. */
async function post(handler: Handler, body: unknown) {
	const request = new Request('http://localhost/api/v1/shelf', {
		method: 'POST',
		headers: { 'content-type': 'application/json' },
		body: typeof body === 'string' ? body : JSON.stringify(body)
	});
	const res = await handler({ request } as never);
	return { status: res.status, body: await res.json() };
}

const shelf = {
	span: '32"',
	depth: '11 1/4"',
	thickness: '3/4"',
	material: 'red-oak',
	loads: [{ kind: 'area', pressure: '40 psf' }]
};

describe('POST /api/v1/shelf', () => {
	it('analyses a shelf written as a woodworker writes it', async () => {
		const { status, body } = await post(analyse, shelf);
		expect(status).toBe(200);
		expect(body.span).toBeCloseTo(32 * 0.0254, 9);
		expect(body.sag.longTerm).toBeGreaterThan(body.sag.instant);
		expect(body.curve).toHaveLength(101);
		expect(body.limit.name).toBe('L/144');
		expect(typeof body.engineVersion).toBe('string');
	});
	it('422 names the field and what was expected', async () => {
		const { status, body } = await post(analyse, { ...shelf, span: 'long' });
		expect(status).toBe(422);
		expect(body.issues[0].path).toEqual(['span']);
		expect(body.issues[0].message).toMatch(/length such as/);
	});
	it('422 for an unknown material, found past the schema', async () => {
		const { status, body } = await post(analyse, { ...shelf, material: 'unobtainium' });
		expect(status).toBe(422);
		expect(body.issues[0].path).toEqual(['material']);
	});
	it('400 for a body that is not JSON', async () => {
		expect((await post(analyse, '{span')).status).toBe(400);
	});
});

describe('solver routes', () => {
	const { span: _span, ...noSpan } = shelf;
	it('max-span', async () => {
		const { status, body } = await post(maxSpan, noSpan);
		expect(status).toBe(200);
		expect(body.analysis.limit.margin).toBeCloseTo(0, 4);
	});
	it('min-thickness', async () => {
		const { status, body } = await post(minThickness, { ...shelf, thickness: undefined });
		expect(status).toBe(200);
		expect(body.tried.length).toBeGreaterThan(0);
	});
	it('min-edge', async () => {
		const { status, body } = await post(minEdge, {
			...shelf,
			span: '48"',
			material: 'mdf',
			strip: { material: 'red-oak', thickness: '3/4"' }
		});
		expect(status).toBe(200);
		expect(body.needed).toBe(true);
		expect(body.analysis.limit.pass).toBe(true);
	});
	it('max-load', async () => {
		const { status, body } = await post(maxLoad, { ...shelf, loads: [], load: { kind: 'area' } });
		expect(status).toBe(200);
		expect(body.magnitude).toBeGreaterThan(0);
	});
	it('max-span refuses loads at a position, naming them', async () => {
		const { status, body } = await post(maxSpan, {
			...noSpan,
			loads: [{ kind: 'point', force: '20 lbf', at: '10"' }]
		});
		expect(status).toBe(422);
		expect(body.issues[0].path).toEqual(['loads', 0]);
	});
});

describe('GET /api/v1/materials and the OpenAPI document', () => {
	it('lists materials with sources', async () => {
		const res = await (materials as unknown as () => Response)();
		const body = await res.json();
		expect(body.materials.find((m: { id: string }) => m.id === 'red-oak').sources.modulus).toMatch(
			/Wood Handbook/
		);
	});
	it('describes every shelf operation, open to anyone, with its request schema', () => {
		// the document as the API serves it (JSON)
		const doc: {
			paths: Record<
				string,
				Record<
					string,
					{
						security: unknown[];
						requestBody?: {
							content: Record<string, { schema: { properties?: Record<string, unknown> } }>;
						};
					}
				>
			>;
		} = JSON.parse(JSON.stringify(openApiDocument('test')));
		for (const path of [
			'/shelf',
			'/shelf/max-span',
			'/shelf/min-thickness',
			'/shelf/min-edge',
			'/shelf/max-load'
		]) {
			const op = doc.paths[path].post;
			expect(op.security).toEqual([]);
			expect(op.requestBody!.content['application/json'].schema.properties).toHaveProperty(
				'material'
			);
		}
		expect(doc.paths['/materials'].get.security).toEqual([]);
	});
});
