// The compute fast path (src/lib/server/fast-path.ts) answers exactly as the SvelteKit routes do. One
// node:http server offers each request to the fast path and hands what it declines to the app: the
// hooks of src/hooks.server.ts around the route modules, as adapter-node would run them. The same
// request is sent twice, once as the fast path takes it and once with a query (which the fast path
// always leaves to the app), and the two answers are compared: status, body and headers.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { handleError, handles } from '../../src/hooks.server';
import { COMPUTE_ENDPOINTS } from '../../src/lib/server/compute-api';
import {
	clientAddress,
	fastPath,
	parseBodySizeLimit,
	resetFastPathSettings
} from '../../src/lib/server/fast-path';
import { COMPUTE_ROUTES } from '../../src/lib/server/hooks/compute-limit';
import { COMPUTE_REQUESTS } from '../../src/lib/server/rate-limit';
import { aBookcase, aJoint, aShelf, aWall } from './support/compute-table';
import { cookieJar } from './support/request';
import { useTempDb } from './support/db';

useTempDb();

const routeModules = import.meta.glob('../../src/routes/api/v1/**/+server.ts');

/** SvelteKit's part, as adapter-node runs it: the request, the hooks, then the route's POST. */
async function app(req: http.IncomingMessage, res: http.ServerResponse) {
	const url = new URL(req.url!, 'http://localhost');
	const chunks: Buffer[] = [];
	for await (const chunk of req) chunks.push(chunk as Buffer);
	const hasBody = req.headers['content-type'] && Number(req.headers['content-length']) > 0;
	const request = new Request(url, {
		method: req.method,
		headers: req.headers as Record<string, string>,
		body: hasBody ? Buffer.concat(chunks) : undefined
	});
	const event = {
		url,
		request,
		locals: {},
		params: {},
		route: { id: url.pathname },
		cookies: cookieJar(),
		// adapter-node throws where the configured header is missing
		getClientAddress: () => {
			const address = clientAddress(req);
			if (!address) throw new Error('no client address');
			return address;
		},
		setHeaders: () => {},
		isDataRequest: false,
		isSubRequest: false
	};
	let response: Response;
	try {
		// the hooks in order, as SvelteKit's sequence() runs them, then the route
		const run = (i: number, e: typeof event): Promise<Response> =>
			i < handles.length
				? Promise.resolve(
						handles[i]({
							event: e as never,
							resolve: ((next: typeof event) => run(i + 1, next)) as never
						})
					)
				: route(e);
		response = await run(0, event);
	} catch (error) {
		response = new Response(String(error), { status: 500 });
	}
	res.writeHead(response.status, Object.fromEntries(response.headers));
	res.end(Buffer.from(await response.arrayBuffer()));
}

/** The route's handler for the method, as SvelteKit picks it; an error goes through handleError. */
async function route(e: { url: URL; request: Request }): Promise<Response> {
	const file = `../../src/routes${e.url.pathname}/+server.ts`;
	const mod = (await routeModules[file]?.()) as
		Record<string, (ev: unknown) => Promise<Response>> | undefined;
	if (!mod) return new Response('Not found', { status: 404 });
	const method = mod[e.request.method];
	if (!method)
		return new Response(`${e.request.method} method not allowed`, {
			status: 405,
			headers: { allow: Object.keys(mod).join(', ') }
		});
	try {
		return await method(e);
	} catch (error) {
		const body = await handleError({
			error,
			event: e as never,
			status: 500,
			message: 'Internal Error'
		});
		return Response.json(body, { status: 500 });
	}
}

let server: http.Server;
let base = '';
const taken: string[] = [];

