// Behind a proxy: adapter-node reads the client's address from ADDRESS_HEADER (the rightmost
// XFF_DEPTH entry of X-Forwarded-For), so one address's failed sign-ins refuse only that address.
// A second built server (server.js, as `npm start` runs it), started here with those settings, on its
// own port and data folder. The open compute routes answer on its fast path: the same answers as the
// app's routes (a query sends a request to the app) and the same per-address limit.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, request, test } from '@playwright/test';

const PORT = Number(process.env.E2E_PROXY_PORT ?? 4191);
const ORIGIN = `http://localhost:${PORT}`;
let server: ChildProcess;
let dataDir: string;

test.beforeAll(async () => {
	dataDir = mkdtempSync(join(tmpdir(), 'spanwright-proxy-'));
	server = spawn(process.execPath, ['server.js'], {
		cwd: process.cwd(), // the repository (npm run test:e2e runs from there)
		env: {
			...process.env,
			PORT: String(PORT),
			ORIGIN,
			ADDRESS_HEADER: 'X-Forwarded-For',
			XFF_DEPTH: '1',
			SPANWRIGHT_DATA_DIR: dataDir,
			SMTP_URL: 'smtp://127.0.0.1:9',
			AUTH_SECRET: 'e2e-proxy-secret-not-for-production-0123456789'
		},
		stdio: 'ignore'
	});
	for (let i = 0; i < 100; i++) {
		const ok = await fetch(`${ORIGIN}/api/v1/health`).then(
			(r) => r.ok,
			() => false
		);
		if (ok) return;
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error('the proxied server did not start');
});

test.afterAll(() => {
	server?.kill();
	rmSync(dataDir, { recursive: true, force: true });
});

test('failed sign-ins count per forwarded address; a forged left-hand entry changes nothing', async () => {
	const api = await request.newContext({ baseURL: ORIGIN });
	const signIn = (forwardedFor: string) =>
		api.post('/signin?/password', {
			form: { email: 'owner@shop.example', password: 'not the password', redirectTo: '/' },
			headers: { origin: ORIGIN, accept: 'text/html', 'x-forwarded-for': forwardedFor },
			maxRedirects: 0
		});
	// five failures from one client (the proxy appends the address it saw: the rightmost entry)
	for (let i = 0; i < 5; i++) expect((await signIn('203.0.113.5')).status()).toBe(400);
	expect((await signIn('203.0.113.5')).status()).toBe(429);
	// the same client forging another address on the left is still itself
	expect((await signIn('198.51.100.7, 203.0.113.5')).status()).toBe(429);
	// another client behind the same proxy is not refused
	expect((await signIn('198.51.100.7')).status()).toBe(400);
	await api.dispose();
});

test('the compute fast path answers as the app does and counts per forwarded address', async () => {
	const api = await request.newContext({ baseURL: ORIGIN });
	const shelf = JSON.stringify({
		span: '32"',
		depth: '11 1/4"',
		thickness: '3/4"',
		material: 'red-oak',
		loads: [{ kind: 'area', pressure: '40 psf' }]
	});
	const post = (path: string, address: string, data = shelf) =>
		api.post(path, {
			data: Buffer.from(data), // as written: a string would be encoded as JSON again
			headers: { 'content-type': 'application/json', 'x-forwarded-for': address }
		});
	const same = async (data: string, status: number) => {
		const fast = await post('/api/v1/shelf', '203.0.113.60', data);
		const app = await post('/api/v1/shelf?via=app', '203.0.113.61', data);
		expect(fast.status()).toBe(status);
		expect(app.status()).toBe(status);
		expect(await fast.text()).toBe(await app.text());
		const headers = (r: typeof fast) =>
			Object.fromEntries(Object.entries(r.headers()).filter(([k]) => k !== 'date'));
		expect(headers(fast)).toEqual(headers(app));
	};
	await same(shelf, 200);
	await same('{span', 400);
	await same(JSON.stringify({ span: 'long' }), 422);
	// one client's budget, then 429 with Retry-After on both ways in; another client goes on
	const budget = 120; // COMPUTE_REQUESTS in src/lib/server/rate-limit.ts
	for (let i = 0; i < budget; i++) await post('/api/v1/shelf', '203.0.113.62', '{');
	const fast = await post('/api/v1/shelf', '203.0.113.62');
	const app = await post('/api/v1/shelf?via=app', '203.0.113.62');
	for (const r of [fast, app]) {
		expect(r.status()).toBe(429);
		expect(Number(r.headers()['retry-after'])).toBeGreaterThanOrEqual(1);
		expect((await r.json()).error).toMatch(/Too many calculations/);
	}
	expect((await post('/api/v1/shelf', '198.51.100.62')).status()).toBe(200);
	await api.dispose();
});