beforeAll(async () => {
	process.env.ADDRESS_HEADER = 'x-forwarded-for';
	process.env.XFF_DEPTH = '1';
	resetFastPathSettings();
	server = http.createServer((req, res) => {
		if (fastPath(req, res)) taken.push(req.url!);
		else void app(req, res);
	});
	await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
	base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

afterAll(async () => {
	await new Promise((r) => server.close(r));
	delete process.env.ADDRESS_HEADER;
	delete process.env.XFF_DEPTH;
	resetFastPathSettings();
});

let nextAddress = 1;
/** A fresh client address for each pair, so no pair runs into the limit unless it means to. */
const freshAddress = () => `192.0.2.${nextAddress++}`;

interface Answer {
	status: number;
	headers: Record<string, string>;
	text: string;
}

async function send(path: string, body: string, init: Record<string, string>) {
	const res = await fetch(base + path, { method: 'POST', body, headers: init });
	const headers: Record<string, string> = {};
	res.headers.forEach((v, k) => {
		if (!['date', 'keep-alive', 'transfer-encoding'].includes(k)) headers[k] = v;
	});
	return { status: res.status, headers, text: await res.text() } as Answer;
}

/** The same request through the fast path and through the app, from two fresh addresses. */
async function both(
	path: string,
	body: string,
	headers: Record<string, string> = { 'content-type': 'application/json' }
) {
	const before = taken.length;
	const fast = await send(path, body, { ...headers, 'x-forwarded-for': freshAddress() });
	expect(taken.slice(before), 'the fast path answered').toEqual([path]);
	const routed = await send(`${path}${path.includes('?') ? '&' : '?'}via=app`, body, {
		...headers,
		'x-forwarded-for': freshAddress()
	});
	expect(taken.length, 'the app answered the second').toBe(before + 1);
	return { fast, routed };
}

function expectSame(fast: Answer, routed: Answer) {
	expect(fast.status).toBe(routed.status);
	expect(fast.headers).toEqual(routed.headers);
	expect(JSON.parse(fast.text)).toEqual(JSON.parse(routed.text));
	expect(fast.text).toBe(routed.text);
}

const { span: _span, ...noSpan } = aShelf;
const goodBodies: Record<string, unknown> = {
	'/api/v1/shelf': aShelf,
	'/api/v1/shelf/max-span': noSpan,
	'/api/v1/shelf/min-thickness': { ...aShelf, thickness: undefined },
	'/api/v1/shelf/min-edge': {
		...aShelf,
		span: '48"',
		material: 'mdf',
		strip: { material: 'red-oak', thickness: '3/4"' }
	},
	'/api/v1/shelf/max-load': { ...aShelf, loads: [], load: { kind: 'area' } },
	'/api/v1/joints': aJoint,
	'/api/v1/stability': {
		height: '80"',
		width: '36"',
		depth: '17"',
		construction: { weight: '100 lb' }
	},
	'/api/v1/cases/check': aBookcase,
	'/api/v1/walls/check': aWall,
	'/api/v1/walls/cutlist': aWall,
	'/api/v1/walls/sheets': aWall
};

describe('the compute fast path answers as the routes do', () => {
	it('covers every open compute route, and only those the rate limit counts', () => {
		expect([...COMPUTE_ENDPOINTS.keys()].sort()).toEqual(Object.keys(goodBodies).sort());
		for (const path of COMPUTE_ENDPOINTS.keys()) expect(path).toMatch(COMPUTE_ROUTES);
	});

	for (const [path, body] of Object.entries(goodBodies))
		it(`a good request: POST ${path}`, async () => {
			const { fast, routed } = await both(path, JSON.stringify(body));
			expect(fast.status).toBe(200);
			expect(fast.headers['x-frame-options']).toBe('DENY');
			expectSame(fast, routed);
		});

	it('a shorter curve or none (the curve query): the same answer with only the curve changed', async () => {
		const full = await both('/api/v1/shelf', JSON.stringify(aShelf));
		const { curve: fullCurve, ...figures } = JSON.parse(full.fast.text);
		expect(fullCurve).toHaveLength(101);
		const none = await both('/api/v1/shelf?curve=none', JSON.stringify(aShelf));
		expect(none.fast.status).toBe(200);
		expectSame(none.fast, none.routed);
		expect(JSON.parse(none.fast.text)).toEqual({ ...figures, curve: [] });
		expect(none.fast.text.length).toBeLessThan(full.fast.text.length / 2);
		const eleven = await both('/api/v1/shelf?curve=11', JSON.stringify(aShelf));
		expectSame(eleven.fast, eleven.routed);
		const { curve, ...same } = JSON.parse(eleven.fast.text);
		expect(same).toEqual(figures);
		// every tenth point of the 101, to rounding: the same curve, fewer points
		expect(curve).toHaveLength(11);
		curve.forEach(([x, y]: [number, number], i: number) => {
			expect(x).toBeCloseTo(fullCurve[10 * i][0], 12);
			expect(y).toBeCloseTo(fullCurve[10 * i][1], 12);
		});
		// the solvers' analysis too
		const span = await both('/api/v1/shelf/max-span?curve=3', JSON.stringify(noSpan));
		expectSame(span.fast, span.routed);
		expect(JSON.parse(span.fast.text).analysis.curve).toHaveLength(3);
	});

	it('a curve query it cannot read: 422 naming it', async () => {
		for (const value of ['1', '0', '2002', '2.5', 'short', ''])
			for (const path of ['/api/v1/shelf', '/api/v1/shelf/max-load']) {
				const body = path.endsWith('max-load')
					? { ...aShelf, loads: [], load: { kind: 'area' } }
					: aShelf;
				const { fast, routed } = await both(`${path}?curve=${value}`, JSON.stringify(body));
				expect(fast.status).toBe(422);
				expect(JSON.parse(fast.text).issues[0].path).toEqual(['curve']);
				expectSame(fast, routed);
			}
	});

	it('a body that is not JSON: 400', async () => {
		const { fast, routed } = await both('/api/v1/shelf', '{span');
		expect(fast.status).toBe(400);
		expectSame(fast, routed);
	});

	it('a field the schema refuses: 422 naming it', async () => {
		const { fast, routed } = await both(
			'/api/v1/shelf',
			JSON.stringify({ ...aShelf, span: 'long' })
		);
		expect(fast.status).toBe(422);
		expect(JSON.parse(fast.text).issues[0].path).toEqual(['span']);
		expectSame(fast, routed);
	});

	it('a problem only the engine sees (an unknown material): 422 naming it', async () => {
		const { fast, routed } = await both(
			'/api/v1/shelf',
			JSON.stringify({ ...aShelf, material: 'unobtainium' })
		);
		expect(fast.status).toBe(422);
		expect(JSON.parse(fast.text).issues[0].path).toEqual(['material']);
		expectSame(fast, routed);
		const joint = await both('/api/v1/joints', JSON.stringify({ ...aJoint, fastener: 'nail' }));
		expect(joint.fast.status).toBe(422);
		expectSame(joint.fast, joint.routed);
	});

	it('a body over 256 KB: 413, the connection closed since the body was left unread', async () => {
		const big = JSON.stringify({ ...aShelf, note: 'x'.repeat(300 * 1024) });
		const { fast, routed } = await both('/api/v1/shelf', big);
		expect(fast.status).toBe(413);
		expect(fast.headers.connection).toBe('close');
		expectSame(fast, routed);
	});

	it('a JSON type with parameters, or a +json type, and a leading byte-order mark', async () => {
		const typed = await both('/api/v1/shelf', JSON.stringify(aShelf), {
			'content-type': 'application/vnd.example+json; charset=utf-8'
		});
		expect(typed.fast.status).toBe(200);
		expectSame(typed.fast, typed.routed);
		const marked = await both('/api/v1/shelf', '\uFEFF' + JSON.stringify(aShelf));
		expectSame(marked.fast, marked.routed);
	});

	it('an engine failure: 500 with the same plain message (and a fresh reference)', async () => {
		const endpoint = COMPUTE_ENDPOINTS.get('/api/v1/stability')!;
		const compute = endpoint.compute;
		const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
		endpoint.compute = () => {
			throw new Error('a bug');
		};
		try {
			const { fast, routed } = await both(
				'/api/v1/stability',
				JSON.stringify(goodBodies['/api/v1/stability'])
			);
			expect(fast.status).toBe(500);
			expect(routed.status).toBe(500);
			const [f, r] = [JSON.parse(fast.text), JSON.parse(routed.text)];
			expect(f.message).toBe('Something went wrong on our side.');
			expect(f.message).toBe(r.message);
			expect(f.id).toMatch(/^[0-9a-f-]{36}$/);
			expect(logged).toHaveBeenCalled();
		} finally {
			endpoint.compute = compute;
			logged.mockRestore();
		}
	});

	it('over the per-address limit: the same 429 with Retry-After, counted for both together', async () => {
		const fastAddress = '198.51.100.61';
		const appAddress = '198.51.100.62';
		const call = (path: string, address: string) =>
			send(path, '{', { 'content-type': 'application/json', 'x-forwarded-for': address });
		for (let i = 0; i < COMPUTE_REQUESTS; i++) {
			expect((await call('/api/v1/shelf', fastAddress)).status).toBe(400);
			expect((await call('/api/v1/shelf?via=app', appAddress)).status).toBe(400);
		}
		const fast = await call('/api/v1/shelf', fastAddress);
		const routed = await call('/api/v1/shelf?via=app', appAddress);
		expect(fast.status).toBe(429);
		expect(fast.headers.connection).toBe('close');
		const wait = Number(fast.headers['retry-after']);
		expect(wait).toBeGreaterThanOrEqual(1);
		expect(wait).toBeLessThanOrEqual(60);
		// the wait may have ticked over a second between the two
		const [f, r] = [fast, routed].map((a) => {
			const body = JSON.parse(a.text);
			return {
				...a,
				text: '',
				headers: { ...a.headers, 'retry-after': '', 'content-length': '' },
				body: { ...body, error: body.error.replace(/\d+ s\./, 'N s.') }
			};
		});
		expect(f).toEqual(r);
		// one budget per address whichever way the requests came
		const mixed = '198.51.100.63';
		for (let i = 0; i < COMPUTE_REQUESTS / 2; i++) {
			await call('/api/v1/shelf', mixed);
			await call('/api/v1/shelf?via=app', mixed);
		}
		expect((await call('/api/v1/shelf', mixed)).status).toBe(429);
		expect((await call('/api/v1/shelf?via=app', mixed)).status).toBe(429);
	});
});

describe('what the fast path leaves to the app', () => {
	async function declined(path: string, init: RequestInit) {
		const before = taken.length;
		const res = await fetch(base + path, {
			...init,
			headers: { 'x-forwarded-for': freshAddress(), ...(init.headers as object) }
		});
		expect(taken.length, `${init.method} ${path} went to the app`).toBe(before);
		return res.status;
	}
	const body = JSON.stringify(aShelf);

	it('another method, path, query or trailing slash', async () => {
		// a curve query beside another parameter, or on an endpoint without a curve
		expect(
			await declined('/api/v1/shelf?curve=none&x=1', {
				method: 'POST',
				body,
				headers: { 'content-type': 'application/json' }
			})
		).toBe(200);
		expect(
			await declined('/api/v1/joints?curve=none', {
				method: 'POST',
				body: JSON.stringify(aJoint),
				headers: { 'content-type': 'application/json' }
			})
		).toBe(200);
		expect(await declined('/api/v1/materials', { method: 'GET' })).toBe(200);
		expect(
			await declined('/api/v1/shelf?x=1', {
				method: 'POST',
				body,
				headers: { 'content-type': 'application/json' }
			})
		).toBe(200);
		expect(await declined('/api/v1/shelf', { method: 'GET' })).toBe(405);
		expect(
			await declined('/api/v1/shelf/', {
				method: 'POST',
				body,
				headers: { 'content-type': 'application/json' }
			})
		).toBe(404);
	});

	it('a form or plain-text body (the origin check, 415) and a body without a type or length', async () => {
		expect(
			await declined('/api/v1/shelf', {
				method: 'POST',
				body: 'span=1',
				headers: {
					'content-type': 'application/x-www-form-urlencoded',
					origin: 'http://elsewhere.example'
				}
			})
		).toBe(403);
		expect(
			await declined('/api/v1/shelf', {
				method: 'POST',
				body,
				headers: { 'content-type': 'text/plain', origin: 'http://localhost' }
			})
		).toBe(415);
		expect(await declined('/api/v1/shelf', { method: 'POST' })).toBe(422);
	});

	it('an address adapter-node could not find (no forwarded header when one is configured)', async () => {
		const before = taken.length;
		const res = await fetch(`${base}/api/v1/shelf`, {
			method: 'POST',
			body,
			headers: { 'content-type': 'application/json' }
		});
		expect(taken.length).toBe(before);
		expect(res.status).toBe(500);
	});

	it('reads BODY_SIZE_LIMIT as adapter-node does', () => {
		expect(parseBodySizeLimit()).toBe(512 * 1024);
		expect(parseBodySizeLimit('25M')).toBe(25 * 1024 * 1024);
		expect(parseBodySizeLimit('1000')).toBe(1000);
		expect(parseBodySizeLimit('Infinity')).toBe(Infinity);
	});
});
